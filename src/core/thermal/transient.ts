/**
 * Hot-spot temperature over a loading profile: per-unit loads K_i and ambients θa_i, each held for
 * one step of Δt hours.
 *
 * The differential equations (IEC 60076-7 clause 8.2.3, from memory), with the ultimate rises of
 * steadyState.ts, U(K) = Δθor·[(1 + R·K²)/(1 + R)]^x and G(K) = Hgr·K^y:
 *   k11·τo · dθo/dt   = U(K) − (θo − θa)
 *   k22·τw · dΔθh1/dt = k21·G(K) − Δθh1
 *   (τo/k22) · dΔθh2/dt = (k21 − 1)·G(K) − Δθh2
 *   θh = θo + Δθh1 − Δθh2
 * IEEE C57.91 clause 7 is the case k11 = k21 = k22 = 1 (Δθh2 stays 0), with one difference: its
 * state is the top-oil rise over ambient, so a change of ambient moves the top oil at once, where
 * IEC carries the top-oil temperature across the step. IEEE's correction of τo for n ≠ 1 is not
 * applied: the rated oil time constant serves every step.
 *
 * With K and θa constant over a step the equations are linear with constant coefficients, so each
 * step is solved exactly, θ ← U + (θ − U)·e^(−Δt/τ) — IEC's exponential equations — rather than by
 * IEC's explicit difference scheme, which needs Δt ≤ τw/2 (a few minutes) to stay stable. The
 * decay factors are computed once for the profile, so a step costs two logarithms and two
 * exponentials (fewer where an exponent is 1 or 2) and no allocation. Powers are taken as
 * exp(p·ln b): Math.pow costs about three times as much in V8 (bench/thermal.bench.ts).
 * The profile starts from the steady state of its first load and ambient (common practice), and
 * the hot-spot reported for a step is the one at its end.
 */
import { ambientTemperature, eachOf, nonEmpty, oneOrSameLength, positive, within } from '../guards';
import type { ThermalCharacteristics } from './coolingTable';
import { thermalLoad } from './steadyState';

/** Step lengths accepted, h: longer than a leap year is not a step. */
const MAX_STEP_HOURS = 8784;

/** Checks a profile the way every transient function reads it; refusals name the cell argument. */
export function checkProfile(loads: Float64Array, ambients: Float64Array, stepHours: number): void {
  eachOf('loads', nonEmpty('loads', loads), thermalLoad);
  eachOf('ambients', oneOrSameLength('ambients', nonEmpty('ambients', ambients), loads.length, 'loads'), ambientTemperature);
  within('hours', positive('hours', stepHours), 0, MAX_STEP_HOURS, 'h', 'a step length');
}

/**
 * The kernel: writes the end-of-step hot-spot temperature of each step into `out` (same length as
 * `loads`). No checks: call checkProfile first. `ambients` holds one value or one per step.
 */
export function hotSpotSeriesInto(
  m: ThermalCharacteristics,
  loads: Float64Array,
  ambients: Float64Array,
  stepHours: number,
  out: Float64Array,
): Float64Array {
  const n = loads.length;
  const dtMin = stepHours * 60;
  const r = m.lossRatio;
  const x = m.oilExponent;
  const y = m.windingExponent;
  const riseRated = m.topOilRise;
  const gradientRated = m.hotSpotGradient;
  const k21 = m.k21;
  const k21m1 = k21 - 1;
  const perR1 = 1 / (1 + r);
  const oilDecay = Math.exp(-dtMin / (m.k11 * m.oilTimeConstant));
  const h1Decay = Math.exp(-dtMin / (m.k22 * m.windingTimeConstant));
  const h2Decay = Math.exp((-dtMin * m.k22) / m.oilTimeConstant);
  const carryRise = m.method === 'IEEE';
  const oneAmbient = ambients.length === 1;
  // Exponents of 1 (OF, OD oil) and 2 (OD winding) need no transcendental call at all.
  const oilLinear = x === 1;
  const windingSquare = y === 2;
  const halfY = y / 2; // K^y = exp((y/2)·ln K²): K² is needed anyway; ln 0 = -∞ gives 0

  const k0 = loads[0]!;
  let ambient = ambients[0]!;
  let rise = riseRated * Math.pow((1 + r * k0 * k0) * perR1, x);
  const g0 = gradientRated * Math.pow(k0, y);
  let h1 = k21 * g0;
  let h2 = k21m1 * g0;
  for (let i = 0; i < n; i++) {
    const k = loads[i]!;
    const k2 = k * k;
    const ratio = (1 + r * k2) * perR1;
    const u = riseRated * (oilLinear ? ratio : Math.exp(x * Math.log(ratio)));
    const g = gradientRated * (windingSquare ? k2 : Math.exp(halfY * Math.log(k2)));
    const a = oneAmbient ? ambient : ambients[i]!;
    // IEC carries the top-oil temperature into the step: its rise over the new ambient changes.
    if (!carryRise) rise += ambient - a;
    ambient = a;
    rise = u + (rise - u) * oilDecay;
    h1 = k21 * g + (h1 - k21 * g) * h1Decay;
    h2 = k21m1 * g + (h2 - k21m1 * g) * h2Decay;
    out[i] = a + rise + h1 - h2;
  }
  return out;
}
