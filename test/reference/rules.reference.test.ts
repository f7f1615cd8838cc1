/**
 * Every row of the DOE tables against the regulation text, transcribed here a second time in the
 * layout the regulation prints (single-phase kVA | % | three-phase kVA | %; medium-voltage
 * dry-type: single-phase kVA | 20–45 | 46–95 | ≥96 kV BIL | three-phase kVA | 20–45 | 46–95 | ≥96).
 *
 * Source: 10 CFR 431.196, eCFR text as amended at 89 FR 30040 (Apr. 22, 2024), confirmed in a
 * stored copy of the github.com/MichalOpoka/ecfr mirror (docs/references.md, Regulations).
 */
import { describe, expect, it } from 'vitest';
import {
  DOE_TABLES,
  doeMinimumEfficiency,
  EU_TIER2_LIQUID,
  euMaximumLoss,
  findDoeTable,
  meetsEfficiencyRule,
  type BilBand,
  type DoeKind,
  type DoeLevels,
} from '../../src/core/efficiencyRules';
import { NotInTableError } from '../../src/core/errors';

/** "kVA % kVA %" lines; "-" where a column is blank. */
function twoColumns(text: string): { one: [number, number][]; three: [number, number][] } {
  const one: [number, number][] = [];
  const three: [number, number][] = [];
  for (const line of text.trim().split('\n')) {
    const [a, b, c, d] = line.trim().split(/\s+/);
    if (a !== '-') one.push([Number(a), Number(b)]);
    if (c !== undefined && c !== '-') three.push([Number(c), Number(d)]);
  }
  return { one, three };
}

const LVDRY_A2 = `
15 97.70 15 97.89
25 98.00 30 98.23
37.5 98.20 45 98.40
50 98.30 75 98.60
75 98.50 112.5 98.74
100 98.60 150 98.83
167 98.70 225 98.94
250 98.80 300 99.02
333 98.90 500 99.14
- - 750 99.23
- - 1000 99.28`;

const LVDRY_A3 = `
15 98.39 15 98.31
25 98.60 30 98.58
37.5 98.74 45 98.72
50 98.81 75 98.88
75 98.95 112.5 98.99
100 99.02 150 99.06
167 99.09 225 99.15
250 99.16 300 99.22
333 99.23 500 99.31
- - 750 99.38
- - 1000 99.42`;

const LIQUID_B2 = `
10 98.70 15 98.65
15 98.82 30 98.83
25 98.95 45 98.92
37.5 99.05 75 99.03
50 99.11 112.5 99.11
75 99.19 150 99.16
100 99.25 225 99.23
167 99.33 300 99.27
250 99.39 500 99.35
333 99.43 750 99.40
500 99.49 1000 99.43
667 99.52 1500 99.48
833 99.55 2000 99.51
- - 2500 99.53`;

const LIQUID_B3 = `
10 98.77 15 98.92
15 98.88 30 99.06
25 99.00 45 99.14
37.5 99.10 75 99.22
50 99.15 112.5 99.29
75 99.23 150 99.33
100 99.29 225 99.38
167 99.46 300 99.42
250 99.51 500 99.38
333 99.54 750 99.43
500 99.59 1000 99.46
667 99.62 1500 99.51
833 99.64 2000 99.53
- - 2500 99.55
- - 3750 99.54
- - 5000 99.53`;

// (b)(4) submersible from 23 April 2029: printed with the same values as (b)(2).
const SUBMERSIBLE_B4 = LIQUID_B2;

const MVDRY_C2 = `
15 98.10 97.86 - 15 97.50 97.18 -
25 98.33 98.12 - 30 97.90 97.63 -
37.5 98.49 98.30 - 45 98.10 97.86 -
50 98.60 98.42 - 75 98.33 98.13 -
75 98.73 98.57 98.53 112.5 98.52 98.36 -
100 98.82 98.67 98.63 150 98.65 98.51 -
167 98.96 98.83 98.80 225 98.82 98.69 98.57
250 99.07 98.95 98.91 300 98.93 98.81 98.69
333 99.14 99.03 98.99 500 99.09 98.99 98.89
500 99.22 99.12 99.09 750 99.21 99.12 99.02
667 99.27 99.18 99.15 1000 99.28 99.20 99.11
833 99.31 99.23 99.20 1500 99.37 99.30 99.21
- - - - 2000 99.43 99.36 99.28
- - - - 2500 99.47 99.41 99.33`;

