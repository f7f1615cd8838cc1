/**
 * Load losses and their temperature correction checked against IEEE C57.12.90, IEC 60076-1 and
 * mathjs; each check names its source.
 * Every check goes through the cell layer, as a user's formula would.
 */
import fc from 'fast-check';
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { errorOf, xfmr } from '../support/cells';

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

describe('LOSSTEMP: load loss between reference temperatures (IEEE C57.12.90, from memory)', () => {
  // P(to) = I²R·f + stray/f, f = (234.5 + to)/(234.5 + from) for copper.
  const f = (234.5 + 55) / (234.5 + 85);
  it('85 → 55 °C with 20 % stray: 9,456 W (not the 9,061 W of an all-I²R reading)', () => {
    expect(xfmr('LOSSTEMP', 10000, 85, 55, 8000)).toBeCloseTo(8000 * f + 2000 / f, 6);
    expect(Math.round(xfmr('LOSSTEMP', 10000, 85, 55, 8000) as number)).toBe(9456);
    expect(Math.round(10000 * f)).toBe(9061); // what a blank i2r_w gave before
  });
  it('correcting cooler with i2r_w blank is refused: it would understate the loss', () => {
    expect(errorOf(xfmr('LOSSTEMP', 10000, 85, 55)).message).toMatch(/argument i2r_w: is blank; correcting from 85 °C down to 55 °C/);
  });
  it('correcting hotter with i2r_w blank gives the largest result any split could give (fast-check property)', () => {
    // dP(to)/dI²R = f − 1/f > 0 when f > 1, so the all-I²R reading bounds every split from above.
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: -20, max: 80, noNaN: true }),
        fc.double({ min: 0, max: 60, noNaN: true }),
        (share, from, rise) => {
          const blank = xfmr('LOSSTEMP', 10000, from, from + rise) as number;
          const split = xfmr('LOSSTEMP', 10000, from, from + rise, 10000 * share) as number;
          return blank >= split * (1 - 1e-12);
        },
      ),
    );
  });
});
