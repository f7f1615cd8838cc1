/** Test-report and short-circuit cells: ranges of units broadcast, options read once, refusals named. */
import { describe, expect, it } from 'vitest';
import { cellFunction, column, errorOf, firstCell, xfmr } from '../support/cells';

describe('test-report cells', () => {
  it('TESTOK over a column of units: one formula for the whole fleet', () => {
    const out = cellFunction('TESTOK')(column([1100, 1300, 1265]), column([1100, 1100, 1100]), 'p0');
    expect(out).toEqual([[true], [false], [true]]);
  });
  it('TESTTOL reads item aliases and bounds; an unknown item names the argument', () => {
    expect(xfmr('TESTTOL', 'total', 12000) as number).toBeCloseTo(13200, 9);
    expect(xfmr('TESTTOL', 'Z', 0.06, 'IEC', 'lower') as number).toBeCloseTo(0.054, 12);
    expect(errorOf(cellFunction('TESTTOL')('losses', 12000)).message).toMatch(/argument item: "losses" is not one of/);
    expect(errorOf(cellFunction('TESTTOL')('load loss', 9000, 'IEEE')).code).toBe('#N/A');
  });
  it('RCORR and ZCORR take material and standard by name', () => {
    expect(xfmr('RCORR', 1, 20, 75, 'copper') as number).toBeCloseTo(309.5 / 254.5, 12);
    expect(errorOf(cellFunction('ZCORR')(0.0562, 1000, 9800, 85, 55)).message).toMatch(/argument i2r_w: is blank; correcting from 85 °C down to 55 °C/);
  });
  it('IPEAK and SCTEMP: a blank source is infinite; output "limit" gives the standard’s limit', () => {
    const isc = xfmr('ISC', 1000, 480, 0.0575) as number;
    expect((xfmr('IPEAK', 1000, 480, 0.0575, 5) as number) / isc).toBeCloseTo(2.1924, 3);
    expect(xfmr('SCTEMP', 60, null, 'Al', null, 'limit')).toBe(200);
    expect(errorOf(cellFunction('SCTEMP')(400, 2)).code).toBe('#NUM!');
  });
  it('IWINDING: a whole vector group needs its side', () => {
    expect(xfmr('IWINDING', 1000, 480, 'Dyn11', 3, 'LV') as number).toBeCloseTo(1202.8, 1);
    expect(errorOf(cellFunction('IWINDING')(1000, 480, 'Dyn11')).message).toMatch(/argument vector_letter: "Dyn11" names both windings/);
  });
  it('ALTDERATE takes the quantity the standard gives when blank; YEARSTOLIMIT over a row of growth rates', () => {
    expect(xfmr('ALTDERATE', 2000)).toBeCloseTo(0.96, 12);
    expect(xfmr('ALTDERATE', 2000, 'ONAF', 'IEC')).toBe(4);
    const years = cellFunction('YEARSTOLIMIT')(820, [[0.02, 0.03, 0.05]], 1000)[0]! as number[];
    expect(years[0]!).toBeGreaterThan(years[2]!);
    expect(firstCell(cellFunction('YEARSTOLIMIT')(1200, 0.03, 1000))).toBe(0);
  });
});