const MVDRY_C3 = `
15 98.29 98.07 - 15 97.75 97.46 -
25 98.50 98.31 - 30 98.11 97.87 -
37.5 98.64 98.47 - 45 98.29 98.07 -
50 98.74 98.58 - 75 98.50 98.32 -
75 98.86 98.71 98.68 112.5 98.67 98.52 -
100 98.94 98.80 98.77 150 98.79 98.66 -
167 99.06 98.95 98.92 225 98.94 98.82 98.71
250 99.16 99.06 99.02 300 99.04 98.93 98.82
333 99.23 99.13 99.09 500 99.18 99.09 99.00
500 99.30 99.21 99.18 750 99.29 99.21 99.12
667 99.34 99.26 99.24 1000 99.35 99.28 99.20
833 99.38 99.31 99.28 1500 99.43 99.37 99.29
- - - - 2000 99.49 99.42 99.35
- - - - 2500 99.52 99.47 99.40
- - - - 3750 99.50 99.44 99.40
- - - - 5000 99.48 99.43 99.39`;

const BANDS: BilBand[] = ['20-45 kV', '46-95 kV', '>=96 kV'];

function mvColumns(text: string): Record<1 | 3, Record<BilBand, [number, number][]>> {
  const out = { 1: { '20-45 kV': [], '46-95 kV': [], '>=96 kV': [] }, 3: { '20-45 kV': [], '46-95 kV': [], '>=96 kV': [] } } as Record<
    1 | 3,
    Record<BilBand, [number, number][]>
  >;
  for (const line of text.trim().split('\n')) {
    const cells = line.trim().split(/\s+/);
    for (const [phases, at] of [
      [1, 0],
      [3, 4],
    ] as const) {
      if (cells[at] === '-') continue;
      BANDS.forEach((band, k) => {
        const v = cells[at + 1 + k]!;
        if (v !== '-') out[phases][band].push([Number(cells[at]), Number(v)]);
      });
    }
  }
  return out;
}

function rowsOf(kind: DoeKind, phases: 1 | 3, levels: DoeLevels, bil?: BilBand): [number, number][] {
  return findDoeTable(kind, phases, levels, bil).rows.map((r) => [r.kva, r.percent]);
}

describe('10 CFR 431.196 tables, every row', () => {
  const two: [string, DoeKind, DoeLevels, string][] = [
    ['(a)(2) low-voltage dry-type, 2016', 'lvdry', 2016, LVDRY_A2],
    ['(a)(3) low-voltage dry-type, 2029', 'lvdry', 2029, LVDRY_A3],
    ['(b)(2) liquid-immersed, 2016', 'liquid', 2016, LIQUID_B2],
    ['(b)(3) liquid-immersed, 2029', 'liquid', 2029, LIQUID_B3],
    ['(b)(2) submersible, 2016', 'submersible', 2016, LIQUID_B2],
    ['(b)(4) submersible, 2029', 'submersible', 2029, SUBMERSIBLE_B4],
  ];
  it.each(two)('%s', (_label, kind, levels, text) => {
    const printed = twoColumns(text);
    expect(rowsOf(kind, 1, levels)).toEqual(printed.one);
    expect(rowsOf(kind, 3, levels)).toEqual(printed.three);
  });
  const mv: [string, DoeLevels, string][] = [
    ['(c)(2) medium-voltage dry-type, 2016', 2016, MVDRY_C2],
    ['(c)(3) medium-voltage dry-type, 2029', 2029, MVDRY_C3],
  ];
  it.each(mv)('%s, each BIL column', (_label, levels, text) => {
    const printed = mvColumns(text);
    for (const phases of [1, 3] as const) {
      for (const band of BANDS) expect(rowsOf('mvdry', phases, levels, band)).toEqual(printed[phases][band]);
    }
  });
  it('there are no tables but these', () => {
    expect(DOE_TABLES.length).toBe(4 + 4 + 4 + 12);
  });
});

