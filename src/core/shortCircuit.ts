/**
 * Short-circuit duty of a transformer (IEC 60076-5): the asymmetrical peak current the windings
 * must withstand mechanically, and the winding temperature reached by the thermal duty.
 */
import { InputError, NoAnswerError, shown } from './errors';
import { faultCurrent } from './current';
import { perUnitImpedance, positive, positiveAtMost, within } from './guards';

/** Beyond this X/R the standard fixes the peak factor at 1.8·√2 (IEC 60076-5, from memory). */
const X_R_FIXED_ABOVE = 14;

/**
 * Peak factor k·√2 of IEC 60076-5: the highest instantaneous value of the short-circuit current,
 * at the worst switching instant, over its rms symmetrical value. With the current
 *   i(θ) = √2·I·[sin(θ + β) − sin β · e^(−θ·R/X)],   θ = ωt, β the switching angle less φ,
 * the largest value over β at a given θ is √2·I·√(1 − 2·e^(−θR/X)·cos θ + e^(−2θR/X)), so the
 * peak factor is that root's maximum over θ, found between π/2 and π (common practice: the
 * series R-L circuit switched onto a sine). The values agree with the k√2 table of IEC 60076-5
 * (from memory: 1.51 at X/R 1 … 2.46 at 10, 2.55 at 14); above X/R 14 the standard fixes 1.8·√2
 * = 2.55 (from memory), and so does this function, though the exact first peak keeps rising.
 */
export function peakFactor(xOverR: number): number {
  const xr = positive('x_r', xOverR);
  if (xr > X_R_FIXED_ABOVE) return 1.8 * Math.SQRT2;
  const rho = 1 / xr;
  const g = (theta: number): number => {
    const e = Math.exp(-rho * theta);
    return 1 - 2 * e * Math.cos(theta) + e * e;
  };
  // g is unimodal on [π/2, π]: golden-section search to well below a part in 10^9.
  const golden = (Math.sqrt(5) - 1) / 2;
  let a = Math.PI / 2;
  let b = Math.PI;
  let c = b - golden * (b - a);
  let d = a + golden * (b - a);
  let gc = g(c);
  let gd = g(d);
  for (let i = 0; i < 60; i++) {
    if (gc > gd) {
      b = d;
      d = c;
      gd = gc;
      c = b - golden * (b - a);
      gc = g(c);
    } else {
      a = c;
      c = d;
      gc = gd;
      d = a + golden * (b - a);
      gd = g(d);
    }
  }
  return Math.SQRT2 * Math.sqrt(Math.max(gc, gd));
}

/**
 * The closed form IEC 60076-5 gives beside its table (from memory),
 * k·√2 = √2·(1 + e^(−(φ + π/2)·R/X)·sin φ), φ = arctan(X/R): the current switched at voltage zero,
 * read at ωt = φ + π/2. It lies within 0.6 % below the exact peak; the reference tests compare it.
 */
export function peakFactorClosedForm(xOverR: number): number {
  const xr = positive('x_r', xOverR);
  const phi = Math.atan(xr);
  return Math.SQRT2 * (1 + Math.exp(-(phi + Math.PI / 2) / xr) * Math.sin(phi));
}

/**
 * Asymmetrical peak short-circuit current, A: the symmetrical current of ISC (transformer and
 * source impedance added as IEC 60076-5 writes it, Zt + Zs) times the peak factor of the combined
 * X/R. The resistance and reactance of the two are added to find that X/R; a source without an
 * X/R is taken as pure reactance, which gives the larger peak.
 */
export function peakShortCircuitCurrent(
  kva: number,
  volts: number,
  z: number,
  xOverR: number,
  sourceMva: number | undefined,
  sourceXOverR: number | undefined,
  phases: number,
): number {
  const symmetrical = faultCurrent(kva, volts, z, sourceMva, phases);
  const zt = perUnitImpedance('z', z);
  const xrT = positive('x_r', xOverR);
  const rt = zt / Math.sqrt(1 + xrT * xrT);
  let r = rt;
  let x = rt * xrT;
  if (sourceMva === undefined && sourceXOverR !== undefined) {
    throw new InputError('source_x_r', 'is given without source_mva; give the supply\'s short-circuit power too, or leave both blank for an infinite source');
  }
  if (sourceMva !== undefined) {
    const zs = kva / (sourceMva * 1000);
    if (sourceXOverR === undefined) {
      x += zs;
    } else {
      const xrS = positive('source_x_r', sourceXOverR);
      const rs = zs / Math.sqrt(1 + xrS * xrS);
      r += rs;
      x += rs * xrS;
    }
  }
  return symmetrical * peakFactor(x / r);
}

export type WindingMaterial = 'Cu' | 'Al';

/**
 * IEC 60076-5 thermal ability to withstand short circuit (the copper formula confirmed in a
 * secondary source, the aluminium constants from memory; docs/references.md): the average winding temperature after a short circuit of t seconds at current density
 * J (A/mm², rms symmetrical) from an initial θ0, heat taken up by the conductor alone:
 *   copper     θ1 = θ0 + 2·(θ0 + 235) / (106 000 / (J²·t) − 1)
 *   aluminium  θ1 = θ0 + 2·(θ0 + 225) / (45 700 / (J²·t) − 1)
 */
const THERMAL_CONSTANTS: Readonly<Record<WindingMaterial, { readonly tk: number; readonly k: number }>> = {
  Cu: { tk: 235, k: 106000 },
  Al: { tk: 225, k: 45700 },
};

/**
 * The highest permissible average winding temperature after the short circuit, oil-immersed
 * units with thermal class 105 insulation: 250 °C copper, 200 °C aluminium (IEC 60076-5, as
 * secondary sources quote it; docs/references.md, Test reports and short circuit).
 */
export const SHORT_CIRCUIT_LIMIT_C: Readonly<Record<WindingMaterial, number>> = { Cu: 250, Al: 200 };

/** The longest short circuit the check is meant for; IEC 60076-5 uses 2 s unless agreed otherwise. */
const MAX_DURATION_S = 10;

export function shortCircuitTemperature(currentDensity: number, seconds: number, material: WindingMaterial, initialC: number): number {
  const j = positive('j_a_mm2', currentDensity);
  const t = positiveAtMost('t_s', seconds, MAX_DURATION_S);
  const theta0 = within('theta0_c', initialC, -40, 200, '°C', 'an initial winding temperature');
  const { tk, k } = THERMAL_CONSTANTS[material];
  const ratio = k / (j * j * t);
  if (!(ratio > 1)) {
    throw new NoAnswerError(
      `J²·t = ${shown(j * j * t)} A²s/mm⁴ is at or beyond ${shown(k)}, where the IEC 60076-5 formula for ${material === 'Cu' ? 'copper' : 'aluminium'} has no finite temperature; the winding would far exceed any limit`,
    );
  }
  return theta0 + (2 * (theta0 + tk)) / (ratio - 1);
}
