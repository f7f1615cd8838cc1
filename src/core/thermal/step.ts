/**
 * The step-load check of the loading guides: a unit settled at load K1 and ambient θa steps to K2
 * at t = 0. Its top oil and hot-spot follow the exponential equations of IEEE C57.91 clause 7
 * (with the clause's top-oil time constant for n ≠ 1) or, for the IEC methods, the solution of the
 * IEC 60076-7 clause 8.2.3 differential equations (from memory) — the same step the profile
 * kernel of transient.ts takes, written out in closed form:
 *   θh(t) = θa + U2 + G2 + c1·e^(−t/τ1) + c2·e^(−t/τ2) + c3·e^(−t/τ3)
 *   IEEE: c1 = U1 − U2 (τ1 = τ_TO of clause 7), c2 = G1 − G2 (τ2 = τw), c3 = 0
 *   IEC:  c1 = U1 − U2 (τ1 = k11·τo), c2 = k21·(G1 − G2) (τ2 = k22·τw), c3 = −(k21 − 1)·(G1 − G2) (τ3 = τo/k22)
 * OVERLOADTIME is the first root of θh(t) = limit, found on a grid and refined by bisection.
 */
import { NoAnswerError, shown } from '../errors';
import { ambientTemperature, nonNegative, within } from '../guards';
import type { ThermalCharacteristics } from './coolingTable';
import { hotSpotLimit, thermalLoad, ultimateHotSpotGradient, ultimateTopOilRise } from './steadyState';
import { MAX_STEP_HOURS } from './transient';

export interface StepResponse {
  readonly ambient: number;
  /** Ultimate top-oil rise and hot-spot gradient before (1) and after (2) the step, K. */
  readonly rise1: number;
  readonly rise2: number;
  readonly gradient1: number;
  readonly gradient2: number;
  /** The time constants of the three terms, minutes. */
  readonly tauOil: number;
  readonly tauWinding: number;
  readonly tauSlow: number;
  readonly c1: number;
  readonly c2: number;
  readonly c3: number;
}

/**
 * IEEE C57.91 clause 7 top-oil time constant of a step from rise Δθ_i to ultimate rise Δθ_U
 * (both over ambient, K), for the rated constant τ_R and exponent n; the limit where they meet.
 */
export function ieeeTopOilTimeConstant(tauRated: number, ratedRise: number, initialRise: number, ultimateRise: number, n: number): number {
  if (n === 1) return tauRated;
  const ui = initialRise / ratedRise;
  const uu = ultimateRise / ratedRise;
  const gap = uu - ui;
  if (Math.abs(gap) <= 1e-9 * uu) return tauRated * n * Math.pow(uu, 1 - 1 / n);
  return (tauRated * gap) / (Math.pow(uu, 1 / n) - Math.pow(ui, 1 / n));
}

/** The step's response terms; loads and ambient checked by the names of the cell arguments. */
export function stepResponse(m: ThermalCharacteristics, loadBefore: number, loadAfter: number, ambientC: number): StepResponse {
  const k1 = thermalLoad('load_before', loadBefore);
  const k2 = thermalLoad('load_after', loadAfter);
  const ambient = ambientTemperature('ambient_c', ambientC);
  const rise1 = ultimateTopOilRise(m, k1);
  const rise2 = ultimateTopOilRise(m, k2);
  const gradient1 = ultimateHotSpotGradient(m, k1);
  const gradient2 = ultimateHotSpotGradient(m, k2);
  const ieee = m.method === 'IEEE';
  const tauOil = ieee ? ieeeTopOilTimeConstant(m.oilTimeConstant, m.topOilRise, rise1, rise2, m.oilExponent) : m.k11 * m.oilTimeConstant;
  const dg = gradient1 - gradient2;
  return {
    ambient,
    rise1,
    rise2,
    gradient1,
    gradient2,
    tauOil,
    tauWinding: m.k22 * m.windingTimeConstant,
    tauSlow: m.oilTimeConstant / m.k22,
    c1: rise1 - rise2,
    c2: m.k21 * dg,
    c3: -(m.k21 - 1) * dg,
  };
}

/** Top-oil temperature `minutes` after the step, °C. */
export function stepTopOilAt(s: StepResponse, minutes: number): number {
  return s.ambient + s.rise2 + s.c1 * Math.exp(-minutes / s.tauOil);
}

/** Hot-spot temperature `minutes` after the step, °C. */
export function stepHotSpotAt(s: StepResponse, minutes: number): number {
  return (
    s.ambient + s.rise2 + s.gradient2 + s.c1 * Math.exp(-minutes / s.tauOil) + s.c2 * Math.exp(-minutes / s.tauWinding) + s.c3 * Math.exp(-minutes / s.tauSlow)
  );
}

/** XFMR.HOTSPOTSTEP in core terms: the hot-spot `hours` after the step, °C. */
export function hotSpotAfterStep(m: ThermalCharacteristics, loadBefore: number, loadAfter: number, hours: number, ambientC: number): number {
  const h = within('hours', nonNegative('hours', hours), 0, MAX_STEP_HOURS, 'h', 'a time after the step');
  return stepHotSpotAt(stepResponse(m, loadBefore, loadAfter, ambientC), h * 60);
}

export interface OverloadTime {
  /** Hours from the step until the hot-spot first reaches the limit. */
  readonly hours: number;
  /** How many times the closed-form hot-spot was evaluated. */
  readonly evaluations: number;
}

/** Grid of the first-crossing search: from 0.05 min, each point 25 % later than the last. */
const GRID_START_MIN = 0.05;
const GRID_GROWTH = 1.25;

/**
 * Hours until the hot-spot first reaches `limitC` after the step. 0 when it is already there at
 * the step; NoAnswerError when it never gets there (it settles below, or only beyond a year).
 * The curve is evaluated on a grid 25 % apart from 3 s to a year — about 77 points — and the
 * first bracketing interval is halved to 1e-9 of its length: about 30 more.
 */
export function overloadTime(m: ThermalCharacteristics, loadBefore: number, loadAfter: number, ambientC: number, limitC: number): OverloadTime {
  const s = stepResponse(m, loadBefore, loadAfter, ambientC);
  const limit = hotSpotLimit('limit_c', limitC, s.ambient);
  let evaluations = 1;
  const f = (t: number) => {
    evaluations++;
    return stepHotSpotAt(s, t) - limit;
  };
  if (stepHotSpotAt(s, 0) >= limit) return { hours: 0, evaluations };
  const endMin = MAX_STEP_HOURS * 60;
  let lo = 0;
  let hi = GRID_START_MIN;
  let found = false;
  while (lo < endMin) {
    if (f(hi) >= 0) {
      found = true;
      break;
    }
    lo = hi;
    hi = Math.min(hi * GRID_GROWTH, endMin);
    if (lo === endMin) break;
  }
  if (!found) {
    const ultimate = s.ambient + s.rise2 + s.gradient2;
    throw new NoAnswerError(
      ultimate < limit
        ? `the hot-spot never reaches ${shown(limit)} °C: it settles at ${shown(ultimate)} °C`
        : `the hot-spot does not reach ${shown(limit)} °C within ${MAX_STEP_HOURS} h`,
    );
  }
  const tolerance = 1e-9 * (hi - lo);
  while (hi - lo > tolerance) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    if (f(mid) >= 0) hi = mid;
    else lo = mid;
  }
  return { hours: hi / 60, evaluations };
}
