/** SIZE: the rating series, the margin and ratings beyond the largest. */
import { describe, expect, it } from 'vitest';
import { cellFunction, errorOf, firstCell } from '../support/cells';

describe('SIZE', () => {
  const f = cellFunction('SIZE');
  it('defaults: no margin, the US three-phase series', () => {
    expect(firstCell(f(640, null, null))).toBe(750);
    expect(firstCell(f(640, 0.2, 'IEC'))).toBe(800);
  });
  it('sizes a column of loads, one result each', () => {
    expect(f([[40], [400], [900]], 0, 'US3')).toEqual([[45], [500], [1000]]);
  });
  it('beyond the largest rating is #N/A with the reason', () => {
    const e = errorOf(f(150000, 0, 'US3'));
    expect(e.code).toBe('#N/A');
    expect(e.message).toMatch(/beyond the largest/);
  });
  it('an unknown series is #VALUE!', () => {
    expect(errorOf(f(100, 0, 'ANSI')).code).toBe('#VALUE!');
  });
});
