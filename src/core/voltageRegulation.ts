/**
 * Impedance, voltage regulation and load sharing of parallel units. Impedances are per unit of
 * the unit's own rating (5.75 % is 0.0575).
 *
 * Regulation convention (stated because two are in use): the secondary is held at rated voltage
 * while it delivers `load` per unit of rated current at the given power factor; the no-load
 * voltage is the phasor sum E = V + I·(r + jx) and the regulation is (|E| − V)/V, V = 1 per unit:
 *   lagging:  I = load·(cos φ − j sin φ)     leading:  I = load·(cos φ + j sin φ)
 *   regulation = √((1 + a)² + b²) − 1,  a = load·(r cos φ ± x sin φ),  b = load·(x cos φ ∓ r sin φ)
 * (upper signs lagging). This is the phasor-diagram definition of the textbooks, exact for the
 * series-impedance model; the other convention holds the primary at rated voltage instead and
 * gives 1 − |V2|, which the approximation p·cos φ + q·sin φ + (q·cos φ − p·sin φ)²/200 (percent)
 * follows. For distribution impedances the two differ by a few thousandths of a per cent.
 */
import { InputError, shown } from './errors';
import {
  atMostOne,
  eachOf,
  fractionBelowOne,
  nonEmpty,
  nonNegative,
  oneOrSameLength,
  perUnitImpedance,
  perUnitLoad,
  positive,
} from './guards';

/** Per-unit resistance from the load loss: r = Pk / (kVA × 1000), i.e. %R = Pk(W) / (10 × kVA). */
export function percentResistance(pkWatts: number, kva: number): number {
  const pk = nonNegative('pk_w', pkWatts);
  const s = positive('kva', kva) * 1000;
  const r = pk / s;
  if (r >= 1) {
    throw new InputError('pk_w', `${shown(pk)} W is the whole rating or more; give the load loss in W and the rating in kVA`);
  }
  return r;
}

/** Per-unit reactance from impedance and resistance: x = √(z² − r²). */
export function percentReactance(z: number, r: number): number {
  const zz = perUnitImpedance('z', z);
  const rr = fractionBelowOne('r', r);
  if (rr > zz) throw new InputError('r', `resistance ${shown(rr)} is more than the impedance ${shown(zz)}; r cannot exceed z`);
  return Math.sqrt(zz * zz - rr * rr);
}

/** Voltage regulation as a fraction of rated voltage (convention in the file comment). */
export function voltageRegulation(r: number, x: number, load: number, pf: number, leading: boolean): number {
  const rr = fractionBelowOne('r', r);
  const xx = fractionBelowOne('x', x);
  const k = perUnitLoad('load', load);
  const cos = atMostOne('pf', pf);
  const sin = Math.sqrt(Math.max(0, 1 - cos * cos)) * (leading ? -1 : 1);
  const a = k * (rr * cos + xx * sin);
  const b = k * (xx * cos - rr * sin);
  return Math.hypot(1 + a, b) - 1;
}

/** Base impedance in ohms: V² / (kVA × 1000), V line-to-line for three-phase (common practice). */
export function baseImpedance(volts: number, kva: number): number {
  const v = positive('v', volts);
  return (v * v) / (positive('kva', kva) * 1000);
}

/**
 * Load shared by units in parallel: each takes a part in proportion to its rating over its
 * per-unit impedance, S_i/z_i (the currents divide inversely as the ohmic impedances, and z_i·V²/S_i
 * is unit i's impedance in ohms; common practice). Exact when the units have the same X/R ratio and
 * equal ratios; otherwise the magnitude method of this function is the usual estimate.
 * Returns one row per unit: share (kVA) | per-unit loading | overloaded (loading above 1).
 */
export function parallelShare(kvas: Float64Array, zs: Float64Array, loadKva: number): (number | boolean)[][] {
  eachOf('kvas', nonEmpty('kvas', kvas), positive);
  eachOf('zs', oneOrSameLength('zs', nonEmpty('zs', zs), kvas.length, 'kvas'), perUnitImpedance);
  const load = nonNegative('load_kva', loadKva);
  const zOf = (i: number): number => (zs.length === 1 ? zs[0]! : zs[i]!);
  let total = 0;
  for (let i = 0; i < kvas.length; i++) total += kvas[i]! / zOf(i);
  const rows: (number | boolean)[][] = [];
  for (let i = 0; i < kvas.length; i++) {
    const share = (load * (kvas[i]! / zOf(i))) / total;
    const loading = share / kvas[i]!;
    rows.push([share, loading, loading > 1 + 1e-12]);
  }
  return rows;
}
