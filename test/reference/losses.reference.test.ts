/**
 * Load losses and their temperature correction checked against IEEE C57.12.90, IEC 60076-1 and
 * mathjs; each check names its source.
 * Every check goes through the cell layer, as a user's formula would.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { xfmr } from '../support/cells';

describe('losses', () => {
  it('load loss at half load is a quarter of rated load loss — common practice (I²R)', () => {
    expect(xfmr('LOADLOSS', 10500, 0.5)).toBe(2625);
  });
  it('copper I²R correction 75 → 85 °C is (234.5 + 85)/(234.5 + 75) — IEEE C57.12.90 load-loss correction (from memory)', () => {
    expect(xfmr('LOSSTEMP', 10000, 75, 85)).toBeCloseTo((10000 * (234.5 + 85)) / (234.5 + 75), 9);
  });
  it('IEC copper constant 235: 20 → 75 °C is (235 + 75)/(235 + 20) — IEC 60076-1 clause 11.4 (from memory)', () => {
    expect(xfmr('LOSSTEMP', 10000, 20, 75, null, 'Cu', 'IEC')).toBeCloseTo((10000 * 310) / 255, 9);
  });
  it('aluminium constant 225 — IEEE C57.12.90 and IEC 60076-1 (from memory)', () => {
    expect(xfmr('LOSSTEMP', 10000, 25, 85, null, 'Al')).toBeCloseTo((10000 * 310) / 250, 9);
  });
  it('I²R up, stray down: P(Tr) = P_I²R·(Tk+Tr)/(Tk+Tm) + P_s·(Tk+Tm)/(Tk+Tr) — IEEE C57.12.90 (from memory); mathjs', () => {
    const expected = math.evaluate('8000 * (234.5 + 85) / (234.5 + 25) + 2000 * (234.5 + 25) / (234.5 + 85)');
    expect(xfmr('LOSSTEMP', 10000, 25, 85, 8000)).toBeCloseTo(expected, 9);
  });
});