describe('values quoted from the eCFR section, checked a second way', () => {
  it('liquid-immersed three-phase 2016', () => {
    const expected: [number, number][] = [
      [15, 98.65], [75, 99.03], [150, 99.16], [300, 99.27], [500, 99.35], [750, 99.4], [1000, 99.43], [1500, 99.48],
      [2000, 99.51], [2500, 99.53],
    ];
    for (const [kva, pct] of expected) expect(doeMinimumEfficiency(kva, 'liquid', 3, 2016, undefined)).toBeCloseTo(pct / 100, 12);
  });
  it('liquid-immersed single-phase and low-voltage dry-type three-phase 2016', () => {
    for (const [kva, pct] of [[10, 98.7], [100, 99.25], [833, 99.55]] as const) {
      expect(doeMinimumEfficiency(kva, 'liquid', 1, 2016, undefined)).toBeCloseTo(pct / 100, 12);
    }
    for (const [kva, pct] of [[15, 97.89], [75, 98.6], [150, 98.83], [300, 99.02], [500, 99.14], [750, 99.23], [1000, 99.28]] as const) {
      expect(doeMinimumEfficiency(kva, 'lvdry', 3, 2016, undefined)).toBeCloseTo(pct / 100, 12);
    }
  });
});

describe('ratings between rows, as the regulation directs', () => {
  it('"linear interpolation of the kVA and efficiency values immediately above and below": 1250 kVA liquid three-phase', () => {
    // 1000 kVA 99.43 %, 1500 kVA 99.48 % → 1250 kVA 99.455 %
    expect(doeMinimumEfficiency(1250, 'liquid', 3, 2016, undefined)).toBeCloseTo(0.99455, 12);
  });
  it('the test loads the notes state: 50 % of nameplate, 35 % for low-voltage dry-type', () => {
    expect(findDoeTable('liquid', 3, 2016).testLoad).toBe(0.5);
    expect(findDoeTable('mvdry', 3, 2016, '46-95 kV').testLoad).toBe(0.5);
    expect(findDoeTable('lvdry', 3, 2029).testLoad).toBe(0.35);
  });
});

describe('units outside the regulation have no minimum (10 CFR 431.192 definition)', () => {
  // Source: 10 CFR 431.192, "Distribution transformer means a transformer that (1) has an input
  // voltage of 34.5 kV or less; (2) has an output voltage of 600 V or less; (3) is rated for
  // operation at a frequency of 60 Hz" (laws9.com/cfr/text/10/431/192; the same limits in
  // 42 U.S.C. 6291(35) at law.cornell.edu).
  it('a 69 kV primary or a 4,160 V secondary is #N/A, not a silent number', () => {
    expect(() => doeMinimumEfficiency(1000, 'liquid', 3, 2016, undefined, 69000, 480)).toThrow(NotInTableError);
    expect(() => doeMinimumEfficiency(1000, 'liquid', 3, 2016, undefined, 12470, 4160)).toThrow(/argument lv_v: 4160 V is above 600 V/);
  });
  it('34.5 kV and 600 V themselves are in scope', () => {
    expect(doeMinimumEfficiency(1000, 'liquid', 3, 2016, undefined, 34500, 600)).toBeCloseTo(0.9943, 12);
  });
  it('"lvdry" with a medium-voltage primary, or "mvdry" with a 480 V one, is refused as the wrong kind', () => {
    expect(() => doeMinimumEfficiency(75, 'lvdry', 3, 2016, undefined, 4160, 208)).toThrow(/argument kind: "lvdry"/);
    expect(() => doeMinimumEfficiency(75, 'mvdry', 3, 2016, 95, 480, 208)).toThrow(/argument kind: "mvdry"/);
  });
});

