/** Efficiency cells: EFFCURVE's rows are EFF's values, and a row with no answer is #NUM! alone. */
import { describe, expect, it } from 'vitest';
import { errorOf, xfmr, xfmrRange } from '../support/cells';

describe('EFFCURVE and EFF agree', () => {
  it('each row holds what EFF gives at its load', () => {
    for (const [x, eta] of xfmrRange('EFFCURVE', 1000, 1400, 10500, 0.9, 6, 1) as number[][]) {
      expect(eta).toBe(xfmr('EFF', 1000, 1400, 10500, x, 0.9));
    }
  });
  it('with no core loss, the zero-load row is #NUM! where EFF is #NUM!, and the other rows are numbers', () => {
    const curve = xfmrRange('EFFCURVE', 1000, 0, 10500, 1, 3, 1);
    expect(errorOf(curve[0]![1]).code).toBe('#NUM!');
    expect(errorOf(xfmr('EFF', 1000, 0, 10500, 0, 1)).code).toBe('#NUM!');
    expect(curve[0]![2]).toBe(0);
    expect(typeof curve[1]![1]).toBe('number');
  });
});
