import { describe, expect, it } from 'vitest';
import { NotInTableError } from '../../src/core/errors';
import { nextStandardRating, RATING_SERIES, type RatingSeriesId } from '../../src/core/sizing';

const ids: RatingSeriesId[] = ['US1', 'US3', 'IEC'];

describe('rating series tables', () => {
  it.each(ids)('%s is strictly ascending and positive', (id) => {
    const r = RATING_SERIES[id].ratingsKva;
    expect(r.length).toBeGreaterThan(10);
    for (let i = 0; i < r.length; i++) {
      expect(r[i]).toBeGreaterThan(0);
      if (i > 0) expect(r[i]).toBeGreaterThan(r[i - 1]!);
    }
  });
  it.each(ids)('every row of %s is its own size at zero margin, and the next row is chosen just above it', (id) => {
    const r = RATING_SERIES[id].ratingsKva;
    r.forEach((kva, i) => {
      expect(nextStandardRating(kva, 0, id)).toBe(kva);
      if (i + 1 < r.length) expect(nextStandardRating(kva * 1.001, 0, id)).toBe(r[i + 1]);
    });
  });
  it.each(ids)('%s cites its source', (id) => {
    expect(RATING_SERIES[id].source.length).toBeGreaterThan(20);
  });
});

describe('nextStandardRating', () => {
  it('adds the margin before choosing: 640 kVA + 20 % = 768 kVA → 1000 kVA three-phase', () => {
    expect(nextStandardRating(640, 0.2, 'US3')).toBe(1000);
    expect(nextStandardRating(640, 0, 'US3')).toBe(750);
  });
  it('IEC: 640 kVA → 800 kVA; with 20 % margin still 800', () => {
    expect(nextStandardRating(640, 0, 'IEC')).toBe(800);
    expect(nextStandardRating(640, 0.2, 'IEC')).toBe(800);
  });
  it('single-phase: 120 kVA → 167 kVA', () => {
    expect(nextStandardRating(120, 0, 'US1')).toBe(167);
  });
  it('a load that needs exactly a rating gets that rating despite rounding in load × (1 + margin)', () => {
    expect(nextStandardRating(1250, 0.2, 'US3')).toBe(1500);
    expect(nextStandardRating(100 / 1.1, 0.1, 'IEC')).toBe(100);
  });
  it('a load beyond the largest rating has no row: #N/A with the reason', () => {
    expect(() => nextStandardRating(120000, 0, 'US3')).toThrow(NotInTableError);
    expect(() => nextStandardRating(19000, 0.1, 'IEC')).toThrow(/largest IEC 60076-1 preferred ratings \(R10 series\) rating, 20000 kVA/);
  });
  it('refuses a zero load and a margin typed as a whole percentage', () => {
    expect(() => nextStandardRating(0, 0, 'US3')).toThrow(/load_kva/);
    expect(() => nextStandardRating(100, 20, 'US3')).toThrow(/type it as a percentage/);
  });
});
