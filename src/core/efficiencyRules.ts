/**
 * Efficiency regulations: the US DOE minimum efficiencies of distribution transformers
 * (10 CFR 431.196) and the EU Ecodesign Tier 2 maximum losses of three-phase liquid-immersed
 * medium power transformers (Regulation (EU) No 548/2014, Annex I, Table I.1, as amended by
 * Regulation (EU) 2019/1783). Tables are typed once from the regulation text, each with the
 * paragraph it comes from; the reference tests re-read every row against the printed tables.
 */
import { efficiencyAt } from './efficiency';
import { InputError, NotInTableError, shown } from './errors';
import { nonNegative, phaseCount, positive } from './guards';

// ---------------------------------------------------------------------------------------------
// US DOE, 10 CFR 431.196
// ---------------------------------------------------------------------------------------------

/**
 * Source of every DOE row: 10 CFR 431.196 as amended at 89 FR 30040 (Apr. 22, 2024), read in the
 * eCFR text mirrored at github.com/MichalOpoka/ecfr, file cfr/title-10-Energy/.../
 * subpart-K-Distribution-Transformers/.../section-431.196.md (commit 0b97486).
 */
export const DOE_SOURCE = '10 CFR 431.196 (eCFR text as amended at 89 FR 30040, Apr. 22, 2024)';

export type DoeKind = 'liquid' | 'submersible' | 'lvdry' | 'mvdry';
export type DoeLevels = 2016 | 2029;
/** Basic impulse insulation level bands of the medium-voltage dry-type tables. */
export type BilBand = '20-45 kV' | '46-95 kV' | '>=96 kV';

export interface DoeRow {
  readonly kva: number;
  /** Minimum efficiency in per cent, as printed. */
  readonly percent: number;
}

export interface DoeTable {
  readonly kind: DoeKind;
  readonly phases: 1 | 3;
  readonly levels: DoeLevels;
  readonly bil?: BilBand;
  /** The regulation's test load, per unit of nameplate (power factor 1). */
  readonly testLoad: number;
  /** The paragraph of 10 CFR 431.196 the rows are typed from. */
  readonly paragraph: string;
  readonly rows: readonly DoeRow[];
}

/** "All efficiency values are at 50 percent per-unit load" (35 percent for low-voltage dry-type). */
export const DOE_TEST_LOAD: Readonly<Record<DoeKind, number>> = { liquid: 0.5, submersible: 0.5, lvdry: 0.35, mvdry: 0.5 };

function doeRows(pairs: readonly (readonly [number, number])[]): readonly DoeRow[] {
  return Object.freeze(pairs.map(([kva, percent]) => Object.freeze({ kva, percent })));
}

