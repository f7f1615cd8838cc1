/** Rating series against their sources. */
import { describe, expect, it } from 'vitest';
import { DOE_TABLES } from '../../src/core/efficiencyRules';
import { nextStandardRating, R10_MANTISSAS, RATING_SERIES } from '../../src/core/sizing';

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
