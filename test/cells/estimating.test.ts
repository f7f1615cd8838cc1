/** Cell-level behaviour of the estimating functions: defaults, broadcasting, spills and errors. */
import { describe, expect, it } from 'vitest';
import { adapt, CellError, plainErrors } from '../../src/cells/adapter';
import { catalog, findFunction } from '../../src/cells/catalog';
import { AFACTOR, BFACTOR, LOSSCOST, TOC } from '../../src/cells/functions/cost';
import { COMPLIES } from '../../src/cells/functions/compliance';
import { HDERATE, HLF, KFACTOR } from '../../src/cells/functions/harmonics';
import { REG, RPCT, SHARE, XPCT, ZBASE } from '../../src/cells/functions/regulation';
import { DOEMIN, EUMAXLOSS } from '../../src/cells/functions/rules';
import { SIZE } from '../../src/cells/functions/sizing';

const cell = (v: unknown[][]): unknown => v[0]![0];
const errorOf = (v: unknown[][]): CellError => {
  const e = cell(v);
  expect(e).toBeInstanceOf(CellError);
  return e as CellError;
};

describe('catalog', () => {
  it('holds every new function once, with COMPLIES last', () => {
    const names = catalog.map((d) => d.name);
    for (const n of ['AFACTOR', 'BFACTOR', 'TOC', 'LOSSCOST', 'SIZE', 'RPCT', 'XPCT', 'REG', 'ZBASE', 'SHARE', 'HLF', 'KFACTOR', 'HDERATE', 'DOEMIN', 'EUMAXLOSS', 'COMPLIES']) {
      expect(names.filter((x) => x === n)).toHaveLength(1);
    }
    expect(names[names.length - 1]).toBe('COMPLIES');
    expect(findFunction('xfmr.size')).toBe(SIZE);
  });
  it('every sample runs to a value, not an error', () => {
    for (const d of [AFACTOR, BFACTOR, TOC, LOSSCOST, SIZE, RPCT, XPCT, REG, ZBASE, SHARE, HLF, KFACTOR, HDERATE, DOEMIN, EUMAXLOSS, COMPLIES]) {
      const out = adapt(d, plainErrors)(...d.args.map((a) => (Array.isArray(a.sample) ? a.sample.map((x) => [x]) : a.sample)));
      for (const row of out) for (const v of row) expect(v, d.name).not.toBeInstanceOf(CellError);
    }
  });
});

describe('cost cells', () => {
  it('AFACTOR takes 8760 h when hours is blank', () => {
    const f = adapt(AFACTOR, plainErrors);
    expect(cell(f(0.1, 0, 1, null))).toBeCloseTo(0.876, 12);
  });
  it('AFACTOR has no default rate or years: a blank is #VALUE! naming the argument', () => {
    const e = errorOf(adapt(AFACTOR, plainErrors)(0.1, null, 25));
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toMatch(/argument rate: is blank/);
    expect(errorOf(adapt(AFACTOR, plainErrors)(0.1, 0.06, null)).message).toMatch(/argument years/);
  });
  it('AFACTOR broadcasts over a column of rates', () => {
    const out = adapt(AFACTOR, plainErrors)(0.1, [[0], [0.05], [0.1]], 20);
    expect(out).toHaveLength(3);
    expect(out[0]![0]).toBeCloseTo(0.876 * 20, 10);
    expect(out[2]![0] as number).toBeLessThan(out[1]![0] as number);
  });
  it('BFACTOR is A × loss factor × peak²', () => {
    const a = cell(adapt(AFACTOR, plainErrors)(0.12, 0.06, 25)) as number;
    expect(cell(adapt(BFACTOR, plainErrors)(0.12, 0.35, 0.8, 0.06, 25))).toBeCloseTo(a * 0.35 * 0.64, 12);
  });
  it('TOC adds up a bid', () => {
    expect(cell(adapt(TOC, plainErrors)(18500, 1100, 9000, 10, 2))).toBe(47500);
  });
  it('LOSSCOST reads a profile column and a blank step length of 1 h', () => {
    expect(cell(adapt(LOSSCOST, plainErrors)(1000, 10000, [[0.5], [1]], 0.1, null))).toBeCloseTo(1.45, 12);
  });
});

