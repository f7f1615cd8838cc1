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
 * step, ∫ V(θh(t)) dt, is integrated along that curve (three-point Gauss–Legendre on panels that
 * double from the fastest time constant: 15 nodes for an hourly step with τw = 4 min, within 1e-5
 * of a one-second sum), not taken from the end-of-step hot-spot: with τw of a few minutes the
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

/** Gauss–Legendre nodes and weights on [-1, 1], three points. */
const GL_X = [-Math.sqrt(0.6), 0, Math.sqrt(0.6)];
const GL_W = [5 / 9, 8 / 9, 5 / 9];

/**
 * Quadrature nodes for the aging of one step of `dtMin` minutes: four-point Gauss–Legendre on
 * panels that double in length from half the fastest time constant — [0, τ/2], [τ/2, τ], [τ, 2τ]…
 * up to the step's end — so the first minutes after a load change, where the winding term moves
 * the hot-spot, get as many nodes as the slow rest of the step. Weights are in minutes.
 */
export function agingNodes(dtMin: number, fastestMin: number): { t: Float64Array; w: Float64Array } {
  const edges = [0];
  let edge = fastestMin;
  while (edge < dtMin) {
    edges.push(edge);
    edge *= 2;
  }
  edges.push(dtMin);
  const count = (edges.length - 1) * GL_X.length;
  const t = new Float64Array(count);
  const w = new Float64Array(count);
  let k = 0;
  for (let p = 0; p + 1 < edges.length; p++) {
    const half = 0.5 * (edges[p + 1]! - edges[p]!);
    const mid = 0.5 * (edges[p + 1]! + edges[p]!);
    for (let j = 0; j < GL_X.length; j++, k++) {
      t[k] = mid + half * GL_X[j]!;
      w[k] = half * GL_W[j]!;
    }
  }
  return { t, w };
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
  const withAging = paper !== undefined;
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

  // The aging quadrature: nodes fixed for the profile, with the decay of every fixed time constant
  // at each node computed once, so a node costs one exp (two for IEEE's step-dependent τ_TO).
  const nodes = withAging ? agingNodes(dtMin, Math.min(tauH1, tauH2, correctTau ? 0.5 * tauOilRated : tauOilRated)) : null;
  const nodeCount = nodes === null ? 0 : nodes.t.length;
  const e1 = new Float64Array(nodeCount);
  const e2 = new Float64Array(nodeCount);
  const e3 = new Float64Array(nodeCount);
  for (let j = 0; j < nodeCount; j++) {
    const t = nodes!.t[j]!;
    e1[j] = Math.exp(-t / tauOilRated);
    e2[j] = Math.exp(-t / tauH1);
    e3[j] = Math.exp(-t / tauH2);
  }
  const weights = nodes === null ? new Float64Array(0) : nodes.w;
  const times = nodes === null ? new Float64Array(0) : nodes.t;
  const upgraded = paper === 'upgraded';

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
  for (let i = 0; i < n; i++) {
    const k = loads[i]! * scale;
    const k2 = k * k;
    const ratio = (1 + r * k2) * perR1;
    const u = riseRated * (oilLinear ? ratio : Math.exp(x * Math.log(ratio)));
    const g = gradientRated * (windingSquare ? k2 : Math.exp(halfY * Math.log(k2)));
    const a = oneAmbient ? ambient : ambients[i]!;
    // IEC carries the top-oil temperature into the step: its rise over the new ambient changes.
    if (!ieee) rise += ambient - a;
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
    if (withAging) {
      const base = a + u + g;
      // A step whose hot-spot barely moves needs no quadrature: the ends agree to 1e-9.
      if (Math.abs(c1) + Math.abs(c2) + Math.abs(c3) < 1e-7) {
        aging += rate(hot) * dtMin;
      } else {
        // IEEE's τ_TO of the step differs from the rated one the node decays were computed with:
        // e^(−t/τ) = e^(−t/τ_R)·e^(−t·δ), δ = 1/τ − 1/τ_R, the second factor by its Taylor series
        // where t·δ stays below 0.1 over the step (error below 1e-8), by exp otherwise.
        const delta = correctTau ? 1 / tauOil - 1 / tauOilRated : 0;
        const series = Math.abs(delta) * dtMin < 0.1;
        let sum = 0;
        for (let j = 0; j < nodeCount; j++) {
          let d1 = e1[j]!;
          if (delta !== 0) {
            const z = -times[j]! * delta;
            d1 *= series ? 1 + z * (1 + z * (0.5 + z * (1 / 6 + z * (1 / 24 + z / 120)))) : Math.exp(z);
          }
          const th = base + c1 * d1 + c2 * e2[j]! + c3 * e3[j]!;
          sum += weights[j]! * (upgraded ? upgradedRate(th) : normalRate(th));
        }
        aging += sum;
      }
    }
  }
  return {
    peakHotSpot: peakHot,
    peakHotSpotStep: peakHotStep,
    peakTopOil: peakOil,
    peakTopOilStep: peakOilStep,
    agingHours: withAging ? aging / 60 : Number.NaN,
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
