/**
 * Efficiency at a load: η = P_out / (P_out + P0 + x²·Pk), P_out = x·S·pf (textbook standard).
 * S in kVA, losses in W, x the load in per unit of nameplate kVA.
 */
import { NoAnswerError } from './errors';
import { integerBetween, nonNegative, perUnitLoad, positive, powerFactor } from './guards';

export function efficiencyAt(kva: number, p0Watts: number, pkWatts: number, load: number, pf: number): number {
  const s = positive('kva', kva);
  const p0 = nonNegative('p0_w', p0Watts);
  const pk = nonNegative('pk_w', pkWatts);
  const x = perUnitLoad('load', load);
  const out = x * s * 1000 * powerFactor('pf', pf);
  const losses = p0 + x * x * pk;
  if (out + losses === 0) throw new NoAnswerError('no output and no losses: efficiency is undefined at zero load with zero no-load loss');
  return out / (out + losses);
}

/** Load at which efficiency peaks: where load loss equals no-load loss, x = √(P0/Pk). */
export function maxEfficiencyLoad(p0Watts: number, pkWatts: number): number {
  const p0 = nonNegative('p0_w', p0Watts);
  const pk = positive('pk_w', pkWatts);
  const x = Math.sqrt(p0 / pk);
  if (!Number.isFinite(x)) throw new NoAnswerError('load loss is too small against no-load loss for the peak to lie at any finite load');
  return x;
}

/** The peak efficiency, at x = √(P0/Pk): there the losses are 2·P0, so η = x·S·pf / (x·S·pf + 2·P0). */
export function maxEfficiency(kva: number, p0Watts: number, pkWatts: number, pf: number): number {
  const s = positive('kva', kva);
  const x = maxEfficiencyLoad(p0Watts, pkWatts);
  const out = x * s * 1000 * powerFactor('pf', pf);
  if (x === 0) return 1; // no core loss at all: efficiency approaches 1 as load falls to 0
  return out / (out + 2 * p0Watts);
}

/** Rows of load | efficiency | total losses (W) from 0 to maxLoad in `points` equal steps. */
export function efficiencyCurve(
  kva: number,
  p0Watts: number,
  pkWatts: number,
  pf: number,
  points: number,
  maxLoad: number,
): number[][] {
  const n = integerBetween('points', points, 2, 1001);
  const top = positive('max_load', maxLoad);
  positive('kva', kva);
  nonNegative('p0_w', p0Watts);
  nonNegative('pk_w', pkWatts);
  powerFactor('pf', pf);
  const rows: number[][] = [];
  for (let i = 0; i < n; i++) {
    const x = (top * i) / (n - 1);
    const losses = p0Watts + x * x * pkWatts;
    const out = x * kva * 1000 * pf;
    rows.push([x, out + losses === 0 ? 0 : out / (out + losses), losses]);
  }
  return rows;
}

/**
 * Peak efficiency index, EU Regulation 548/2014 Annex I (from memory):
 * PEI = 1 − 2(P0 + Pc0) / (Sr·√((P0 + Pc0)/Pk)), Pc0 the power the cooling needs at no load.
 */
export function peakEfficiencyIndex(kva: number, p0Watts: number, pkWatts: number, pc0Watts: number): number {
  const sr = positive('kva', kva) * 1000;
  const p0 = positive('p0_w', p0Watts) + nonNegative('pc0_w', pc0Watts);
  const pk = positive('pk_w', pkWatts);
  return 1 - (2 * p0) / (sr * Math.sqrt(p0 / pk));
}