// (a)(2) low-voltage dry-type, on or after 1 Jan 2016 and before 23 Apr 2029; 35 % load.
const LVDRY_2016_1: readonly (readonly [number, number])[] = [
  [15, 97.7], [25, 98.0], [37.5, 98.2], [50, 98.3], [75, 98.5], [100, 98.6], [167, 98.7], [250, 98.8], [333, 98.9],
];
const LVDRY_2016_3: readonly (readonly [number, number])[] = [
  [15, 97.89], [30, 98.23], [45, 98.4], [75, 98.6], [112.5, 98.74], [150, 98.83], [225, 98.94], [300, 99.02], [500, 99.14],
  [750, 99.23], [1000, 99.28],
];
// (a)(3) low-voltage dry-type, on or after 23 Apr 2029.
const LVDRY_2029_1: readonly (readonly [number, number])[] = [
  [15, 98.39], [25, 98.6], [37.5, 98.74], [50, 98.81], [75, 98.95], [100, 99.02], [167, 99.09], [250, 99.16], [333, 99.23],
];
const LVDRY_2029_3: readonly (readonly [number, number])[] = [
  [15, 98.31], [30, 98.58], [45, 98.72], [75, 98.88], [112.5, 98.99], [150, 99.06], [225, 99.15], [300, 99.22], [500, 99.31],
  [750, 99.38], [1000, 99.42],
];
// (b)(2) liquid-immersed incl. submersible, on or after 1 Jan 2016 and before 23 Apr 2029; and
// (b)(4) submersible on or after 23 Apr 2029, which repeats the same values. 50 % load.
const LIQUID_2016_1: readonly (readonly [number, number])[] = [
  [10, 98.7], [15, 98.82], [25, 98.95], [37.5, 99.05], [50, 99.11], [75, 99.19], [100, 99.25], [167, 99.33], [250, 99.39],
  [333, 99.43], [500, 99.49], [667, 99.52], [833, 99.55],
];
const LIQUID_2016_3: readonly (readonly [number, number])[] = [
  [15, 98.65], [30, 98.83], [45, 98.92], [75, 99.03], [112.5, 99.11], [150, 99.16], [225, 99.23], [300, 99.27], [500, 99.35],
  [750, 99.4], [1000, 99.43], [1500, 99.48], [2000, 99.51], [2500, 99.53],
];
// (b)(3) liquid-immersed other than submersible, on or after 23 Apr 2029. The three-phase
// 500 kVA level (99.38) is below the 300 kVA one (99.42) in the regulation itself.
const LIQUID_2029_1: readonly (readonly [number, number])[] = [
  [10, 98.77], [15, 98.88], [25, 99.0], [37.5, 99.1], [50, 99.15], [75, 99.23], [100, 99.29], [167, 99.46], [250, 99.51],
  [333, 99.54], [500, 99.59], [667, 99.62], [833, 99.64],
];
const LIQUID_2029_3: readonly (readonly [number, number])[] = [
  [15, 98.92], [30, 99.06], [45, 99.14], [75, 99.22], [112.5, 99.29], [150, 99.33], [225, 99.38], [300, 99.42], [500, 99.38],
  [750, 99.43], [1000, 99.46], [1500, 99.51], [2000, 99.53], [2500, 99.55], [3750, 99.54], [5000, 99.53],
];

/** Medium-voltage dry-type rows: kVA and the three BIL columns; null where the table is blank. */
type MvRow = readonly [number, number, number, number | null];
// (c)(2) medium-voltage dry-type, on or after 1 Jan 2016 and before 23 Apr 2029. 50 % load.
const MVDRY_2016_1: readonly MvRow[] = [
  [15, 98.1, 97.86, null], [25, 98.33, 98.12, null], [37.5, 98.49, 98.3, null], [50, 98.6, 98.42, null],
  [75, 98.73, 98.57, 98.53], [100, 98.82, 98.67, 98.63], [167, 98.96, 98.83, 98.8], [250, 99.07, 98.95, 98.91],
  [333, 99.14, 99.03, 98.99], [500, 99.22, 99.12, 99.09], [667, 99.27, 99.18, 99.15], [833, 99.31, 99.23, 99.2],
];
const MVDRY_2016_3: readonly MvRow[] = [
  [15, 97.5, 97.18, null], [30, 97.9, 97.63, null], [45, 98.1, 97.86, null], [75, 98.33, 98.13, null],
  [112.5, 98.52, 98.36, null], [150, 98.65, 98.51, null], [225, 98.82, 98.69, 98.57], [300, 98.93, 98.81, 98.69],
  [500, 99.09, 98.99, 98.89], [750, 99.21, 99.12, 99.02], [1000, 99.28, 99.2, 99.11], [1500, 99.37, 99.3, 99.21],
  [2000, 99.43, 99.36, 99.28], [2500, 99.47, 99.41, 99.33],
];
// (c)(3) medium-voltage dry-type, on or after 23 Apr 2029.
const MVDRY_2029_1: readonly MvRow[] = [
  [15, 98.29, 98.07, null], [25, 98.5, 98.31, null], [37.5, 98.64, 98.47, null], [50, 98.74, 98.58, null],
  [75, 98.86, 98.71, 98.68], [100, 98.94, 98.8, 98.77], [167, 99.06, 98.95, 98.92], [250, 99.16, 99.06, 99.02],
  [333, 99.23, 99.13, 99.09], [500, 99.3, 99.21, 99.18], [667, 99.34, 99.26, 99.24], [833, 99.38, 99.31, 99.28],
];
const MVDRY_2029_3: readonly MvRow[] = [
  [15, 97.75, 97.46, null], [30, 98.11, 97.87, null], [45, 98.29, 98.07, null], [75, 98.5, 98.32, null],
  [112.5, 98.67, 98.52, null], [150, 98.79, 98.66, null], [225, 98.94, 98.82, 98.71], [300, 99.04, 98.93, 98.82],
  [500, 99.18, 99.09, 99.0], [750, 99.29, 99.21, 99.12], [1000, 99.35, 99.28, 99.2], [1500, 99.43, 99.37, 99.29],
  [2000, 99.49, 99.42, 99.35], [2500, 99.52, 99.47, 99.4], [3750, 99.5, 99.44, 99.4], [5000, 99.48, 99.43, 99.39],
];

