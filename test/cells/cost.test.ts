/** Cost cells: defaults, ranges and the blank policy arguments. */
import { describe, expect, it } from 'vitest';
import { cellFunction, errorOf, firstCell } from '../support/cells';

describe('cost cells', () => {
  it('AFACTOR takes 8760 h when hours is blank', () => {
    const f = cellFunction('AFACTOR');
    expect(firstCell(f(0.1, 0, 1, null))).toBeCloseTo(0.876, 12);
  });
  it('AFACTOR has no default rate or years: a blank is #VALUE! naming the argument', () => {
    const e = errorOf(cellFunction('AFACTOR')(0.1, null, 25));
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toMatch(/argument rate: is blank/);
    expect(errorOf(cellFunction('AFACTOR')(0.1, 0.06, null)).message).toMatch(/argument years/);
  });
  it('AFACTOR broadcasts over a column of rates', () => {
    const out = cellFunction('AFACTOR')(0.1, [[0], [0.05], [0.1]], 20);
    expect(out).toHaveLength(3);
    expect(out[0]![0]).toBeCloseTo(0.876 * 20, 10);
    expect(out[2]![0] as number).toBeLessThan(out[1]![0] as number);
  });
  it('BFACTOR is A × loss factor × peak²', () => {
    const a = firstCell(cellFunction('AFACTOR')(0.12, 0.06, 25)) as number;
    expect(firstCell(cellFunction('BFACTOR')(0.12, 0.35, 0.8, 0.06, 25))).toBeCloseTo(a * 0.35 * 0.64, 12);
  });
  it('TOC adds up a bid', () => {
    expect(firstCell(cellFunction('TOC')(18500, 1100, 9000, 10, 2))).toBe(47500);
  });
  it('LOSSCOST reads a profile column and a blank step length of 1 h', () => {
    expect(firstCell(cellFunction('LOSSCOST')(1000, 10000, [[0.5], [1]], 0.1, null))).toBeCloseTo(1.45, 12);
  });
});
