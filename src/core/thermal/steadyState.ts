/**
 * Steady-state temperatures at a constant per-unit load K and ambient θa (IEEE C57.91 clause 7;
 * IEC 60076-7 clause 8.2, both from memory):
 *   ultimate top-oil rise    Δθo = Δθor · [(1 + R·K²)/(1 + R)]^x
 *   ultimate hot-spot rise   Δθh = Hgr · K^y
 *   top oil                  θo  = θa + Δθo
 *   hot-spot                 θh  = θa + Δθo + Δθh
 * and the largest steady load whose hot-spot reaches a limit.
 */
import { InputError, NoAnswerError, shown } from '../errors';
import { ambientTemperature, perUnitLoadAtMost, positive, within } from '../guards';
import { thermalCharacteristics, type Cooling, type Paper, type ThermalCharacteristics, type ThermalMethod } from './coolingTable';

/** Loads above this many per unit are refused: far beyond the loading guides' emergency limits. */
export const MAX_THERMAL_LOAD = 3;

export function thermalLoad(name: string, value: number): number {
  return perUnitLoadAtMost(name, value, MAX_THERMAL_LOAD);
}

/**
 * A unit's own thermal data, each replacing the table row's value where given: the heat-run
 * report's rated rises, the loss ratio from its P0 and Pk, its time constants and exponents.
 * The keys name the cell arguments the values come from, for the messages.
 */
export interface ThermalData {
  readonly topOilRise?: number;
  /** Hgr (IEC) or Δθ_H,R (IEEE), K; with hotSpotFactor, the average winding gradient gr instead. */
  readonly hotSpotGradient?: number;
  /** H of IEC 60076-7: when given, the hot-spot gradient is H · gr with gr = hotSpotGradient. */
  readonly hotSpotFactor?: number;
  readonly lossRatio?: number;
  readonly oilTimeConstant?: number;
  readonly windingTimeConstant?: number;
  /** n (IEEE) = x (IEC). */
  readonly oilExponent?: number;
  /** m (IEEE) = y/2 (IEC): the hot-spot gradient goes as K^(2m). */
  readonly windingExponentM?: number;
  readonly k11?: number;
  readonly k21?: number;
  readonly k22?: number;
  readonly paper?: Paper;
  readonly normalLifeHours?: number;
}

/** The argument each ThermalData value is read from, for the refusals. */
export const THERMAL_DATA_ARGUMENTS: Readonly<Record<keyof ThermalData, string>> = {
  topOilRise: 'top_oil_rise',
  hotSpotGradient: 'hs_gradient',
  hotSpotFactor: 'hs_factor',
  lossRatio: 'loss_ratio',
  oilTimeConstant: 'tau_oil_min',
  windingTimeConstant: 'tau_winding_min',
  oilExponent: 'n',
  windingExponentM: 'm',
  k11: 'k11',
  k21: 'k21',
  k22: 'k22',
  paper: 'paper',
  normalLifeHours: 'normal_life_h',
};

const rise = (name: string, value: number, max: number) => within(name, positive(name, value), 0, max, 'K', 'a rated temperature rise');
const minutes = (name: string, value: number) => within(name, positive(name, value), 0, 10_000, 'min', 'a time constant');
const exponent = (name: string, value: number) => within(name, value, 0.5, 2, '', 'an exponent of the loading guides');
const constant = (name: string, value: number) => within(name, value, 0.1, 10, '', 'a thermal-model constant');

/**
 * The table row for a method and cooling, with the unit's own values where given (undefined keeps
 * the table's). Each value is checked under the name of the argument it came from.
 */