describe('COMPLIES "both": each rule judges its own losses', () => {
  // Source: 10 CFR 431 subpart K appendix A (the DOE test procedure: liquid-immersed load loss at
  // 55 °C, no-load loss at 20 °C, 60 Hz) against the IEC 60076-1 reference temperature of 75 °C
  // the EU rule uses: one pair of losses cannot stand for both.
  it('refuses "both" without the EU pair, naming the argument', () => {
    expect(() => meetsEfficiencyRule(500, 400, 3600, 'both', 'liquid', 3, 2016, undefined)).toThrow(/argument p0_eu_w: is blank/);
  });
  it('a unit whose 75 °C load loss exceeds the EU limit fails "both" though its 55 °C one would pass', () => {
    // 500 kVA: EU Pk max 3900 W (from memory). 3,600 W at 55 °C is some 3,850 W at 75 °C if all I²R
    // (×309.5/289.5); a unit measuring 3,950 W at 75 °C fails the EU rule, whatever its 55 °C figure.
    expect(meetsEfficiencyRule(500, 400, 3600, 'both', 'liquid', 3, 2016, undefined, 400, 3600)).toBe(true);
    expect(meetsEfficiencyRule(500, 400, 3600, 'both', 'liquid', 3, 2016, undefined, 400, 3950)).toBe(false);
  });
});

// EU Tier 2 maximum losses, from memory (docs/references.md, Regulations): the table is held to
// the recalled values and to the structure of its levels (A0 − 10 %), which is no substitute for
// the Official Journal text.
describe('EU Tier 2, Table I.1 (from memory)', () => {
  it('matches the four rows recalled independently (from memory): 400 kVA 3250/387 W, 630 kVA 4600/540 W, 1000 kVA 7600/693 W, 2500 kVA 18500/1575 W', () => {
    for (const [kva, pk, p0] of [
      [400, 3250, 387],
      [630, 4600, 540],
      [1000, 7600, 693],
      [2500, 18500, 1575],
    ] as const) {
      expect(euMaximumLoss(kva, 'pk')).toBe(pk);
      expect(euMaximumLoss(kva, 'p0')).toBe(p0);
    }
  });
  it('each no-load limit is the A0 level less 10 %, rounded to the watt (A0 from memory)', () => {
    // A0 no-load levels (EN 50588-1 / Table I.1 Tier 1 column, from memory).
    const a0: Record<number, number> = {
      25: 70, 50: 90, 100: 145, 160: 210, 250: 300, 315: 360, 400: 430, 500: 510, 630: 600, 800: 650, 1000: 770,
      1250: 950, 1600: 1200, 2000: 1450, 2500: 1750, 3150: 2200,
    };
    for (const r of EU_TIER2_LIQUID) expect(Math.abs(r.p0W - a0[r.kva]! * 0.9)).toBeLessThanOrEqual(0.5);
  });
});

describe('units outside Table I.1 get #N/A, not its numbers', () => {
  // Source: Table I.1 of EU 548/2014 is headed for units with one winding Um ≤ 24 kV and the
  // other Um ≤ 1.1 kV; pole-mounted units have their own table in Annex I (from memory).
  it('a 36 kV unit, a second winding above 1.1 kV, and a pole-mounted unit', () => {
    expect(() => euMaximumLoss(400, 'pk', 36, 1.1)).toThrow(NotInTableError);
    expect(() => euMaximumLoss(400, 'pk', 24, 3.6)).toThrow(/argument lv_um_kv/);
    expect(() => euMaximumLoss(160, 'p0', undefined, undefined, true)).toThrow(/argument pole_mounted: pole-mounted units have their own/);
  });
  it('24 kV and 1.1 kV themselves are in the table', () => {
    expect(euMaximumLoss(400, 'pk', 24, 1.1)).toBe(3250);
  });
});
