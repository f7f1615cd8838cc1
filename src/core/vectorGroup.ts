/**
 * Three-phase vector groups as IEC 60076-1 writes them: the HV connection in capitals (D, Y, YN,
 * Z, ZN), the LV connection in lower case (d, y, yn, z, zn), then the clock number 0-11 — the LV
 * phasor's lag behind HV in steps of 30°. Examples: Dyn11, YNd1, Yy0, Dzn0.
 */
import { InputError } from './errors';

export type Connection = 'D' | 'Y' | 'Z';

export interface VectorGroup {
  readonly text: string;
  readonly hv: Connection;
  readonly hvNeutral: boolean;
  readonly lv: Connection;
  readonly lvNeutral: boolean;
  readonly clock: number;
}

const PATTERN = /^(D|YN|Y|ZN|Z)(d|yn|y|zn|z)(\d{1,2})$/;

// Delta and zigzag windings each turn their voltage by an odd multiple of 30° against a star,
// so a pair of unlike kinds (Dy, Yd, Yz) can only have an odd clock number and a pair of like
// kinds (Yy, Dd, Dz) an even one (common practice; IEC 60076-1 Annex D lists the usual groups).
const ODD_KIND: Record<Connection, number> = { Y: 0, D: 1, Z: 1 };

const cache = new Map<string, VectorGroup>();

export function parseVectorGroup(name: string, text: string): VectorGroup {
  const hit = cache.get(text);
  if (hit) return hit;
  const trimmed = String(text).trim();
  // Users type "DYN11" or "dyn11"; the case of the letters carries the HV/LV meaning, so the
  // first letter group is read as HV and the next as LV whatever case they were typed in.
  const m = PATTERN.exec(normaliseCase(trimmed));
  if (!m) {
    throw new InputError(name, `"${trimmed}" is not a vector group; write HV connection (D, Y, YN, Z, ZN), LV connection (d, y, yn, z, zn) and clock number 0-11, e.g. Dyn11`);
  }
  const clock = Number(m[3]);
  if (clock > 11) throw new InputError(name, `clock number ${clock} in "${trimmed}" must be 0 to 11`);
  const hv = m[1]![0] as Connection;
  const lv = m[2]![0]!.toUpperCase() as Connection;
  const mustBeOdd = (ODD_KIND[hv] ^ ODD_KIND[lv]) === 1;
  if ((clock % 2 === 1) !== mustBeOdd) {
    throw new InputError(
      name,
      `"${trimmed}" cannot exist: ${m[1]} with ${m[2]} gives ${mustBeOdd ? 'an odd' : 'an even'} clock number`,
    );
  }
  const group: VectorGroup = {
    text: `${m[1]}${m[2]}${clock}`,
    hv,
    hvNeutral: m[1]!.length === 2,
    lv,
    lvNeutral: m[2]!.length === 2,
    clock,
  };
  if (cache.size < 256) cache.set(text, group);
  return group;
}

function normaliseCase(text: string): string {
  const m = /^([A-Za-z]+?)([A-Za-z]*?)(\d+)$/.exec(text);
  if (!m) return text;
  const letters = (m[1]! + m[2]!).toUpperCase();
  // Split the letters into HV and LV parts: HV is D, Y, YN, Z or ZN; the rest is LV.
  for (const hv of ['YN', 'ZN', 'D', 'Y', 'Z']) {
    if (letters.startsWith(hv)) {
      const lv = letters.slice(hv.length);
      if (['D', 'Y', 'YN', 'Z', 'ZN'].includes(lv)) return hv + lv.toLowerCase() + m[3];
    }
  }
  return text;
}

/** Phase displacement of LV behind HV in degrees: the clock number times 30° (IEC 60076-1). */
export function phaseDisplacement(group: VectorGroup): number {
  return group.clock * 30;
}

/**
 * The voltage across one phase winding for a given line-to-line voltage. A delta winding sees
 * the full line voltage; a star winding the line-to-neutral voltage. A zigzag phase is two
 * half-windings on different limbs; we take its phase-to-neutral voltage, which is what a
 * three-phase ratio test of a zigzag winding compares against (from memory).
 */
export function windingVoltage(connection: Connection, lineVolts: number): number {
  return connection === 'D' ? lineVolts : lineVolts / Math.sqrt(3);
}
