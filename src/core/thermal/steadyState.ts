/**
 * Steady-state temperatures at a constant per-unit load K and ambient θa (IEEE C57.91 clause 7;
 * IEC 60076-7 clause 8.2, both from memory):
 *   ultimate top-oil rise    Δθo = Δθor · [(1 + R·K²)/(1 + R)]^x
 *   ultimate hot-spot rise   Δθh = Hgr · K^y
 *   hot-spot                 θh  = θa + Δθo + Δθh
 * and the largest steady load whose hot-spot reaches a limit.
 */
import { NoAnswerError, shown } from '../errors';
import { ambientTemperature, perUnitLoadAtMost, positive, within } from '../guards';
import { thermalCharacteristics, type Cooling, type ThermalCharacteristics, type ThermalMethod } from './coolingTable';

/** Loads above this many per unit are refused: far beyond the loading guides' emergency limits. */
export const MAX_THERMAL_LOAD = 3;

export function thermalLoad(name: string, value: number): number {
  return perUnitLoadAtMost(name, value, MAX_THERMAL_LOAD);
}

/**
 * The table row for the cooling and method, with the unit's own rated top-oil
 * rise, hot-spot gradient and loss ratio where given (undefined keeps the table's value).
 */
export function thermalModel(
  cooling: Cooling,
  method: ThermalMethod,
  topOilRise: number | undefined,
  hotSpotGradient: number | undefined,
  lossRatio: number | undefined,
): ThermalCharacteristics {
  const row = thermalCharacteristics(method, cooling);
  if (topOilRise === undefined && hotSpotGradient === undefined && lossRatio === undefined) return row;
  return {
    ...row,
    topOilRise: topOilRise === undefined ? row.topOilRise : ratedRise('top_oil_rise', topOilRise, 120),
    hotSpotGradient: hotSpotGradient === undefined ? row.hotSpotGradient : ratedRise('hs_gradient', hotSpotGradient, 100),
    lossRatio: lossRatio === undefined ? row.lossRatio : within('loss_ratio', lossRatio, 0, 100, '', 'the ratio of load loss to no-load loss'),
    source: `${row.source}; rated values from the user`,
  };
}

function ratedRise(name: string, value: number, max: number): number {
  return within(name, positive(name, value), 0, max, 'K', 'a rated temperature rise');
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

/** Hot-spot limits the root search accepts, °C: below 60 no oil unit is limited; above 200 no guide goes. */
const LIMIT_LOW = 60;
const LIMIT_HIGH = 200;

/**
 * The largest constant per-unit load whose steady hot-spot reaches `limitC`: the root of
 * θh(K) = limit. θh rises strictly with K, so a bracket [0, K] and bisection find the one root.
 */
export function maxSteadyLoad(m: ThermalCharacteristics, ambientC: number, limitC: number): number {
  const ambient = ambientTemperature('ambient_c', ambientC);
  const limit = within('limit_c', limitC, LIMIT_LOW, LIMIT_HIGH, '°C', 'a hot-spot limit');
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
