import { describe, expect, it } from 'vitest';
import { adapt, CellError, plainErrors, prebuiltCopies } from '../../src/cells/adapter';
import { catalog, findFunction } from '../../src/cells/catalog';
import { bool, each, num, orRange, text } from '../../src/cells/declaration';
import { efficiencyAt } from '../../src/core/efficiency';
import { InputError } from '../../src/core/errors';
import { ownCopy } from '../../src/engine/compile';
import { cellFunction } from '../support/cells';

const cell = cellFunction;
const EFF = cell('EFF');

function asError(v: unknown): CellError {
  expect(v).toBeInstanceOf(CellError);
  return v as CellError;
}

describe('broadcasting', () => {
  it('a single cell gives a 1×1 result', () => {
    expect(EFF(1000, 1400, 10500, 0.5, 1)).toEqual([[efficiencyAt(1000, 1400, 10500, 0.5, 1)]]);
  });
  it('a column broadcasts against single cells', () => {
    const out = EFF([[500], [1000], [1500]], 1400, 10500, 0.5, null);
    expect(out).toHaveLength(3);
    expect(out[1]![0]).toBeCloseTo(efficiencyAt(1000, 1400, 10500, 0.5, 1), 15);
  });
  it('a column against a row gives the whole table', () => {
    const out = EFF([[500], [1000]], 1400, 10500, [[0.25, 0.5, 1]], 1);
    expect(out).toHaveLength(2);
    expect(out[0]).toHaveLength(3);
    expect(out[1]![2]).toBeCloseTo(efficiencyAt(1000, 1400, 10500, 1, 1), 15);
  });
  it('n×m with n×1 and 1×m', () => {
    const loads = [
      [0.25, 0.5],
      [0.75, 1],
    ];
    const out = EFF([[500], [1000]], [[1400, 1000]], 10500, loads, 1);
    expect(out[1]![1]).toBeCloseTo(efficiencyAt(1000, 1000, 10500, 1, 1), 15);
    expect(out[0]![1]).toBeCloseTo(efficiencyAt(500, 1000, 10500, 0.5, 1), 15);
  });
  it('shapes that do not fit name both arguments', () => {
    const out = EFF([[1], [2], [3], [4], [5]], 1400, 10500, [[1], [2], [3], [4], [5], [6], [7]], 1);
    expect(out).toHaveLength(1);
    expect(asError(out[0]![0]).message).toBe('argument kva is 5 rows, load is 7 rows; give ranges of the same height or a single cell');
  });
  it('a 1-D array is read as a row and a bare value as one cell', () => {
    expect(EFF(1000, 1400, 10500, [0.5, 1], 1)[0]).toHaveLength(2);
  });
  it('10,000 rows in one call give 10,000 results', () => {
    const kva = Array.from({ length: 10_000 }, (_, i) => [500 + (i % 20) * 100]);
    const out = EFF(kva, 1400, 10500, 0.5, 1);
    expect(out).toHaveLength(10_000);
    expect(out.every((row) => typeof row[0] === 'number')).toBe(true);
  });
});

describe('blanks, text and bad numbers', () => {
  it('a blank optional argument takes its default', () => {
    expect(EFF(1000, 1400, 10500, 0.5, null)).toEqual(EFF(1000, 1400, 10500, 0.5, 1));
    expect(EFF(1000, 1400, 10500, 0.5, '')).toEqual(EFF(1000, 1400, 10500, 0.5, 1));
    expect(EFF(1000, 1400, 10500, 0.5)).toEqual(EFF(1000, 1400, 10500, 0.5, 1));
  });
  it('a blank required argument is #VALUE! naming it', () => {
    const e = asError(EFF(null, 1400, 10500, 0.5, 1)[0]![0]);
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toBe('argument kva: is blank; a value is required');
  });
  it('text where a number is needed is #VALUE! in its own cell only', () => {
    const out = EFF([[1000], ['n/a'], [750]], 1400, 10500, 0.5, 1);
    expect(typeof out[0]![0]).toBe('number');
    expect(asError(out[1]![0]).message).toBe('argument kva: "n/a" is text; a number is needed (kVA)');
    expect(typeof out[2]![0]).toBe('number');
  });
  it('an out-of-domain number is #VALUE! with the reason', () => {
    expect(asError(EFF(-5, 1400, 10500, 0.5, 1)[0]![0]).message).toBe('argument kva: must be greater than 0 (got -5)');
    expect(asError(EFF(1000, 1400, 10500, 0.5, 1.2)[0]![0]).message).toMatch(/^argument pf: power factor/);
  });
  it('an impedance typed as 5.75 is refused with the % hint', () => {
    const e = asError(cell('ISC')(1000, 480, 5.75, null, 3)[0]![0]);
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toContain('5.75%');
  });
  it('NaN and infinity in a cell are refused, never passed on', () => {
    expect(asError(EFF(Number.NaN, 1400, 10500, 0.5, 1)[0]![0]).message).toMatch(/kva: must be a finite number/);
    expect(asError(EFF(1000, Infinity, 10500, 0.5, 1)[0]![0]).message).toMatch(/p0_w/);
  });
  it('valid inputs without an answer give #NUM!', () => {
    expect(asError(EFF(1000, 0, 10500, 0, 1)[0]![0]).code).toBe('#NUM!');
  });
  it('logical values are refused for numbers and read for TRUE/FALSE arguments', () => {
    expect(asError(EFF(true, 1400, 10500, 0.5, 1)[0]![0]).message).toMatch(/TRUE is a logical value/);
  });
  it('text options are case-insensitive', () => {
    expect(cell('RATIO')(13200, 480, 'dyn11')).toEqual(cell('RATIO')(13200, 480, 'Dyn11'));
    expect(cell('LOSSTEMP')(10000, 25, 85, null, 'AL', 'iec')[0]![0]).toBeCloseTo((225 + 85) / (225 + 25) * 10000, 9);
  });
  it('a non-rectangular range is refused', () => {
    expect(asError(EFF([[1], [2, 3]], 1400, 10500, 0.5, 1)[0]![0]).message).toMatch(/rectangular/);
  });
});