const BIL_BANDS: readonly BilBand[] = ['20-45 kV', '46-95 kV', '>=96 kV'];

function mvTables(levels: DoeLevels, phases: 1 | 3, paragraph: string, rows: readonly MvRow[]): DoeTable[] {
  return BIL_BANDS.map((bil, column) => ({
    kind: 'mvdry' as const,
    phases,
    levels,
    bil,
    testLoad: DOE_TEST_LOAD.mvdry,
    paragraph,
    rows: doeRows(rows.filter((r) => r[column + 1] !== null).map((r) => [r[0], r[column + 1] as number] as const)),
  }));
}

function table(kind: DoeKind, phases: 1 | 3, levels: DoeLevels, paragraph: string, pairs: readonly (readonly [number, number])[]): DoeTable {
  return { kind, phases, levels, testLoad: DOE_TEST_LOAD[kind], paragraph, rows: doeRows(pairs) };
}

/** Every DOE table, built once. */
export const DOE_TABLES: readonly DoeTable[] = Object.freeze([
  table('lvdry', 1, 2016, '431.196(a)(2)', LVDRY_2016_1),
  table('lvdry', 3, 2016, '431.196(a)(2)', LVDRY_2016_3),
  table('lvdry', 1, 2029, '431.196(a)(3)', LVDRY_2029_1),
  table('lvdry', 3, 2029, '431.196(a)(3)', LVDRY_2029_3),
  table('liquid', 1, 2016, '431.196(b)(2)', LIQUID_2016_1),
  table('liquid', 3, 2016, '431.196(b)(2)', LIQUID_2016_3),
  table('liquid', 1, 2029, '431.196(b)(3)', LIQUID_2029_1),
  table('liquid', 3, 2029, '431.196(b)(3)', LIQUID_2029_3),
  table('submersible', 1, 2016, '431.196(b)(2)', LIQUID_2016_1),
  table('submersible', 3, 2016, '431.196(b)(2)', LIQUID_2016_3),
  table('submersible', 1, 2029, '431.196(b)(4)', LIQUID_2016_1),
  table('submersible', 3, 2029, '431.196(b)(4)', LIQUID_2016_3),
  ...mvTables(2016, 1, '431.196(c)(2)', MVDRY_2016_1),
  ...mvTables(2016, 3, '431.196(c)(2)', MVDRY_2016_3),
  ...mvTables(2029, 1, '431.196(c)(3)', MVDRY_2029_1),
  ...mvTables(2029, 3, '431.196(c)(3)', MVDRY_2029_3),
]);

export function parseDoeLevels(value: number): DoeLevels {
  if (value === 2016 || value === 2029) return value;
  throw new InputError('levels', `must be 2016 (units made from 1 January 2016) or 2029 (from 23 April 2029) (got ${shown(value)})`);
}

/** The BIL band of a rating in kV: 20–45, 46–95 or 96 and above, as the table headings read. */
export function bilBand(bilKv: number | undefined): BilBand {
  if (bilKv === undefined) {
    throw new InputError('bil_kv', 'is blank; medium-voltage dry-type levels depend on the basic impulse level (BIL), e.g. 95');
  }
  const b = positive('bil_kv', bilKv);
  if (b < 20) throw new InputError('bil_kv', `${shown(b)} kV is below the lowest BIL band of the regulation (20–45 kV)`);
  if (b <= 45) return '20-45 kV';
  if (b <= 95) return '46-95 kV';
  return '>=96 kV';
}

