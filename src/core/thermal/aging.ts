/**
 * Insulation aging as a function of hot-spot temperature θh (°C).
 *  - Thermally upgraded paper, reference 110 °C: the aging acceleration factor
 *    F_AA = exp(15000/383 − 15000/(θh + 273)) (IEEE C57.91 clause 5; IEC 60076-7 gives the same
 *    relative aging rate for upgraded paper; from memory, docs/references.md).
 *  - Normal (non-upgraded) kraft paper, reference 98 °C: V = 2^((θh − 98)/6), doubling every 6 K
 *    (IEC 60076-7, from memory).
 * Over a profile, the equivalent aging F_EQA = Σ V_n·Δt_n / Σ Δt_n, and the life consumed is
 * Σ V_n·Δt_n hours at the reference temperature (IEEE C57.91 clause 5, from memory).
 */
import { nonNegative, positive, within } from '../guards';
import { NORMAL_LIFE_HOURS, type Paper } from './coolingTable';

/** Arrhenius constant B = 15000 K and reference 110 °C = 383 K of the F_AA law. */
const B = 15000;
const A = B / 383;
const CELSIUS_TO_KELVIN = 273;
/** ln 2 / 6: the normal-paper rate doubles every 6 K. */
const DOUBLING = Math.LN2 / 6;

/** Hot-spot temperatures the aging laws are asked about: -60 to 250 °C (plausibility bound). */
function hotSpot(name: string, value: number): number {
  return within(name, value, -60, 250, '°C', 'a hot-spot temperature');
}

/** F_AA for thermally upgraded paper: 1 at 110 °C. */
export function agingAccelerationFactor(hotSpotC: number): number {
  return upgradedRate(hotSpot('hotspot_c', hotSpotC));
}

/** Relative aging rate for the paper kind: F_AA for upgraded paper, 2^((θh − 98)/6) for normal. */
export function relativeAgingRate(hotSpotC: number, paper: Paper): number {
  const t = hotSpot('hotspot_c', hotSpotC);
  return paper === 'upgraded' ? upgradedRate(t) : normalRate(t);
}

/** The rate laws without guards, for the kernels: one exp each. */
export function upgradedRate(hotSpotC: number): number {
  return Math.exp(A - B / (hotSpotC + CELSIUS_TO_KELVIN));
}

export function normalRate(hotSpotC: number): number {
  return Math.exp((hotSpotC - 98) * DOUBLING);
}

/** The reference hot-spot temperature at which a paper's rate is 1, °C. */
export function referenceHotSpot(paper: Paper): number {
  return paper === 'upgraded' ? 110 : 98;
}

/** Σ V(θh_i): the sum of the aging rates over a hot-spot series (multiply by the step for hours). */
export function agingRateSum(hotSpots: Float64Array, paper: Paper): number {
  const rate = paper === 'upgraded' ? upgradedRate : normalRate;
  let sum = 0;
  for (let i = 0; i < hotSpots.length; i++) sum += rate(hotSpots[i]!);
  return sum;
}

/**
 * Life consumed as a fraction of a normal life: hours at the reference temperature over
 * NORMAL_LIFE_HOURS (180,000 h, unless another criterion's life is given).
 */
export function lifeFraction(lifeUsedHours: number, normalLifeHours: number = NORMAL_LIFE_HOURS): number {
  return nonNegative('life_used_h', lifeUsedHours) / positive('normal_life_h', normalLifeHours);
}
