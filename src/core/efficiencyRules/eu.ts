/**
 * EU Ecodesign Tier 2 maximum losses of three-phase liquid-immersed medium power transformers
 * (Regulation (EU) No 548/2014, Annex I, Table I.1, as amended by Regulation (EU) 2019/1783),
 * from 1 July 2021, and the scope of that table.
 */
import { NotInTableError, shown } from '../errors';
import { positive } from '../guards';
import { interpolate } from './interpolation';

export interface EuTier2Row {
  /** Rated power; the first row stands for "≤ 25 kVA". */
  readonly kva: number;
  /** Maximum load loss Pk, W (the Ak level). */
  readonly pkW: number;
  /** Maximum no-load loss P0, W (the A0 − 10 % level). */
  readonly p0W: number;
  /** Where the row's values come from. */
  readonly source: string;
}

/**
 * FROM MEMORY (docs/references.md, Regulations). Values are the Tier 2 levels as recalled — Ak for
 * the load loss and A0 − 10 % for the no-load loss of three-phase liquid-immersed medium power
 * transformers with one winding Um ≤ 24 kV and the other Um ≤ 1.1 kV — to be confirmed against
 * the Official Journal text before they are relied on. The 2019/1783 amendment left the ≤ 24 kV
 * values unchanged; a medium power transformer starts at 5 kVA (548/2014 Article 2(3)).
 */
const EU_FROM_MEMORY = 'EU 548/2014 Annex I Table I.1, Tier 2 (from memory)';
export const EU_TIER2_LIQUID: readonly EuTier2Row[] = Object.freeze(
  (
    [
      [25, 600, 63],
      [50, 750, 81],
      [100, 1250, 130],
      [160, 1750, 189],
      [250, 2350, 270],
      [315, 2800, 324],
      [400, 3250, 387],
      [500, 3900, 459],
      [630, 4600, 540],
      [800, 6000, 585],
      [1000, 7600, 693],
      [1250, 9500, 855],
      [1600, 12000, 1080],
      [2000, 15000, 1305],
      [2500, 18500, 1575],
      [3150, 23000, 1980],
    ] as const
  ).map(([kva, pkW, p0W]) => Object.freeze({ kva, pkW, p0W, source: EU_FROM_MEMORY })),
);

/** Medium power transformers start at 5 kVA (548/2014 Article 2(3)). */
const EU_MEDIUM_POWER_MIN_KVA = 5;

export type EuLoss = 'pk' | 'p0';

/** Table I.1 covers one winding with Um ≤ 24 kV and the other with Um ≤ 1.1 kV. */
export const EU_TABLE_MAX_HV_UM_KV = 24;
export const EU_TABLE_MAX_LV_UM_KV = 1.1;

/**
 * A unit outside Table I.1 has no row here: windings of a higher Um (the regulation allows higher
 * losses for them by other rules of Annex I) and pole-mounted units (their own table in Annex I).
 * Neither is held by Fluxbook, so both are NotInTableError. A blank voltage is taken as within the
 * table's range, as the help says.
 */
export function checkEuScope(hvUmKv: number | undefined, lvUmKv: number | undefined, poleMounted: boolean): void {
  if (poleMounted) {
    throw new NotInTableError('pole_mounted', 'pole-mounted units have their own maximum losses in Annex I of EU 548/2014, which Fluxbook does not hold; Table I.1 is for ground-mounted units');
  }
  if (hvUmKv !== undefined && positive('hv_um_kv', hvUmKv) > EU_TABLE_MAX_HV_UM_KV) {
    throw new NotInTableError('hv_um_kv', `Um ${shown(hvUmKv)} kV is above 24 kV: Table I.1 covers windings up to Um 24 kV; higher-voltage units have other limits in Annex I, not held here`);
  }
  if (lvUmKv !== undefined && positive('lv_um_kv', lvUmKv) > EU_TABLE_MAX_LV_UM_KV) {
    throw new NotInTableError('lv_um_kv', `Um ${shown(lvUmKv)} kV is above 1.1 kV: Table I.1 covers a second winding up to Um 1.1 kV; other units have other limits in Annex I, not held here`);
  }
}

/**
 * Maximum Tier 2 loss in W for a rating. The "≤ 25" row holds from 5 to 25 kVA; between rows the
 * limit is interpolated linearly, as Annex I directs for intermediate ratings (from memory).
 * Above 3150 kVA the regulation sets a minimum peak efficiency index instead: no row.
 */
export function euMaximumLoss(kva: number, which: EuLoss, hvUmKv?: number, lvUmKv?: number, poleMounted = false): number {
  const s = positive('kva', kva);
  checkEuScope(hvUmKv, lvUmKv, poleMounted);
  if (s < EU_MEDIUM_POWER_MIN_KVA) {
    throw new NotInTableError('kva', `${shown(s)} kVA is below 5 kVA, the smallest medium power transformer of EU 548/2014`);
  }
  const rows = EU_TIER2_LIQUID.map((r) => ({ kva: r.kva, value: which === 'pk' ? r.pkW : r.p0W }));
  if (s <= rows[0]!.kva) return rows[0]!.value;
  if (s > rows[rows.length - 1]!.kva) {
    throw new NotInTableError('kva', `${shown(s)} kVA is above 3150 kVA; EU 548/2014 sets a minimum peak efficiency index there, not maximum losses`);
  }
  return interpolate(rows, s, 'EU 548/2014 Table I.1');
}
