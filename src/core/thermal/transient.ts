/**
 * Temperatures and aging over a loading profile: per-unit loads K_i and ambients θa_i, each held
 * for one step of Δt hours.
 *
 * The differential equations (IEC 60076-7 clause 8.2.3, from memory), with the ultimate rises of
 * steadyState.ts, U(K) = Δθor·[(1 + R·K²)/(1 + R)]^x and G(K) = Hgr·K^y:
 *   k11·τo · dθo/dt   = U(K) − (θo − θa)
 *   k22·τw · dΔθh1/dt = k21·G(K) − Δθh1
 *   (τo/k22) · dΔθh2/dt = (k21 − 1)·G(K) − Δθh2
 *   θh = θo + Δθh1 − Δθh2
 * IEEE C57.91 clause 7 is the case k11 = k21 = k22 = 1 (Δθh2 stays 0), with two differences:
 *  - its state is the top-oil rise over ambient, so a change of ambient moves the top oil at once,
 *    where IEC carries the top-oil temperature across the step;
 *  - its top-oil time constant depends on the step for n ≠ 1 (clause 7):
 *      τ_TO = τ_TO,R · (Δθ_U/Δθ_R − Δθ_i/Δθ_R) / ((Δθ_U/Δθ_R)^(1/n) − (Δθ_i/Δθ_R)^(1/n))
 *    with Δθ_i the rise at the start of the step and Δθ_U the one its load settles to; where the two
 *    meet, the limit τ_TO,R · n · (Δθ_U/Δθ_R)^(1 − 1/n). (Δθ_U/Δθ_R)^(1/n) is the loss ratio
 *    (1 + R·K²)/(1 + R) itself, so the correction costs one power, of the starting rise.
 *
 * With K and θa constant over a step each equation is linear, so each step is solved exactly,
 * θ ← U + (θ − U)·e^(−Δt/τ) — the guides' exponential equations — rather than by IEC's explicit
 * difference scheme, which needs Δt ≤ τw/2 (a few minutes) to stay stable. Within the step the
 * hot-spot is then θh(t) = C + c1·e^(−t/τ1) + c2·e^(−t/τ2) + c3·e^(−t/τ3), and the aging of the
 * step, ∫ V(θh(t)) dt, is integrated along that curve by adaptive Simpson quadrature (relative
 * tolerance 1e-6 a step), not taken from the end-of-step hot-spot: with τw of a few minutes the
 * hot-spot moves within the first minutes of an hourly step, and an end value held for the whole
 * hour misstates the aging by several per cent over a daily cycle.
 *
 * Powers are taken as exp(p·ln b): Math.pow costs about three times as much in V8
 * (bench/thermal.bench.ts). The profile starts from the steady state of its first load and
 * ambient (common practice); the temperatures reported for a step are those at its end, and the
 * peaks are the largest step-end values (for IEEE the temperatures move monotonically within a
 * step, so no peak lies between step ends; IEC's k21 > 1 overshoot can peak inside a step).
 */
import { ambientTemperature, eachOf, nonEmpty, oneOrSameLength, positive, within } from '../guards';
import { normalRate, upgradedRate } from './aging';
import type { Paper, ThermalCharacteristics } from './coolingTable';
import { thermalLoad } from './steadyState';

/** Step lengths accepted, h: longer than a leap year is not a step. */
export const MAX_STEP_HOURS = 8784;

/** Checks a profile the way every transient function reads it; refusals name the cell argument. */
export function checkProfile(loads: Float64Array, ambients: Float64Array, stepHours: number): void {
  eachOf('loads', nonEmpty('loads', loads), thermalLoad);
  eachOf('ambients', oneOrSameLength('ambients', nonEmpty('ambients', ambients), loads.length, 'loads'), ambientTemperature);
  within('hours', positive('hours', stepHours), 0, MAX_STEP_HOURS, 'h', 'a step length');
}

export interface ProfileOptions {
  /** Every load is multiplied by this (CYCLICMAX's trial factor); default 1. */
  readonly scale?: number;
  /** Integrate the aging for this paper; absent: no aging (agingHours is NaN). */
  readonly paper?: Paper;
  /** Filled with the end-of-step hot-spot, °C, when given (same length as the loads). */
  readonly hotSpots?: Float64Array;
  /** Filled with the end-of-step top-oil temperature, °C, when given. */
  readonly topOils?: Float64Array;
}

