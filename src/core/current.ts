/**
 * Currents and apparent power. Three-phase: S = √3·V_LL·I; single-phase: S = V·I (common
 * practice). Ratings in kVA, voltages in V line-to-line, currents in A.
 */
import { InputError } from './errors';
import { oneOf, perUnitImpedance, phaseCount, positive } from './guards';
import { parseVectorGroup, type Connection } from './vectorGroup';

const SQRT3 = Math.sqrt(3);

export function ratedCurrent(kva: number, volts: number, phases: number): number {
  const s = positive('kva', kva) * 1000;
  const v = positive('v', volts);
  return phaseCount('phases', phases) === 3 ? s / (SQRT3 * v) : s / v;
}

export type WindingSide = 'HV' | 'LV';

/**
 * Current in one phase winding. A delta winding carries line current / √3; star and zigzag
 * windings carry the line current (common practice). `connection` is the letter of the winding
 * the voltage belongs to — D, Y, YN, Z, ZN in either case — or a whole vector group together
 * with the side ("HV" or "LV") the voltage belongs to. A vector group without a side names two
 * windings of different connection, so it is refused rather than read as either one.
 */
export function windingCurrent(kva: number, volts: number, connection: string, phases: number, side?: WindingSide): number {
  const line = ratedCurrent(kva, volts, phases);
  if (phases === 1) return line;
  return connectionOf(connection, side) === 'D' ? line / SQRT3 : line;
}

/** The connection of the winding `v` belongs to: its letter (YN and ZN name the neutral), or a vector group with the side. */
function connectionOf(text: string, side: WindingSide | undefined): Connection {
  if (/\d\s*$/.test(String(text))) {
    const group = parseVectorGroup('vector_letter', text);
    if (side === undefined) {
      const hv = group.text.match(/^[A-Z]+/)![0];
      const lv = group.text.slice(hv.length).replace(/\d+$/, '');
      throw new InputError(
        'vector_letter',
        `"${String(text).trim()}" names both windings; type the letter of the winding v belongs to ("${hv}" for the HV side, "${lv}" for the LV side), or give side "HV" or "LV"`,
      );
    }
    return side === 'HV' ? group.hv : group.lv;
  }
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
