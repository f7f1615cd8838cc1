/**
 * Ratio and voltage checked against the ideal transformer, IEC 60076-1's vector groups, clock
 * notation and ratio tolerance, and mathjs units; each check names its source.
 * Every check goes through the cell layer, as a user's formula would.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { xfmr } from '../support/cells';

describe('ratio and voltage', () => {
  it('100 turns to 10 divides the voltage by 10 — common practice (ideal transformer)', () => {
    expect(xfmr('VOUT', 240, 100, 10)).toBeCloseTo(24, 12);
  });
  it('100 turns to 10 multiplies the current by 10 — common practice (ideal transformer)', () => {
    expect(xfmr('IOUT', 2, 100, 10)).toBeCloseTo(20, 12);
  });
  it('power in equals power out in the ideal transformer — common practice; mathjs units', () => {
    const vOut = xfmr('VOUT', 7200, 300, 10) as number;
    const iOut = xfmr('IOUT', 5, 300, 10) as number;
    const pIn = math.evaluate('7200 V * 5 A').toNumber('W');
    const pOut = math.multiply(math.unit(vOut, 'V'), math.unit(iOut, 'A')).toNumber('W');
    expect(pOut).toBeCloseTo(pIn, 6);
  });
  it('single-phase 7200/240 V has turns ratio 30 — common practice', () => {
    expect(xfmr('RATIO', 7200, 240)).toBeCloseTo(30, 12);
  });
  it('Dy: line ratio = N1/(√3·N2), so Dyn11 13.2 kV/480 V winds 13200/(480/√3) — IEC 60076-1 vector groups (from memory); mathjs', () => {
    expect(xfmr('RATIO', 13200, 480, 'Dyn11')).toBeCloseTo(math.evaluate('13200 V / (480 V / sqrt(3))'), 10);
  });
  it('Yd: line ratio = √3·N1/N2, so YNd1 winds (13200/√3)/480 — IEC 60076-1 vector groups (from memory); mathjs', () => {
    expect(xfmr('RATIO', 13200, 480, 'YNd1')).toBeCloseTo(math.evaluate('(13200 V / sqrt(3)) / 480 V'), 10);
  });
  it('Yy and Dd: turns ratio = line ratio — IEC 60076-1 vector groups (from memory)', () => {
    expect(xfmr('RATIO', 11000, 415, 'Yy0')).toBeCloseTo(11000 / 415, 12);
    expect(xfmr('RATIO', 11000, 415, 'Dd0')).toBeCloseTo(11000 / 415, 12);
  });
  it('Dyn11 displaces LV by 330° (clock 11 × 30°) — IEC 60076-1 clock notation', () => {
    expect(xfmr('SHIFT', 'Dyn11')).toBe(330);
  });
  it('YNd1 displaces by 30°, Dyn5 by 150°, Yy0 by 0° — IEC 60076-1 clock notation', () => {
    expect(xfmr('SHIFT', 'YNd1')).toBe(30);
    expect(xfmr('SHIFT', 'Dyn5')).toBe(150);
    expect(xfmr('SHIFT', 'Yy0')).toBe(0);
  });
  it('tap +2 of 2.5 % on 13.2 kV is 13.86 kV: rated × (1 + position × step) — common practice', () => {
    expect(xfmr('TAPV', 13200, 0.025, 2)).toBeCloseTo(13860, 8);
  });
  it('a supply 2.5 % low is met by one 2.5 % step down, restoring 480 V exactly — first principles (Vs = Vp·N2/N1)', () => {
    const position = xfmr('TAPBEST', 12870, 480, 13200, 480, 0.025, 2) as number;
    expect(position).toBe(-1);
    expect((12870 * 480) / (13200 * (1 + 0.025 * position))).toBeCloseTo(480, 9);
  });
  it('ratio tolerance ±0.5 % — IEC 60076-1 Table 1 (lower of ±0.5 % and 1/10 of impedance); IEEE C57.12.00 ±0.5 % (from memory)', () => {
    expect(xfmr('RATIOOK', 30.15, 7200, 240)).toBe(true); // +0.5 % exactly
    expect(xfmr('RATIOOK', 29.85, 7200, 240)).toBe(true); // −0.5 % exactly
    expect(xfmr('RATIOOK', 30.2, 7200, 240)).toBe(false); // +0.67 %
  });
  it('ratio deviation is (measured − declared)/declared — IEEE C57.12.90 ratio test (from memory)', () => {
    expect(xfmr('RATIODEV', 47.9, 13200, 480, 'Dyn11')).toBeCloseTo((47.9 - 13200 / (480 / Math.sqrt(3))) / (13200 / (480 / Math.sqrt(3))), 12);
  });
});