export interface ProfileRun {
  readonly peakHotSpot: number;
  /** 0-based step of the peak hot-spot (the first, if several are equal). */
  readonly peakHotSpotStep: number;
  readonly peakTopOil: number;
  readonly peakTopOilStep: number;
  /** Σ ∫ V dt over the profile, hours at the paper's reference hot-spot; NaN without a paper. */
  readonly agingHours: number;
}

/** Relative tolerance of a step's aging integral, and how deep the step may be halved. */
const AGING_TOLERANCE = 1e-6;
const MAX_DEPTH = 14;

/**
 * The within-step hot-spot curve θh(t) = C + Σ c_j·e^(−t/τ_j), t in minutes, and the aging law:
 * [C, c1, 1/τ1, c2, 1/τ2, c3, 1/τ3, upgraded ? 1 : 0].
 */
type Curve = Float64Array;

function rateAt(p: Curve, t: number): number {
  const th = p[0]! + p[1]! * Math.exp(-t * p[2]!) + p[3]! * Math.exp(-t * p[4]!) + (p[5] === 0 ? 0 : p[5]! * Math.exp(-t * p[6]!));
  return p[7] === 1 ? upgradedRate(th) : normalRate(th);
}

function adaptiveSimpson(p: Curve, a: number, b: number, fa: number, fm: number, fb: number, whole: number, tol: number, depth: number): number {
  const m = 0.5 * (a + b);
  const lm = 0.5 * (a + m);
  const rm = 0.5 * (m + b);
  const flm = rateAt(p, lm);
  const frm = rateAt(p, rm);
  const left = ((m - a) / 6) * (fa + 4 * flm + fm);
  const right = ((b - m) / 6) * (fm + 4 * frm + fb);
  const diff = left + right - whole;
  // The first halving is always taken: a winding transient of a few minutes can hide between
  // the three points of the whole step.
  if (depth < MAX_DEPTH && (depth === 0 || Math.abs(diff) > 15 * tol)) {
    return adaptiveSimpson(p, a, m, fa, flm, fm, left, 0.5 * tol, depth + 1) + adaptiveSimpson(p, m, b, fm, frm, fb, right, 0.5 * tol, depth + 1);
  }
  return left + right + diff / 15;
}

/** ∫ V(θh(t)) dt over one step of `dtMin` minutes, in minutes at the reference hot-spot. */
function stepAging(p: Curve, dtMin: number, fStart: number, fEnd: number): number {
  const fm = rateAt(p, 0.5 * dtMin);
  const whole = (dtMin / 6) * (fStart + 4 * fm + fEnd);
  return adaptiveSimpson(p, 0, dtMin, fStart, fm, fEnd, whole, AGING_TOLERANCE * Math.max(whole, 1e-300), 0);
}

/**
 * The kernel: one pass over the profile giving the peaks, the aging (when a paper is given) and
 * the end-of-step series asked for. No checks: call checkProfile first. `ambients` holds one
 * value or one per step.
 */
