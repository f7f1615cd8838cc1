/** Efficiency-regulation cells: DOEMIN, EUMAXLOSS and COMPLIES with their defaults and refusals. */
import { describe, expect, it } from 'vitest';
import { cellFunction, errorOf, firstCell } from '../support/cells';

describe('regulation-rule cells', () => {
  it('DOEMIN: levels default to 2016, and 2029 selects the new table', () => {
    const f = cellFunction('DOEMIN');
    expect(firstCell(f(1000, 'liquid', 3, null, null))).toBeCloseTo(0.9943, 12);
    expect(firstCell(f(1000, 'liquid', 3, 2029, null))).toBeCloseTo(0.9946, 12);
  });
  it('DOEMIN: medium-voltage dry-type without a BIL is #VALUE!; a rating outside the table is #N/A', () => {
    const f = cellFunction('DOEMIN');
    expect(errorOf(f(500, 'mvdry', 3, null, null)).message).toMatch(/bil_kv/);
    expect(errorOf(f(3000, 'liquid', 3, null, null)).code).toBe('#N/A');
  });
  it('EUMAXLOSS over a row of ratings', () => {
    expect(cellFunction('EUMAXLOSS')([[400, 630, 1000]], 'pk')).toEqual([[3250, 4600, 7600]]);
  });
  it('COMPLIES returns TRUE/FALSE with kind, phases and levels defaulted', () => {
    const f = cellFunction('COMPLIES');
    expect(firstCell(f(500, 400, 3600, 'both', null, null, null, null, 400, 3600))).toBe(true);
    expect(firstCell(f(500, 520, 3000, 'both', null, null, null, null, 520, 3000))).toBe(false);
    expect(errorOf(f(500, 400, 3600, 'both')).message).toMatch(/argument p0_eu_w: is blank; "both" needs the EU losses/);
    expect(errorOf(f(500, 400, 3600, null)).message).toMatch(/argument rule: is blank/);
  });
  it('DOEMIN and EUMAXLOSS: out-of-scope units are #N/A with the argument named', () => {
    const doe = errorOf(cellFunction('DOEMIN')(1000, 'liquid', 3, null, null, 69000, 480));
    expect(doe.code).toBe('#N/A');
    expect(doe.message).toMatch(/argument hv_v: 69000 V is above 34,500 V/);
    expect(errorOf(cellFunction('EUMAXLOSS')(400, 'pk', 36)).code).toBe('#N/A');
    expect(errorOf(cellFunction('EUMAXLOSS')(400, 'pk', null, null, true)).message).toMatch(/argument pole_mounted/);
  });
});