export function findDoeTable(kind: DoeKind, phases: 1 | 3, levels: DoeLevels, bil?: BilBand): DoeTable {
  const t = DOE_TABLES.find((d) => d.kind === kind && d.phases === phases && d.levels === levels && d.bil === bil);
  if (t === undefined) throw new Error(`no DOE table for ${kind} ${phases}-phase ${levels} ${bil ?? ''}`); // programmer mistake
  return t;
}

/**
 * Linear interpolation in a table of ascending kVA rows, as 10 CFR 431.196 directs for ratings
 * between rows ("linear interpolation of the kVA and efficiency values immediately above and
 * below that kVA rating"). A rating outside the first and last row has no value: NotInTableError.
 */
function interpolate(rows: readonly { readonly kva: number; readonly value: number }[], kva: number, what: string): number {
  const first = rows[0]!;
  const last = rows[rows.length - 1]!;
  if (kva < first.kva || kva > last.kva) {
    throw new NotInTableError('kva', `${shown(kva)} kVA is outside ${what}, which runs from ${shown(first.kva)} to ${shown(last.kva)} kVA`);
  }
  for (let i = 0; i < rows.length; i++) {
    const hi = rows[i]!;
    if (kva === hi.kva) return hi.value;
    if (kva < hi.kva) {
      const lo = rows[i - 1]!;
      return lo.value + ((hi.value - lo.value) * (kva - lo.kva)) / (hi.kva - lo.kva);
    }
  }
  return last.value;
}

function describeDoe(t: DoeTable): string {
  return `the ${t.kind} ${t.phases}-phase table of 10 CFR ${t.paragraph}${t.bil ? ` (BIL ${t.bil})` : ''}`;
}

/** The DOE table a unit falls under. */
export function doeTableFor(kind: DoeKind, phases: number, levels: number, bilKv: number | undefined): DoeTable {
  const p = phaseCount('phases', phases);
  const l = parseDoeLevels(levels);
  return findDoeTable(kind, p, l, kind === 'mvdry' ? bilBand(bilKv) : undefined);
}

/**
 * The voltages of a distribution transformer as 10 CFR 431.192 defines it: input 34.5 kV or
 * less, output 600 V or less; a low-voltage dry-type unit has an input of 600 V or less (read in
 * the definitions as printed at laws9.com/cfr/text/10/431/192 and 42 U.S.C. 6291(35)). A unit
 * outside them is not covered by any table: NotInTableError. A blank voltage is not checked.
 */
export const DOE_MAX_INPUT_V = 34500;
export const DOE_MAX_OUTPUT_V = 600;
const DOE_LV_DRY_MAX_INPUT_V = 600;

export function checkDoeScope(kind: DoeKind, hvVolts: number | undefined, lvVolts: number | undefined): void {
  if (hvVolts !== undefined) {
    const hv = positive('hv_v', hvVolts);
    if (hv > DOE_MAX_INPUT_V) {
      throw new NotInTableError('hv_v', `${shown(hv)} V is above 34,500 V: 10 CFR 431.192 covers distribution transformers with an input of 34.5 kV or less, so no DOE level applies`);
    }
    if (kind === 'lvdry' && hv > DOE_LV_DRY_MAX_INPUT_V) {
      throw new InputError('kind', `"lvdry" is a dry-type unit with an input of 600 V or less, but hv_v is ${shown(hv)} V; use "mvdry"`);
    }
    if (kind === 'mvdry' && hv <= DOE_LV_DRY_MAX_INPUT_V) {
      throw new InputError('kind', `"mvdry" is a dry-type unit with an input above 600 V, but hv_v is ${shown(hv)} V; use "lvdry"`);
    }
  }
  if (lvVolts !== undefined) {
    const lv = positive('lv_v', lvVolts);
    if (lv > DOE_MAX_OUTPUT_V) {
      throw new NotInTableError('lv_v', `${shown(lv)} V is above 600 V: 10 CFR 431.192 covers distribution transformers with an output of 600 V or less, so no DOE level applies`);
    }
  }
}

/** Minimum efficiency (fraction) at the regulation's test load and power factor 1. */
export function doeMinimumEfficiency(
  kva: number,
  kind: DoeKind,
  phases: number,
  levels: number,
  bilKv: number | undefined,
  hvVolts?: number,
  lvVolts?: number,
): number {
  const s = positive('kva', kva);
  checkDoeScope(kind, hvVolts, lvVolts);
  return doeMinimumOf(doeTableFor(kind, phases, levels, bilKv), s);
}

