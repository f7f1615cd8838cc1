/**
 * The engine's functions against the adapter: a formula evaluated by HyperFormula must give what
 * `adapt(decl, plainErrors)` gives for the same values — numbers (to the 15 significant digits a
 * spreadsheet keeps), logical values, and errors with the same kind and message.
 */
import { DetailedCellError, type RawCellContent } from 'hyperformula';
import { describe, expect, it } from 'vitest';
import { adapt, CellError, plainErrors } from '../../src/cells/adapter';
import { catalog } from '../../src/cells/catalog';
import { evaluateFormula } from '../../src/engine/engine';
import { xfmrRange } from '../support/cells';

type Plain = number | string | boolean | null | { kind: string; message: string };

function plain(v: unknown): Plain {
  if (v instanceof DetailedCellError) return { kind: v.type === 'NA' ? 'NA' : v.type, message: v.message };
  if (v instanceof CellError) return { kind: v.kind, message: v.message };
  return v as Plain;
}

function grid(v: unknown): Plain[][] {
  return Array.isArray(v) ? (v as unknown[][]).map((r) => r.map(plain)) : [[plain(v)]];
}

/** Numbers agree to 15 significant digits (HyperFormula is set to round its output there). */
function expectSame(actual: Plain[][], expected: Plain[][]): void {
  expect(actual.length).toBe(expected.length);
  actual.forEach((row, i) => {
    expect(row.length).toBe(expected[i]!.length);
    row.forEach((a, j) => {
      const e = expected[i]![j]!;
      if (typeof e === 'number' && typeof a === 'number') {
        expect(Math.abs(a - e)).toBeLessThanOrEqual(Math.abs(e) * 1e-14 + 1e-300);
      } else {
        expect(a).toEqual(e);
      }
    });
  });
}

function adapterResult(name: string, ...args: unknown[]): Plain[][] {
  return xfmrRange(name, ...args).map((r) => r.map(plain));
}

describe('the catalog in HyperFormula', () => {
  it.each(catalog.map((d) => [d.name, d] as const))('XFMR.%s on its declared samples gives what the adapter gives', (_, decl) => {
    // One row of single values from A1 rightwards; each series down its own column below them.
    const rows: RawCellContent[][] = [[]];
    const refs: string[] = [];
    const adapterArgs: unknown[] = [];
    decl.args.forEach((a, k) => {
      const col = String.fromCharCode(65 + k);
      if (Array.isArray(a.sample)) {
        const values = a.sample as number[];
        values.forEach((v, i) => {
          rows[i + 1] ??= [];
          rows[i + 1]![k] = v;
        });
        refs.push(`${col}2:${col}${values.length + 1}`);
        adapterArgs.push(values.map((v) => [v]));
      } else {
        rows[0]![k] = typeof a.sample === 'string' ? `'${a.sample}` : (a.sample as number | boolean);
        refs.push(`${col}1`);
        adapterArgs.push(a.sample);
      }
    });
    for (const r of rows) for (let k = 0; k < decl.args.length; k++) if (r[k] === undefined) r[k] = null;
    const got = grid(evaluateFormula(`=XFMR.${decl.name}(${refs.join(',')})`, rows));
    expectSame(got, adapt(decl, plainErrors)(...adapterArgs).map((r) => r.map(plain)));
  });
});