export function thermalModel(method: ThermalMethod, cooling: Cooling, data: ThermalData = {}): ThermalCharacteristics {
  const row = thermalCharacteristics(method, cooling);
  const given = Object.keys(data).some((k) => data[k as keyof ThermalData] !== undefined);
  if (!given) return row;
  const a = THERMAL_DATA_ARGUMENTS;
  let gradient = data.hotSpotGradient === undefined ? row.hotSpotGradient : rise(a.hotSpotGradient, data.hotSpotGradient, 100);
  let factor = row.hotSpotFactor;
  if (data.hotSpotFactor !== undefined) {
    factor = within(a.hotSpotFactor, data.hotSpotFactor, 1, 3, '', 'a hot-spot factor H');
    if (data.hotSpotGradient === undefined) {
      throw new InputError(a.hotSpotFactor, 'needs the heat-run winding gradient gr in hs_gradient: the hot-spot gradient is H · gr');
    }
    gradient = rise(a.hotSpotFactor, factor * gradient, 100);
  }
  const m = data.windingExponentM === undefined ? undefined : exponent(a.windingExponentM, data.windingExponentM);
  return {
    ...row,
    topOilRise: data.topOilRise === undefined ? row.topOilRise : rise(a.topOilRise, data.topOilRise, 120),
    hotSpotGradient: gradient,
    hotSpotFactor: factor,
    lossRatio: data.lossRatio === undefined ? row.lossRatio : within(a.lossRatio, data.lossRatio, 0, 100, '', 'the ratio of load loss to no-load loss'),
    oilTimeConstant: data.oilTimeConstant === undefined ? row.oilTimeConstant : minutes(a.oilTimeConstant, data.oilTimeConstant),
    windingTimeConstant: data.windingTimeConstant === undefined ? row.windingTimeConstant : minutes(a.windingTimeConstant, data.windingTimeConstant),
    oilExponent: data.oilExponent === undefined ? row.oilExponent : exponent(a.oilExponent, data.oilExponent),
    windingExponent: m === undefined ? row.windingExponent : 2 * m,
    k11: data.k11 === undefined ? row.k11 : constant(a.k11, data.k11),
    k21: data.k21 === undefined ? row.k21 : within(a.k21, data.k21, 1, 10, '', 'a thermal-model constant (k21 ≥ 1)'),
    k22: data.k22 === undefined ? row.k22 : constant(a.k22, data.k22),
    paper: data.paper ?? row.paper,
    normalLifeHours: data.normalLifeHours === undefined ? row.normalLifeHours : within(a.normalLifeHours, data.normalLifeHours, 1000, 10_000_000, 'h', 'a normal insulation life'),
    source: `${row.source}; the unit's own data where given`,
  };
}

/** Top-oil rise over ambient that a constant load K settles to, K. */
export function ultimateTopOilRise(m: ThermalCharacteristics, load: number): number {
  return m.topOilRise * Math.pow((1 + m.lossRatio * load * load) / (1 + m.lossRatio), m.oilExponent);
}

/** Hot-spot rise over top oil that a constant load K settles to, K. */
export function ultimateHotSpotGradient(m: ThermalCharacteristics, load: number): number {
  return m.hotSpotGradient * Math.pow(load, m.windingExponent);
}

function hotSpotAt(m: ThermalCharacteristics, load: number, ambientC: number): number {
  return ambientC + ultimateTopOilRise(m, load) + ultimateHotSpotGradient(m, load);
}

/** Steady-state hot-spot temperature, °C, at a per-unit load and ambient. */
export function steadyHotSpot(m: ThermalCharacteristics, load: number, ambientC: number): number {
  return hotSpotAt(m, thermalLoad('load', load), ambientTemperature('ambient_c', ambientC));
}

/** Steady-state top-oil temperature, °C, at a per-unit load and ambient. */
export function steadyTopOil(m: ThermalCharacteristics, load: number, ambientC: number): number {
  return ambientTemperature('ambient_c', ambientC) + ultimateTopOilRise(m, thermalLoad('load', load));
}

/** Hot-spot limits the root searches accept, °C: below 60 no oil unit is limited; above 200 no guide goes. */
const LIMIT_LOW = 60;
const LIMIT_HIGH = 200;

/** A hot-spot limit, checked by name; it must lie above the ambient it is compared with. */
export function hotSpotLimit(name: string, limitC: number, ambientC: number, ambientName = 'ambient_c'): number {
  const limit = within(name, limitC, LIMIT_LOW, LIMIT_HIGH, '°C', 'a hot-spot limit');
  if (!(limit > ambientC)) throw new InputError(name, `${shown(limit)} °C is not above ${ambientName} (${shown(ambientC)} °C); a limit below the ambient can never be met`);
  return limit;
}

/**
 * The largest constant per-unit load whose steady hot-spot reaches `limitC`: the root of
 * θh(K) = limit. θh rises strictly with K, so a bracket [0, K] and bisection find the one root.
 */
export function maxSteadyLoad(m: ThermalCharacteristics, ambientC: number, limitC: number): number {
  const ambient = ambientTemperature('ambient_c', ambientC);
  const limit = hotSpotLimit('limit_c', limitC, ambient);
  const noLoad = hotSpotAt(m, 0, ambient);
  if (noLoad >= limit) {
    throw new NoAnswerError(`even at no load the hot-spot is ${shown(noLoad)} °C, not below the ${shown(limit)} °C limit`);
  }
  let low = 0;
  let high = 1;
  while (hotSpotAt(m, high, ambient) < limit) {
    low = high;
    high *= 2;
    if (high > 1024) throw new NoAnswerError(`no load up to ${high / 2} per unit reaches the ${shown(limit)} °C limit`);
  }
  // Halve until the bracket is two neighbouring doubles: at most about 1,100 halvings.
  for (;;) {
    const mid = 0.5 * (low + high);
    if (mid <= low || mid >= high) return hotSpotAt(m, high, ambient) - limit < limit - hotSpotAt(m, low, ambient) ? high : low;
    if (hotSpotAt(m, mid, ambient) < limit) low = mid;
    else high = mid;
  }
}