describe('series arguments', () => {
  const ALLDAY = cell('ALLDAY');
  it('are taken whole while the unit data broadcast', () => {
    const out = ALLDAY([[500], [1000]], 1400, 10500, [[0.3], [0.6], [0.9]], null, null);
    expect(out).toHaveLength(2);
    expect(typeof out[1]![0]).toBe('number');
  });
  it('drop trailing blanks of a range drawn longer than the data', () => {
    expect(ALLDAY(1000, 1400, 10500, [[0.3], [0.6], [null], ['']], null, null)).toEqual(ALLDAY(1000, 1400, 10500, [[0.3], [0.6]], null, null));
  });
  it('refuse a blank or text inside, naming the position', () => {
    const e = asError(ALLDAY(1000, 1400, 10500, [[0.3], [null], [0.6]], null, null)[0]![0]);
    expect(e.message).toBe('argument loads: value 2 is blank; every value of the series must be a number (per unit)');
  });
  it('refuse a per-step series of the wrong length', () => {
    const e = asError(ALLDAY(1000, 1400, 10500, [[0.3], [0.6]], null, [[1], [1], [1]])[0]![0]);
    expect(e.message).toMatch(/^argument hours: has 3 values/);
  });
});

describe('block results', () => {
  it('EFFCURVE spills points × 3', () => {
    const out = cell('EFFCURVE')(1000, 1400, 10500, null, 5, 1);
    expect(out).toHaveLength(5);
    expect(out[0]).toHaveLength(3);
  });
  it('refuse a range where a single value is needed', () => {
    expect(asError(cell('EFFCURVE')([[1000], [500]], 1400, 10500, null, 5, 1)[0]![0]).message).toMatch(/single value/);
  });
});

describe('every declaration', () => {
  it.each(catalog.map((d) => [d.name, d] as const))('%s computes its own sample without error', (_name, decl) => {
    const args = decl.args.map((a) => (Array.isArray(a.sample) ? a.sample.map((v) => [v]) : a.sample));
    const out = adapt(decl, plainErrors)(...args);
    for (const row of out) for (const v of row) expect(v).not.toBeInstanceOf(CellError);
  });
  it('names are unique upper-case and optional arguments come last', () => {
    const names = catalog.map((d) => d.name);
    expect(new Set(names).size).toBe(names.length);
    for (const d of catalog) {
      expect(d.name).toMatch(/^[A-Z][A-Z0-9]*$/);
      const firstOptional = d.args.findIndex((a) => a.optional);
      if (firstOptional >= 0) expect(d.args.slice(firstOptional).every((a) => a.optional)).toBe(true);
    }
  });
});