describe('XFMR.EFF evaluated by HyperFormula', () => {
  it('with literals', () => {
    expectSame(grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, 0.5, 0.9)')), adapterResult('EFF', 1000, 1400, 10500, 0.5, 0.9));
  });

  it('with single cells, and a percentage typed as 50%', () => {
    const sheet = [[1000, 1400, 10500, '50%']];
    expectSame(grid(evaluateFormula('=XFMR.EFF(A1, B1, C1, D1)', sheet)), adapterResult('EFF', 1000, 1400, 10500, 0.5));
  });

  it('with a column of loads: spills one row per load', () => {
    const sheet = [[0.25], [0.5], [0.75], [1]];
    const got = grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, A1:A4)', sheet));
    expect(got.length).toBe(4);
    expectSame(got, adapterResult('EFF', 1000, 1400, 10500, [[0.25], [0.5], [0.75], [1]]));
  });

  it('with a column of ratings and a row of loads: broadcasts to a block', () => {
    const sheet: RawCellContent[][] = [
      [500, 0.5, 1],
      [1000, null, null],
      [2500, null, null],
    ];
    const got = grid(evaluateFormula('=XFMR.EFF(A1:A3, 1400, 10500, B1:C1)', sheet));
    expectSame(got, adapterResult('EFF', [[500], [1000], [2500]], 1400, 10500, [[0.5, 1]]));
    expect(got.length).toBe(3);
    expect(got[0]!.length).toBe(2);
  });

  it('with mismatched shapes: one #VALUE! naming both arguments', () => {
    const sheet = [
      [1000, 0.5],
      [1000, 1],
      [1000, null],
    ];
    const got = grid(evaluateFormula('=XFMR.EFF(A1:A3, 1400, 10500, B1:B2)', sheet));
    expect(got).toEqual([[{ kind: 'VALUE', message: 'argument kva is 3 rows, load is 2 rows; give ranges of the same height or a single cell' }]]);
    expectSame(got, adapterResult('EFF', [[1000], [1000], [1000]], 1400, 10500, [[0.5], [1]]));
  });

  it('with a blank optional argument: the default power factor 1', () => {
    expectSame(grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, 0.5, A1)', [[null]])), adapterResult('EFF', 1000, 1400, 10500, 0.5, 1));
    expectSame(grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, 0.5, )')), adapterResult('EFF', 1000, 1400, 10500, 0.5, null));
    expectSame(grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, 0.5)')), adapterResult('EFF', 1000, 1400, 10500, 0.5));
  });

  it('with a blank required cell: #VALUE! naming the argument', () => {
    const expected = [[{ kind: 'VALUE', message: 'argument load: is blank; a value is required' }]];
    expect(grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, A1)', [[null]]))).toEqual(expected);
  });

  it('with too few arguments: one #VALUE! giving the function’s signature', () => {
    const expected = [[{ kind: 'VALUE', message: 'XFMR.EFF takes 4 to 5 arguments, XFMR.EFF(kva, p0_w, pk_w, load, [pf]); 3 were given' }]];
    expect(grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500)'))).toEqual(expected);
  });

  it('with text where a number is needed: #VALUE! in that element only', () => {
    const sheet = [[0.5], ['half'], [1]];
    const got = grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, A1:A3)', sheet));
    expect(got[1]).toEqual([{ kind: 'VALUE', message: 'argument load: "half" is text; a number is needed (per unit)' }]);
    expectSame(got, adapterResult('EFF', 1000, 1400, 10500, [[0.5], ['half'], [1]]));
  });

  it('with an out-of-domain number: the core’s refusal as #VALUE!', () => {
    expectSame(grid(evaluateFormula('=XFMR.EFF(-1000, 1400, 10500, 0.5)')), adapterResult('EFF', -1000, 1400, 10500, 0.5));
    expect(grid(evaluateFormula('=XFMR.EFF(-1000, 1400, 10500, 0.5)'))[0]![0]).toMatchObject({ kind: 'VALUE' });
  });

  it('with an error in one cell of a range: that error in that element only', () => {
    const got = grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, A1:A3)', [[0.5], ['=1/0'], [1]]));
    expect(got[1]![0]).toMatchObject({ kind: 'DIV_BY_ZERO' });
    expect(typeof got[0]![0]).toBe('number');
    expect(typeof got[2]![0]).toBe('number');
  });

  it('with an error as a single argument: that error', () => {
    expect(grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, 1/0)'))[0]![0]).toMatchObject({ kind: 'DIV_BY_ZERO' });
  });

  it('with too many arguments: one #VALUE! giving the function’s signature, for a block too', () => {
    expect(grid(evaluateFormula('=XFMR.EFF(1000, 1400, 10500, 0.5, 1, 1)'))).toEqual([
      [{ kind: 'VALUE', message: 'XFMR.EFF takes 4 to 5 arguments, XFMR.EFF(kva, p0_w, pk_w, load, [pf]); 6 were given' }],
    ]);
    expect(grid(evaluateFormula('=XFMR.EFFCURVE(1000)'))).toEqual([
      [{ kind: 'VALUE', message: 'XFMR.EFFCURVE takes 3 to 6 arguments, XFMR.EFFCURVE(kva, p0_w, pk_w, [pf], [points], [max_load]); 1 was given' }],
    ]);
  });

  it('with array arithmetic inside an argument (kW to W)', () => {
    const sheet = [[1.4], [1.2]];
    expectSame(grid(evaluateFormula('=XFMR.EFF(1000, A1:A2*1000, 10500, 0.5)', sheet)), adapterResult('EFF', 1000, [[1400], [1200]], 10500, 0.5));
  });

  it('is case-insensitive like every spreadsheet name', () => {
    expectSame(grid(evaluateFormula('=xfmr.eff(1000, 1400, 10500, 0.5)')), adapterResult('EFF', 1000, 1400, 10500, 0.5));
  });
});

