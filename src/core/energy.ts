/**
 * Energy over a loading profile: per-unit loads x_i (kVA over nameplate kVA) held for t_i hours.
 * Energy out = Σ x_i·S·pf_i·t_i; energy lost = Σ (P0 + x_i²·Pk)·t_i; all-day efficiency is
 * out / (out + lost) (textbook standard). Loads are in kVA per unit, not kW per unit.
 */
import { NoAnswerError } from './errors';
import { atMostOne, eachOf, nonEmpty, nonNegative, oneOrSameLength, perUnitLoad, positive, powerFactor } from './guards';

export interface Profile {
  readonly loads: Float64Array;
  readonly hours: Float64Array;
}

function checkedProfile(loads: Float64Array, hours: Float64Array): Profile {
  eachOf('loads', nonEmpty('loads', loads), perUnitLoad);
  eachOf('hours', oneOrSameLength('hours', nonEmpty('hours', hours), loads.length, 'loads'), positive);
  return { loads, hours };
}

/** Energy delivered to the load over the profile, kWh. */
export function energyDelivered(kva: number, loads: Float64Array, pfs: Float64Array, hours: Float64Array): number {
  const s = positive('kva', kva);
  const p = checkedProfile(loads, hours);
  eachOf('pfs', oneOrSameLength('pfs', nonEmpty('pfs', pfs), loads.length, 'loads'), powerFactor);
  return s * sumOfProducts(p.loads, pfs, p.hours);
}

/** Energy lost in the transformer over the profile, kWh. */
export function energyLost(p0Watts: number, pkWatts: number, loads: Float64Array, hours: Float64Array): number {
  const p0 = nonNegative('p0_w', p0Watts);
  const pk = nonNegative('pk_w', pkWatts);
  const p = checkedProfile(loads, hours);
  return lostKwh(p0, pk, p);
}

function lostKwh(p0: number, pk: number, p: Profile): number {
  const { loads, hours } = p;
  const fixedStep = hours.length === 1 ? hours[0]! : 0;
  let squareHours = 0;
  let totalHours = 0;
  for (let i = 0; i < loads.length; i++) {
    const t = fixedStep || hours[i]!;
    const x = loads[i]!;
    squareHours += x * x * t;
    totalHours += t;
  }
  return (p0 * totalHours + pk * squareHours) / 1000;
}

function sumOfProducts(loads: Float64Array, pfs: Float64Array, hours: Float64Array): number {
  const pfFixed = pfs.length === 1 ? pfs[0]! : 0;
  const tFixed = hours.length === 1 ? hours[0]! : 0;
  let sum = 0;
  for (let i = 0; i < loads.length; i++) {
    sum += loads[i]! * (pfFixed || pfs[i]!) * (tFixed || hours[i]!);
  }
  return sum;
}

/** All-day (energy) efficiency over the profile. */
export function allDayEfficiency(
  kva: number,
  p0Watts: number,
  pkWatts: number,
  loads: Float64Array,
  pfs: Float64Array,
  hours: Float64Array,
): number {
  const out = energyDelivered(kva, loads, pfs, hours);
  const lost = energyLost(p0Watts, pkWatts, loads, hours);
  if (out + lost === 0) throw new NoAnswerError('the profile delivers no energy and loses none: efficiency is undefined');
  return out / (out + lost);
}

/** Mean load, mean of load² and peak load of a checked profile of equal steps. */
function loadStatistics(loads: Float64Array): { mean: number; meanSquare: number; peak: number } {
  eachOf('loads', nonEmpty('loads', loads), perUnitLoad);
  let sum = 0;
  let sumOfSquares = 0;
  let peak = 0;
  for (let i = 0; i < loads.length; i++) {
    const x = loads[i]!;
    sum += x;
    sumOfSquares += x * x;
    if (x > peak) peak = x;
  }
  return { mean: sum / loads.length, meanSquare: sumOfSquares / loads.length, peak };
}

/** Load factor: mean load over peak load, for equal steps. */
export function loadFactor(loads: Float64Array): number {
  const { mean, peak } = loadStatistics(loads);
  if (peak === 0) throw new NoAnswerError('every load is zero: the load factor is undefined');
  return mean / peak;
}

/** Loss factor: mean of load² over peak load², for equal steps — the exact one from the profile. */
export function lossFactor(loads: Float64Array): number {
  const { meanSquare, peak } = loadStatistics(loads);
  if (peak === 0) throw new NoAnswerError('every load is zero: the loss factor is undefined');
  return meanSquare / (peak * peak);
}

/**
 * Empirical loss factor from the load factor: k·LF + (1 − k)·LF², k ≈ 0.3 (common practice;
 * the form is usually credited to Buller and Woodrow, from memory).
 */
export function lossFactorEstimate(loadFactorValue: number, k: number): number {
  const lf = atMostOne('load_factor', loadFactorValue);
  const kk = atMostOne('k', k);
  return kk * lf + (1 - kk) * lf * lf;
}
