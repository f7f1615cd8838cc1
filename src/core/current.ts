/**
 * Currents and apparent power. Three-phase: S = √3·V_LL·I; single-phase: S = V·I (common
 * practice). Ratings in kVA, voltages in V line-to-line, currents in A.
 */
import { oneOf, perUnitImpedance, phaseCount, positive } from './guards';
import { parseVectorGroup, type Connection } from './vectorGroup';

const SQRT3 = Math.sqrt(3);

export function ratedCurrent(kva: number, volts: number, phases: number): number {
  const s = positive('kva', kva) * 1000;
  const v = positive('v', volts);
  return phaseCount('phases', phases) === 3 ? s / (SQRT3 * v) : s / v;
}

/**
 * Current in one phase winding. A delta winding carries line current / √3; star and zigzag
 * windings carry the line current (common practice). `connection` is the letter of the winding
 * — D, Y, YN, Z, ZN in either case — or a whole vector group, whose HV letter is then used.
 */
export function windingCurrent(kva: number, volts: number, connection: string, phases: number): number {
  const line = ratedCurrent(kva, volts, phases);
  if (phases === 1) return line;
  return connectionOf(connection) === 'D' ? line / SQRT3 : line;
}

/** A winding's connection letter (YN and ZN name the neutral), or a whole vector group's HV letter. */
function connectionOf(text: string): Connection {
  if (/\d\s*$/.test(String(text))) return parseVectorGroup('vector_letter', text).hv;
  return oneOf('vector_letter', text, ['D', 'Y', 'Z'] as const, { YN: 'Y', ZN: 'Z' });
}

export function apparentPowerKva(amps: number, volts: number, phases: number): number {
  const i = positive('a', amps);
  const v = positive('v', volts);
  return (phaseCount('phases', phases) === 3 ? SQRT3 * v * i : v * i) / 1000;
}

/**
 * Symmetrical short-circuit current at the terminals, in A. With an infinite source it is the
 * rated current over the per-unit impedance; a finite source of `sourceMva` fault level adds its
 * impedance U²/S_source to the transformer's z·U²/S_rated (IEC 60076-5 clause 4.2, from memory),
 * which in per unit of the rating is z + S_rated/S_source.
 */
export function faultCurrent(kva: number, volts: number, z: number, sourceMva: number | undefined, phases: number): number {
  const rated = ratedCurrent(kva, volts, phases);
  const pu = perUnitImpedance('z', z);
  const sourcePu = sourceMva === undefined ? 0 : kva / (positive('source_mva', sourceMva) * 1000);
  return rated / (pu + sourcePu);
}