describe('series and block functions evaluated by HyperFormula', () => {
  const loads = [[0.3], [0.35], [0.6], [0.9], [1.0], [0.7]];

  it('a series is taken whole; blank cells after it are dropped', () => {
    const sheet: RawCellContent[][] = [...loads, [null], [null]];
    expectSame(grid(evaluateFormula('=XFMR.ELOSS(1400, 10500, A1:A8)', sheet)), adapterResult('ELOSS', 1400, 10500, loads));
  });

  it('a blank inside a series is refused with its position', () => {
    const sheet: RawCellContent[][] = [[0.3], [null], [0.6]];
    const got = grid(evaluateFormula('=XFMR.ELOSS(1400, 10500, A1:A3)', sheet));
    expect(got[0]![0]).toMatchObject({ kind: 'VALUE', message: expect.stringContaining('value 2 is blank') });
    expectSame(got, adapterResult('ELOSS', 1400, 10500, [[0.3], [null], [0.6]]));
  });

  it('EFFCURVE spills points × 3 with literal arguments', () => {
    const got = grid(evaluateFormula('=XFMR.EFFCURVE(1000, 1400, 10500, 0.9, 6, 1)'));
    expect(got.length).toBe(6);
    expect(got[0]!.length).toBe(3);
    expectSame(got, adapterResult('EFFCURVE', 1000, 1400, 10500, 0.9, 6, 1));
  });

  it('EFFCURVE sized by a cell that holds a formula (computed after the curve was parsed)', () => {
    const got = grid(evaluateFormula('=XFMR.EFFCURVE(A1, 1400, 10500, , B1)', [[1000, '=3*7']]));
    expect(got.length).toBe(21);
    expectSame(got, adapterResult('EFFCURVE', 1000, 1400, 10500, null, 21));
  });

  it('EFFCURVE refusing a bad points argument gives one #VALUE!', () => {
    const got = grid(evaluateFormula('=XFMR.EFFCURVE(1000, 1400, 10500, 1, 1)'));
    expect(got).toEqual(adapterResult('EFFCURVE', 1000, 1400, 10500, 1, 1));
    expect(got[0]![0]).toMatchObject({ kind: 'VALUE' });
  });
});

describe('native functions beside ours', () => {
  it('SUM, IF and INDEX take our results', () => {
    const eff = adapterResult('EFF', 1000, 1400, 10500, 0.5)[0]![0] as number;
    expect(evaluateFormula('=IF(XFMR.EFF(1000,1400,10500,0.5)>0.99,"pass","fail")')).toBe(eff > 0.99 ? 'pass' : 'fail');
    expect(evaluateFormula('=SUM(XFMR.LOSSES(1400, 10500, A1:A2))', [[0.5], [1]])).toBeCloseTo(1400 + 10500 * 0.25 + 1400 + 10500, 9);
    const curve = adapterResult('EFFCURVE', 1000, 1400, 10500);
    expect(evaluateFormula('=INDEX(XFMR.EFFCURVE(1000, 1400, 10500), 11, 2)')).toBeCloseTo(curve[10]![1] as number, 14);
  });

  it('our functions take native results', () => {
    expectSame(grid(evaluateFormula('=XFMR.EFF(SUM(A1:A2), 1400, 10500, 0.5)', [[400], [600]])), adapterResult('EFF', 1000, 1400, 10500, 0.5));
  });
});
