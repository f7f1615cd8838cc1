import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { currentReadme } from '../../scripts/docs';
import { FIRST_SHEET_END, FIRST_SHEET_START, firstSheetModel, firstSheetSection } from '../../scripts/first-sheet';
import { withFunctionList } from '../../scripts/readme-functions';

const readme = readFileSync('README.md', 'utf8');

describe('README.md', () => {
  it('the function list matches the declarations (run `npm run docs` when this fails)', () => {
    expect(withFunctionList(readme)).toBe(readme);
  });

  it('the "First sheet" walk-through matches what the engine computes (run `npm run docs` when this fails)', () => {
    expect(currentReadme(readme)).toBe(readme);
  });

  it('the walk-through sits after "How the functions take ranges" and before "Functions"', () => {
    const ranges = readme.indexOf('## How the functions take ranges');
    const first = readme.indexOf('## First sheet');
    const functions = readme.indexOf('## Functions');
    expect(ranges).toBeGreaterThan(0);
    expect(first).toBeGreaterThan(ranges);
    expect(functions).toBeGreaterThan(first);
    expect(readme.indexOf(FIRST_SHEET_START)).toBeGreaterThan(first);
    expect(readme.indexOf(FIRST_SHEET_END)).toBeLessThan(functions);
  });
});

describe('the "First sheet" fleet', () => {
  const model = firstSheetModel();

  it('spills one result per unit from each of the three range formulas', () => {
    expect(model.results.current.formula).toBe('=XFMR.IRATED(B2:B6, D2:D6)');
    expect(model.results.efficiency.formula).toBe('=XFMR.EFF(B2:B6, F2:F6, G2:G6, 50%)');
    expect(model.results.ratioOk.formula).toBe('=XFMR.RATIOOK(H2:H6, C2:C6, D2:D6, E2:E6)');
    for (const r of [model.results.current, model.results.efficiency, model.results.ratioOk]) {
      expect(r.result.map((row) => row.length)).toEqual([1, 1, 1, 1, 1]);
    }
  });

  it('has exactly one unit that fails the ratio check', () => {
    expect(model.results.ratioOk.result.flat().filter((v) => v === false)).toHaveLength(1);
  });

  it('shows the rated current the textbook formula gives, kVA·1000 / (√3·V) (common practice)', () => {
    const kva = model.cells[1]![1] as number;
    const lv = model.cells[1]![3] as number;
    expect(model.results.current.result[0]![0]).toBeCloseTo((kva * 1000) / (Math.sqrt(3) * lv), 9);
  });

  it('is generated the same way twice', () => {
    expect(firstSheetSection(firstSheetModel())).toBe(firstSheetSection(model));
  });
});
