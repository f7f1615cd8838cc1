/**
 * Efficiency at a load: η = P_out / (P_out + P0 + x²·Pk), P_out = x·S·pf (textbook standard).
 * S in kVA, losses in W, x the load in per unit of nameplate kVA.
 */
import { NoAnswerError } from './errors';
import { integerBetween, nonNegative, perUnitLoad, positive, powerFactor } from './guards';
import { totalLossesAt } from './losses';

export function efficiencyAt(kva: number, p0Watts: number, pkWatts: number, load: number, pf: number): number {
  const s = positive('kva', kva);
  const p0 = nonNegative('p0_w', p0Watts);
  const pk = nonNegative('pk_w', pkWatts);
  const x = perUnitLoad('load', load);
  const out = x * s * 1000 * powerFactor('pf', pf);
  const losses = totalLossesAt(p0, pk, x);
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

/** The peak efficiency: the efficiency at x = √(P0/Pk), where the losses are 2·P0. */
export function maxEfficiency(kva: number, p0Watts: number, pkWatts: number, pf: number): number {
  const x = maxEfficiencyLoad(p0Watts, pkWatts);
  if (x === 0) {
    // No core loss at all: efficiency approaches 1 as the load falls to 0.
    positive('kva', kva);
    powerFactor('pf', pf);
    return 1;
  }
  return efficiencyAt(kva, p0Watts, pkWatts, x, pf);
}

/**
 * Rows of load | efficiency | total losses (W) from 0 to maxLoad in `points` equal steps, each
 * row computed as EFF and LOSSES compute it; a load with no answer (no output and no losses)
 * holds NaN, which the cell layer shows as #NUM! in that cell alone.
 */
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
  const rows: number[][] = [];
  for (let i = 0; i < n; i++) {
    const x = (top * i) / (n - 1);
    rows.push([x, efficiencyOrNaN(kva, p0Watts, pkWatts, x, pf), totalLossesAt(p0Watts, pkWatts, x)]);
  }
  return rows;
}

function efficiencyOrNaN(kva: number, p0Watts: number, pkWatts: number, load: number, pf: number): number {
  try {
    return efficiencyAt(kva, p0Watts, pkWatts, load, pf);
  } catch (error) {
    if (error instanceof NoAnswerError) return Number.NaN;
    throw error;
  }
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
