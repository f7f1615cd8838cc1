/**
 * US DOE minimum efficiencies of distribution transformers (10 CFR 431.196), the regulation's
 * scope (10 CFR 431.192) and the minimum for a rating. Every table is typed once from the
 * regulation text with the paragraph it comes from.
 */
import { InputError, NotInTableError, shown } from '../errors';
import { phaseCount, positive } from '../guards';
import { interpolate } from './interpolation';

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
 * less, output 600 V or less; a low-voltage dry-type unit has an input of 600 V or less
 * (docs/references.md, Regulations). A unit
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

/** The minimum of a table already found, so a caller that needs the table too looks it up once. */
export function doeMinimumOf(t: DoeTable, kva: number): number {
  const rows = t.rows.map((r) => ({ kva: r.kva, value: r.percent }));
  return interpolate(rows, kva, describeDoe(t)) / 100;
}
