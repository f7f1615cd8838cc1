/**
 * EU Tier 2 maximum losses. FROM MEMORY: no stored copy of Regulation (EU) No 548/2014 Annex I
 * Table I.1 (nor of 2019/1783's annex) could be read, so these checks hold the table to the values
 * recalled independently in shared/REFERENCES.md ("EU Tier 2 … [M]") and to the structure of the
 * levels (A0 − 10 %); they are no substitute for reading the Official Journal table.
 */
import { describe, expect, it } from 'vitest';
import { EU_TIER2_LIQUID, euMaximumLoss } from '../../src/core/efficiencyRules';
import { NotInTableError } from '../../src/core/errors';

describe('EU Tier 2, Table I.1 (from memory)', () => {
  it('matches the four rows REFERENCES.md recalls: 400 kVA 3250/387 W, 630 kVA 4600/540 W, 1000 kVA 7600/693 W, 2500 kVA 18500/1575 W', () => {
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