describe('an argument that also takes a whole range (orRange)', () => {
  // A made-up declaration: a scale given as a number, or as a 2×1 block [label, factor] read whole.
  const scale = orRange(num('scale', 'ratio', 'A factor, or a block holding one.', 2), { rows: 1, cols: 2 }, (cells) => {
    if (cells.length !== 1 || cells[0]!.length !== 2 || cells[0]![0] !== 'factor' || typeof cells[0]![1] !== 'number') {
      throw new InputError('scale', 'is not a factor block');
    }
    return { kind: 'factor', value: cells[0]![1] as number };
  });
  const decl = each({
    name: 'TIMES',
    group: 'test',
    help: 'x times the scale.',
    source: 'common practice',
    args: [num('x', 'ratio', 'A value.', 1), scale],
    result: { type: 'number', unit: 'ratio' },
    compute: (x, s) => x * (typeof s === 'number' ? s : (s as unknown as { value: number }).value),
  });
  const times = adapt(decl, plainErrors);

  it('reads a single cell as the argument always does, a block of its shape whole, once, for every element, and broadcasts other ranges', () => {
    expect(times(3, 2)).toEqual([[6]]);
    expect(times(3, [['factor', 5]])).toEqual([[15]]);
    expect(times([[1], [2]], [['factor', 5]])).toEqual([[5], [10]]);
    expect(times(3, [[2], [4]])).toEqual([[6], [12]]);
  });

  it("turns the reader's refusal into a whole-result #VALUE! naming the argument, and passes a host error through", () => {
    const refused = times(3, [['x', 1]])[0]![0] as CellError;
    expect(refused.message).toBe('argument scale: is not a factor block');
    const host = Symbol('#DIV/0!');
    const withHost = adapt(decl, plainErrors, { isError: (v) => v === host });
    expect(withHost(3, [['factor', host]])).toEqual([[host]]);
  });
});

describe('the column loop, shared or copied per function', () => {
  it('hands out copies a build wrote, one a function, and the shared loop once they run out or where one fails its check', () => {
    const shared = (x: number): number => 2 * x;
    const first = (x: number): number => 2 * x;
    const broken = (): number => {
      throw new ReferenceError('a helper the copy cannot see');
    };
    const works = (copy: typeof shared) => copy(1) === 2;
    const copyLoop = prebuiltCopies([first, broken]);
    expect(copyLoop(shared, 'A.column', works)).toBe(first);
    expect(copyLoop(shared, 'B.column', works)).toBe(shared);
    expect(copyLoop(shared, 'C.column', works)).toBe(shared);
  });

  it('gives a column of numbers mixed with blanks, text, errors and non-finite numbers the results of one call per cell, with its own loop or the shared one', () => {
    const host = Symbol('#DIV/0!');
    const isError = (v: unknown) => v === host;
    const decl = findFunction('EFF')!;
    const cells: unknown[] = [500, null, 1000, 'x', host, Number.NaN, Infinity, '', 1500, true];
    for (const options of [{ isError }, { isError, copyLoop: ownCopy }]) {
      const eff = adapt(decl, plainErrors, options);
      const column = eff(cells.map((c) => [c]), 1400, 10500, 0.5, 1);
      const oneByOne = cells.map((c) => eff(c, 1400, 10500, 0.5, 1)[0]![0]);
      expect(column.map((row) => row[0])).toEqual(oneByOne);
      expect(column[0]![0]).toBeCloseTo(efficiencyAt(500, 1400, 10500, 0.5, 1), 15);
      expect(column[4]![0]).toBe(host);
    }
  });

  it('gives every kind of result a column loop meets — a number, text, a non-finite number, a refusal — as one call per cell does, and hands compute its text, logical and blank optional arguments unchanged', () => {
    const seen: unknown[][] = [];
    const decl = each({
      name: 'SCALED',
      group: 'test',
      help: 'x times the scale, or a word about it.',
      source: 'common practice',
      args: [num('x', 'ratio', 'A value.', 1), text('label', 'A word.', 'w'), bool('wordy', 'Answer in words?', false), num('offset', 'ratio', 'Added.', 0, { optional: true })],
      result: { type: 'number', unit: 'ratio' },
      compute: (x, label, wordy, offset) => {
        seen.push([label, wordy, offset]);
        if (x < 0) throw new InputError('x', 'must not be negative');
        if (x === 0) return Infinity;
        return wordy && x === 2 ? `${label} two` : x * 1.5 + (offset ?? 0);
      },
    });
    const cells = [1, 2, 0, -1, 0.25];
    for (const options of [{}, { copyLoop: ownCopy }]) {
      seen.length = 0;
      const scaled = adapt(decl, plainErrors, options);
      const column = scaled(cells.map((c) => [c]), 'w', true, null);
      expect(column.map((row) => row[0])).toEqual(cells.map((c) => scaled(c, 'w', true, null)[0]![0]));
      expect(column.map((row) => (row[0] instanceof CellError ? row[0].code : row[0]))).toEqual([1.5, 'w two', '#NUM!', '#VALUE!', 0.375]);
      expect(seen.every(([label, wordy, offset]) => label === 'w' && wordy === true && offset === undefined)).toBe(true);
    }
  });
});
