/** Harmonics cells: spectra as series, derating over a row of eddy-loss values. */
import { describe, expect, it } from 'vitest';
import { cellFunction, errorOf, firstCell } from '../support/cells';

describe('harmonics cells', () => {
  it('HLF and KFACTOR read two columns; KFACTOR refuses amperes', () => {
    const orders = [[1], [5], [7]];
    expect(firstCell(cellFunction('HLF')(orders, [[100], [20], [14]]))).toBeCloseTo((1 + 0.04 * 25 + 0.0196 * 49) / 1.0596, 12);
    expect(errorOf(cellFunction('KFACTOR')(orders, [[100], [20], [14]])).message).toMatch(/not in A/);
  });
  it('KFACTOR reads a per-cent-of-fundamental spectrum when told its basis', () => {
    const orders = [[1], [5], [7]];
    const hlf = firstCell(cellFunction('HLF')(orders, [[100], [20], [14]])) as number;
    expect(firstCell(cellFunction('KFACTOR')(orders, [[100], [20], [14]], 'fundamental'))).toBeCloseTo(hlf, 12);
    expect(errorOf(cellFunction('KFACTOR')(orders, [[1], [0.2], [0.14]], 'of fundamental')).message).toMatch(/argument basis/);
  });
  it('HDERATE broadcasts over eddy-loss assumptions', () => {
    const out = cellFunction('HDERATE')(8.35, [[0.05, 0.1, 0.15]]);
    expect(out[0]).toHaveLength(3);
    expect(out[0]![2] as number).toBeLessThan(out[0]![0] as number);
  });
});