export function runProfile(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number, options: ProfileOptions = {}): ProfileRun {
  const n = loads.length;
  const scale = options.scale ?? 1;
  const hotOut = options.hotSpots;
  const oilOut = options.topOils;
  const paper = options.paper;
  const curve: Curve | null = paper === undefined ? null : new Float64Array(8);
  if (curve !== null) curve[7] = paper === 'upgraded' ? 1 : 0;
  const rate = paper === 'upgraded' ? upgradedRate : normalRate;

  const dtMin = stepHours * 60;
  const r = m.lossRatio;
  const x = m.oilExponent;
  const invX = 1 / x;
  const y = m.windingExponent;
  const riseRated = m.topOilRise;
  const gradientRated = m.hotSpotGradient;
  const k21 = m.k21;
  const k21m1 = k21 - 1;
  const perR1 = 1 / (1 + r);
  const ieee = m.method === 'IEEE';
  const tauOilRated = m.k11 * m.oilTimeConstant;
  const tauH1 = m.k22 * m.windingTimeConstant;
  const tauH2 = m.oilTimeConstant / m.k22;
  const fixedOilDecay = Math.exp(-dtMin / tauOilRated);
  const h1Decay = Math.exp(-dtMin / tauH1);
  const h2Decay = Math.exp(-dtMin / tauH2);
  // IEEE's time constant varies with the step unless n = 1.
  const correctTau = ieee && x !== 1;
  const oneAmbient = ambients.length === 1;
  // Exponents of 1 (OF, OD oil) and 2 (OD winding) need no transcendental call at all.
  const oilLinear = x === 1;
  const windingSquare = y === 2;
  const halfY = y / 2; // K^y = exp((y/2)·ln K²): K² is needed anyway; ln 0 = -∞ gives 0

  const k0 = loads[0]! * scale;
  let ambient = ambients[0]!;
  // rise: top-oil rise over the current ambient (IEEE's state; IEC carries θo = ambient + rise).
  let rise = riseRated * Math.pow((1 + r * k0 * k0) * perR1, x);
  const g0 = gradientRated * Math.pow(k0, y);
  let h1 = k21 * g0;
  let h2 = k21m1 * g0;
  let peakHot = -Infinity;
  let peakHotStep = 0;
  let peakOil = -Infinity;
  let peakOilStep = 0;
  let aging = 0;
  let rateEnd = curve === null ? 0 : rate(ambient + rise + h1 - h2);
  for (let i = 0; i < n; i++) {
    const k = loads[i]! * scale;
    const k2 = k * k;
    const ratio = (1 + r * k2) * perR1;
    const u = riseRated * (oilLinear ? ratio : Math.exp(x * Math.log(ratio)));
    const g = gradientRated * (windingSquare ? k2 : Math.exp(halfY * Math.log(k2)));
    const a = oneAmbient ? ambient : ambients[i]!;
    // IEC carries the top-oil temperature into the step: its rise over the new ambient changes.
    if (!ieee) rise += ambient - a;
    const ambientMoved = a !== ambient;
    ambient = a;
    let oilDecay = fixedOilDecay;
    let tauOil = tauOilRated;
    if (correctTau) {
      const ui = rise / riseRated;
      const uu = u / riseRated;
      const gap = uu - ui;
      tauOil = Math.abs(gap) > 1e-9 * uu ? (tauOilRated * gap) / (ratio - Math.exp(invX * Math.log(ui))) : tauOilRated * x * Math.exp((1 - invX) * Math.log(uu));
      oilDecay = Math.exp(-dtMin / tauOil);
    }
    const c1 = rise - u;
    const c2 = h1 - k21 * g;
    const c3 = k21m1 * g - h2;
    rise = u + c1 * oilDecay;
    h1 = k21 * g + c2 * h1Decay;
    h2 = k21m1 * g - c3 * h2Decay;
    const oil = a + rise;
    const hot = oil + h1 - h2;
    if (hotOut !== undefined) hotOut[i] = hot;
    if (oilOut !== undefined) oilOut[i] = oil;
    if (hot > peakHot) {
      peakHot = hot;
      peakHotStep = i;
    }
    if (oil > peakOil) {
      peakOil = oil;
      peakOilStep = i;
    }
    if (curve !== null) {
      const rateStart = ieee && ambientMoved ? rate(a + u + g + c1 + c2 + c3) : rateEnd;
      rateEnd = rate(hot);
      // A step whose hot-spot barely moves needs no quadrature: the two ends agree to 1e-9.
      if (Math.abs(c1) + Math.abs(c2) + Math.abs(c3) < 1e-7) {
        aging += 0.5 * (rateStart + rateEnd) * dtMin;
      } else {
        curve[0] = a + u + g;
        curve[1] = c1;
        curve[2] = 1 / tauOil;
        curve[3] = c2;
        curve[4] = 1 / tauH1;
        curve[5] = c3;
        curve[6] = 1 / tauH2;
        aging += stepAging(curve, dtMin, rateStart, rateEnd);
      }
    }
  }
  return {
    peakHotSpot: peakHot,
    peakHotSpotStep: peakHotStep,
    peakTopOil: peakOil,
    peakTopOilStep: peakOilStep,
    agingHours: curve === null ? Number.NaN : aging / 60,
  };
}

/**
 * End-of-step hot-spot temperature of each step written into `out` (same length as `loads`).
 * No checks: call checkProfile first.
 */
export function hotSpotSeriesInto(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number, out: Float64Array): Float64Array {
  runProfile(m, loads, ambients, stepHours, { hotSpots: out });
  return out;
}

/** End-of-step top-oil temperature of each step written into `out`. No checks. */
export function topOilSeriesInto(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number, out: Float64Array): Float64Array {
  runProfile(m, loads, ambients, stepHours, { topOils: out });
  return out;
}
