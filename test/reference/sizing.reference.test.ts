/** Rating series, altitude allowances and load-growth years against their sources. */
import * as formulajs from '@formulajs/formulajs';
import { describe, expect, it } from 'vitest';
import { altitudeDerating } from '../../src/core/altitude';
import { DOE_TABLES } from '../../src/core/efficiencyRules';
import { nextStandardRating, R10_MANTISSAS, RATING_SERIES, yearsToLimit } from '../../src/core/sizing';

describe('IEC R10 series (ISO 3 preferred numbers, per IEC 60076-1)', () => {
  it('each R10 value is the rounded term of the geometric series 10^(k/10), within 1.3 %', () => {
    // Source: ISO 3 R10 series — rounded values of 10^(k/10) (the faqs.tips page quoting
    // IEC 60076-1 describes it as a geometric series of factor 10^0.1 ≈ 1.26, rounded).
    R10_MANTISSAS.forEach((m, k) => {
      const exact = Math.pow(10, k / 10);
      expect(Math.abs(m - exact) / exact).toBeLessThan(0.013);
    });
  });
  it('holds the ratings the cited page lists: 10, 12.5, 16, 20, 25, 31.5, 40, 50, 63, 80, 100 kVA', () => {
    // Source: faqs.tips, "why distribution transformers are rated at 25 kVA and 63 kVA".
    const r = RATING_SERIES.IEC.ratingsKva;
    for (const kva of [10, 12.5, 16, 20, 25, 31.5, 40, 50, 63, 80, 100]) expect(r).toContain(kva);
  });
  it('holds the usual MV/LV distribution ratings 100 … 3150 kVA', () => {
    // Source: electrical-engineering-portal.com/how-to-choose-transformer-rating, Figure 1
    // (standard apparent powers of MV/LV transformers: 100, 160, 250, 315, 400, 500, 630, 800,
    // 1000, 1250, 1600, 2000, 2500, 3150 kVA).
    const r = RATING_SERIES.IEC.ratingsKva;
    for (const kva of [100, 160, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150]) expect(r).toContain(kva);
    expect(r[r.length - 1]).toBe(20000); // IEC 60076-1: the R10 preference applies up to 20 MVA
  });
});

describe('IEEE C57.12.00 preferred kVA ratings (secondary source)', () => {
  // Source: electrical-engineering-portal.com/electrical-thumb-rules-you-must-follow-part-5,
  // "Standard Size of Transformer". Single-phase as printed: 5, 10, 15, 25, 37.5, 50, 75, 100,
  // 167, 250, 333, 500, 833, then 1.25, 1.66, 2.5, 3.33, 5.0, 6.6, 8.3, 10.0, 12.5, 16.6, 20.8,
  // 25.0, 33.33 thousand kVA. The page's 20.8 is not a third of any three-phase rating; the series
  // holds 20 000 (a third of 60 000 kVA) instead, and 667 from the DOE single-phase rows.
  it('single-phase rows', () => {
    expect([...RATING_SERIES.US1.ratingsKva]).toEqual([
      5, 10, 15, 25, 37.5, 50, 75, 100, 167, 250, 333, 500, 667, 833, 1250, 1667, 2500, 3333, 5000, 6667, 8333, 10000,
      12500, 16667, 20000, 25000, 33333,
    ]);
  });
  it('every single-phase rating is a third of a three-phase rating, rounded to the kVA (a bank of three)', () => {
    // Source: common practice — three single-phase units make a three-phase bank of three times the kVA.
    for (const kva of RATING_SERIES.US1.ratingsKva) {
      const bank = RATING_SERIES.US3.ratingsKva.find((r) => Math.abs(r / 3 - kva) <= 0.5);
      expect(bank, `${kva} kVA × 3`).toBeDefined();
    }
  });
  it('holds every single-phase kVA row of the DOE tables (10 CFR 431.196), 667 kVA included', () => {
    // Source: 10 CFR 431.196 (eCFR text as amended at 89 FR 30040), single-phase kVA columns.
    for (const t of DOE_TABLES.filter((d) => d.phases === 1)) {
      for (const row of t.rows) expect(RATING_SERIES.US1.ratingsKva).toContain(row.kva);
    }
    expect(RATING_SERIES.US1.ratingsKva).toContain(667);
  });
  it('SIZE(18000, 0, "US1") is 20,000 kVA, not 20,833', () => {
    // Before: 20 833 kVA, read from the secondary page's "20.8"; 20 000 is 60 000 / 3.
    expect(nextStandardRating(18000, 0, 'US1')).toBe(20000);
    expect(nextStandardRating(600, 0, 'US1')).toBe(667);
  });
  // Three-phase as printed: 3, 5, 9 (left out: small dry-type), 15, 30, 45, 75, 112.5, 150, 225,
  // 300, 500, 750 kVA, 1, 1.5, 2, 2.5, 3.7 (3750, from memory), 5, 7.5, 10, 12, 15, 20, 25, 30,
  // 37.5, 50, 60, 75, 100 MVA.
  it('three-phase rows', () => {
    expect([...RATING_SERIES.US3.ratingsKva]).toEqual([
      15, 30, 45, 75, 112.5, 150, 225, 300, 500, 750, 1000, 1500, 2000, 2500, 3750, 5000, 7500, 10000, 12000, 15000, 20000,
      25000, 30000, 37500, 50000, 60000, 75000, 100000,
    ]);
  });
  it('every DOE three-phase table rating (10 CFR 431.196) is a preferred three-phase rating', () => {
    // Source: 10 CFR 431.196(b)(3) kVA column: 15 … 5000 kVA.
    for (const kva of [15, 30, 45, 75, 112.5, 150, 225, 300, 500, 750, 1000, 1500, 2000, 2500, 3750, 5000]) {
      expect(RATING_SERIES.US3.ratingsKva).toContain(kva);
    }
  });
});