describe('SIZE', () => {
  const f = adapt(SIZE, plainErrors);
  it('defaults: no margin, the US three-phase series', () => {
    expect(cell(f(640, null, null))).toBe(750);
    expect(cell(f(640, 0.2, 'IEC'))).toBe(800);
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

describe('regulation and impedance cells', () => {
  it('RPCT and XPCT chain to REG; leading defaults to FALSE', () => {
    const r = cell(adapt(RPCT, plainErrors)(10500, 1000)) as number;
    const x = cell(adapt(XPCT, plainErrors)(0.0575, r)) as number;
    const lag = cell(adapt(REG, plainErrors)(r, x, 1, 0.85, null)) as number;
    const lead = cell(adapt(REG, plainErrors)(r, x, 1, 0.85, true)) as number;
    expect(lag).toBeGreaterThan(0);
    expect(lead).toBeLessThan(lag);
    expect(cell(adapt(REG, plainErrors)(r, x, 1, 0.85, 'FALSE'))).toBe(lag);
  });
  it('an impedance typed without the % sign gets the hint', () => {
    expect(errorOf(adapt(XPCT, plainErrors)(5.75, 0.01)).message).toMatch(/5\.75%/);
  });
  it('ZBASE of 480 V, 1000 kVA', () => {
    expect(cell(adapt(ZBASE, plainErrors)(480, 1000))).toBeCloseTo(0.2304, 12);
  });
  it('SHARE spills one row per unit: share | loading | overloaded', () => {
    const out = adapt(SHARE, plainErrors)([[1000], [500]], [[0.05], [0.06]], 1500);
    expect(out).toHaveLength(2);
    expect(out[0]).toHaveLength(3);
    expect((out[0]![0] as number) + (out[1]![0] as number)).toBeCloseTo(1500, 9);
    expect(out[0]![2]).toBe(true);
    expect(out[1]![2]).toBe(false);
  });
  it('SHARE takes one impedance for all units, and refuses a range for the load', () => {
    const out = adapt(SHARE, plainErrors)([[750, 750]], 0.0575, 1000);
    expect(out).toEqual([
      [500, 500 / 750, false],
      [500, 500 / 750, false],
    ]);
    expect(errorOf(adapt(SHARE, plainErrors)([[750], [750]], 0.0575, [[1000], [900]])).message).toMatch(/single value/);
  });
});

describe('harmonics cells', () => {
  it('HLF and KFACTOR read two columns; KFACTOR refuses amperes', () => {
    const orders = [[1], [5], [7]];
    expect(cell(adapt(HLF, plainErrors)(orders, [[100], [20], [14]]))).toBeCloseTo((1 + 0.04 * 25 + 0.0196 * 49) / 1.0596, 12);
    expect(errorOf(adapt(KFACTOR, plainErrors)(orders, [[100], [20], [14]])).message).toMatch(/not in A/);
  });
  it('HDERATE broadcasts over eddy-loss assumptions', () => {
    const out = adapt(HDERATE, plainErrors)(8.35, [[0.05, 0.1, 0.15]]);
    expect(out[0]).toHaveLength(3);
    expect(out[0]![2] as number).toBeLessThan(out[0]![0] as number);
  });
});

describe('regulation-rule cells', () => {
  it('DOEMIN: levels default to 2016, and 2029 selects the new table', () => {
    const f = adapt(DOEMIN, plainErrors);
    expect(cell(f(1000, 'liquid', 3, null, null))).toBeCloseTo(0.9943, 12);
    expect(cell(f(1000, 'liquid', 3, 2029, null))).toBeCloseTo(0.9946, 12);
  });
  it('DOEMIN: medium-voltage dry-type without a BIL is #VALUE!; a rating outside the table is #N/A', () => {
    const f = adapt(DOEMIN, plainErrors);
    expect(errorOf(f(500, 'mvdry', 3, null, null)).message).toMatch(/bil_kv/);
    expect(errorOf(f(3000, 'liquid', 3, null, null)).code).toBe('#N/A');
  });
  it('EUMAXLOSS over a row of ratings', () => {
    expect(adapt(EUMAXLOSS, plainErrors)([[400, 630, 1000]], 'pk')).toEqual([[3250, 4600, 7600]]);
  });
  it('COMPLIES returns TRUE/FALSE with kind, phases and levels defaulted', () => {
    const f = adapt(COMPLIES, plainErrors);
    expect(cell(f(500, 400, 3600, 'both', null, null, null, null, 400, 3600))).toBe(true);
    expect(cell(f(500, 520, 3000, 'both', null, null, null, null, 520, 3000))).toBe(false);
    expect(errorOf(f(500, 400, 3600, 'both')).message).toMatch(/argument p0_eu_w: is blank; "both" needs the EU losses/);
    expect(errorOf(f(500, 400, 3600, null)).message).toMatch(/argument rule: is blank/);
  });
});