function doeMinimumOf(t: DoeTable, kva: number): number {
  const rows = t.rows.map((r) => ({ kva: r.kva, value: r.percent }));
  return interpolate(rows, kva, describeDoe(t)) / 100;
}

// ---------------------------------------------------------------------------------------------
// EU Ecodesign, Regulation (EU) No 548/2014 Annex I Table I.1, Tier 2 (from 1 July 2021)
// ---------------------------------------------------------------------------------------------

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
 * FROM MEMORY: no stored copy of Annex I Table I.1 could be read (the search tool held the
 * regulation's articles, not the annex tables). Values are the Tier 2 levels as recalled — Ak for
 * the load loss and A0 − 10 % for the no-load loss of three-phase liquid-immersed medium power
 * transformers with one winding Um ≤ 24 kV and the other Um ≤ 1.1 kV — to be confirmed against
 * the Official Journal text before they are relied on. That the 2019/1783 amendment left the
 * ≤ 24 kV values unchanged is stated by powerfullstop.com ("Update of Tables: no changes in
 * reference to the insulation class up to 24 kV"); the ≥ 5 kVA lower bound of a medium power
 * transformer is Article 2(3) of 548/2014 (legislation.gov.uk, eur/2014/548/article/2).
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

// ---------------------------------------------------------------------------------------------
// Compliance of a unit's test-report losses
// ---------------------------------------------------------------------------------------------

export type Rule = 'DOE' | 'EU' | 'both';

/**
 * TRUE when the losses meet the rule. DOE: the efficiency at the table's test load (50 %, or 35 %
 * for low-voltage dry-type), power factor 1, is at least the minimum, compared unrounded. EU: both
 * P0 and Pk are at most the Tier 2 maxima (three-phase liquid-immersed only).
 *
 * Each rule judges losses measured its own way: the DOE test procedure (10 CFR 431 subpart K,
 * appendix A) at 60 Hz with the load loss at 55 °C for liquid-immersed units, the EU rule at
 * 50 Hz with the load loss at 75 °C (IEC 60076-1). One pair of losses cannot be right for both,
 * so "both" takes the DOE losses in p0_w, pk_w and the EU losses in p0_eu_w, pk_eu_w, and refuses
 * when the EU pair is blank.
 */
export function meetsEfficiencyRule(
  kva: number,
  p0Watts: number,
  pkWatts: number,
  rule: Rule,
  kind: DoeKind,
  phases: number,
  levels: number,
  bilKv: number | undefined,
  p0EuWatts?: number,
  pkEuWatts?: number,
): boolean {
  const s = positive('kva', kva);
  const p0 = nonNegative('p0_w', p0Watts);
  const pk = nonNegative('pk_w', pkWatts);
  let euP0 = p0;
  let euPk = pk;
  if (rule === 'both') {
    if (p0EuWatts === undefined || pkEuWatts === undefined) {
      throw new InputError(
        p0EuWatts === undefined ? 'p0_eu_w' : 'pk_eu_w',
        'is blank; "both" needs the EU losses (50 Hz, load loss at 75 °C) in p0_eu_w and pk_eu_w as well as the DOE losses (60 Hz, load loss at 55 °C for liquid-immersed) in p0_w and pk_w',
      );
    }
    euP0 = nonNegative('p0_eu_w', p0EuWatts);
    euPk = nonNegative('pk_eu_w', pkEuWatts);
  }
  let ok = true;
  if (rule !== 'EU') {
    const t = doeTableFor(kind, phases, levels, bilKv);
    ok = efficiencyAt(s, p0, pk, t.testLoad, 1) >= doeMinimumOf(t, s);
  }
  if (rule !== 'DOE') {
    if (kind !== 'liquid' || phaseCount('phases', phases) !== 3) {
      throw new NotInTableError('kind', 'the EU Tier 2 table in Fluxbook covers three-phase liquid-immersed units only');
    }
    ok = ok && euP0 <= euMaximumLoss(s, 'p0') && euPk <= euMaximumLoss(s, 'pk');
  }
  return ok;
}