describe('IEEE: the kVA rating falls by a fixed share per 100 m above 1000 m', () => {
  it('dry-type self-cooled: 0.3 % per 100 m', () => {
    // Source: trcsupport.eaton.com, "How to derate a transformer for use at high altitudes" ("derate
    // the nameplate kVA by 0.3% for each 330 feet (100 meters) in excess of 3300 feet (1000 meters)");
    // the same 0.3 % per 100 m in hammondpowersolutions.com's FAQ.
    expect(altitudeDerating(2000, 'AN', 'IEEE', 'kva')).toBeCloseTo(0.97, 12);
    expect(altitudeDerating(3000, 'AN', 'IEEE', 'kva')).toBeCloseTo(0.94, 12);
  });
  it('liquid-immersed: 0.4 % self-cooled, 0.5 % with forced cooling (from memory)', () => {
    expect(altitudeDerating(2000, 'ONAN', 'IEEE', 'kva')).toBeCloseTo(0.96, 12);
    expect(altitudeDerating(2500, 'ONAF', 'IEEE', 'kva')).toBeCloseTo(0.925, 12);
  });
  it('no derating up to 1000 m', () => {
    expect(altitudeDerating(1000, 'ONAN', 'IEEE', 'kva')).toBe(1);
    expect(altitudeDerating(-200, 'ONAN', 'IEEE', 'kva')).toBe(1);
  });
});

describe('IEC 60076-2: the temperature-rise limits fall instead', () => {
  // Source: ask.abb.com, "How does altitude affect transformer performance?": "for a naturally-
  // cooled transformer (....AN) ... reduced by 1 K for every interval of 400 m by which the
  // installation's altitude exceeds 1,000 m; for a forced-cooled transformer (…. AF), the
  // reduction shall be 1 K for every 250 m". A started interval is counted whole here.
  it('ONAN: 1 K per 400 m', () => {
    expect(altitudeDerating(1800, 'ONAN', 'IEC', 'rise')).toBe(2);
    expect(altitudeDerating(1900, 'ONAN', 'IEC', 'rise')).toBe(3);
  });
  it('forced cooling: 1 K per 250 m', () => {
    expect(altitudeDerating(1750, 'ONAF', 'IEC', 'rise')).toBe(3);
    expect(altitudeDerating(1800, 'OFAF', 'IEC', 'rise')).toBe(4);
  });
  it('asks for the other quantity where a standard has no such rule', () => {
    expect(() => altitudeDerating(2000, 'ONAN', 'IEC', 'kva')).toThrow(/argument quantity: IEC 60076-2 reduces/);
    expect(() => altitudeDerating(2000, 'AN', 'IEC', 'rise')).toThrow(/argument cooling/);
  });
});

describe('years until a growing peak reaches a limit = NPER of @formulajs/formulajs', () => {
  it.each([
    [820, 0.03, 1000],
    [500, 0.05, 750],
    [1900, 0.012, 2500],
  ])('peak %s kVA growing %s a year to %s kVA', (peak, growth, limit) => {
    // Source: @formulajs/formulajs NPER(rate, 0, −pv, fv): periods for −pv to grow to fv.
    expect(yearsToLimit(peak, growth, limit)).toBeCloseTo(formulajs.NPER(growth, 0, -peak, limit) as number, 10);
  });
  it('0 when already at the limit; no answer when the peak does not grow', () => {
    expect(yearsToLimit(1000, 0.03, 1000)).toBe(0);
    expect(() => yearsToLimit(800, 0, 1000)).toThrow(/never reaches/);
  });
});
