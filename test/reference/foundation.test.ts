/**
 * Reference checks for ratio, current, losses, efficiency and all-day energy. Each check names its
 * source: a standard (clause or table), a published worked example, a general-purpose library
 * (mathjs units and expressions, @formulajs/formulajs spreadsheet functions), or a fact of the
 * trade (`common practice`). `from memory` marks a value recalled but not confirmed in a copy.
 * Every check goes through the cell layer, as a user's formula would.
 */
import * as formulajs from '@formulajs/formulajs';
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { adapt, plainErrors } from '../../src/cells/adapter';
import { findFunction } from '../../src/cells/catalog';

/** One cell's value from a cell function called with plain values. */
function xfmr(name: string, ...args: unknown[]): unknown {
  return adapt(findFunction(name)!, plainErrors)(...args)[0]![0];
}
const col = (values: number[]) => values.map((v) => [v]);

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

describe('current and power', () => {
  it('1000 kVA at 480 V three-phase is 1202.8 A — common practice (I = S/(√3·V)); mathjs units', () => {
    const amps = xfmr('IRATED', 1000, 480) as number;
    expect(amps).toBeCloseTo(1202.8, 1);
    expect(amps).toBeCloseTo(math.evaluate('1000 kVA / (sqrt(3) * 480 V)').toNumber('A'), 9);
  });
  it('1000 kVA at 400 V three-phase is 1443.4 A — common practice; mathjs units', () => {
    expect(xfmr('IRATED', 1000, 400)).toBeCloseTo(1443.4, 1);
    expect(xfmr('IRATED', 1000, 400)).toBeCloseTo(math.evaluate('1000 kVA / (sqrt(3) * 400 V)').toNumber('A'), 9);
  });
  it('50 kVA at 240 V single-phase is 208.3 A — common practice (I = S/V); mathjs units', () => {
    expect(xfmr('IRATED', 50, 240, 1)).toBeCloseTo(math.evaluate('50 kVA / 240 V').toNumber('A'), 9);
  });
  it('apparent power from current inverts it: 1202.8 A at 480 V is 1000 kVA — common practice; mathjs units', () => {
    expect(xfmr('KVA', 1202.813, 480)).toBeCloseTo(math.evaluate('sqrt(3) * 480 V * 1202.813 A').toNumber('kVA'), 9);
  });
  it('a delta winding carries line current / √3 — common practice', () => {
    expect(xfmr('IWINDING', 1000, 13200, 'D')).toBeCloseTo((xfmr('IRATED', 1000, 13200) as number) / Math.sqrt(3), 9);
  });
  it('fault current on an infinite bus is Ir / z: 1000 kVA, 480 V, 5.75 % → 20,918 A — common practice', () => {
    expect(xfmr('ISC', 1000, 480, 0.0575)).toBeCloseTo(20918.5, 0);
  });
  it('fault current with a 500 MVA source: U/(√3·(z·U²/Sr + U²/Ss)) — IEC 60076-5 clause 4.2 (from memory); mathjs units', () => {
    const zt = math.evaluate('0.0575 * (480 V)^2 / (1000 kVA)');
    const zs = math.evaluate('(480 V)^2 / (500 MVA)');
    const amps = math.divide(math.unit(480, 'V'), math.multiply(Math.sqrt(3), math.add(zt, zs))) as math.Unit;
    expect(xfmr('ISC', 1000, 480, 0.0575, 500)).toBeCloseTo(amps.toNumber('A'), 6);
  });
});

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

describe('efficiency', () => {
  // engineeringdevotion.com, solved problems on transformer efficiency: 20 kVA, iron loss 324 W,
  // copper loss 100 W at half load (so 400 W at full load).
  it('20 kVA, 324 W iron, 400 W copper, pf 0.8: full-load efficiency 95.67 % — engineeringdevotion.com solved problem', () => {
    expect((xfmr('EFF', 20, 324, 400, 1, 0.8) as number) * 100).toBeCloseTo(95.67, 2);
  });
  it('same unit: maximum efficiency at 90 % of full load — engineeringdevotion.com solved problem', () => {
    expect(xfmr('EFFMAXLOAD', 324, 400)).toBeCloseTo(0.9, 12);
  });
  it('300 kVA, pf 0.85, iron 2.0 kW, copper 2.5 kW: half-load efficiency 97.9 % (published, approximate), 97.98 % exact — jirvine.co.uk tutorial 10', () => {
    const eff = (xfmr('EFF', 300, 2000, 2500, 0.5, 0.85) as number) * 100;
    expect(eff).toBeCloseTo(97.98, 2);
    expect(eff.toFixed(1)).toBe('98.0'); // the tutorial's 97.9 comes from 1 − losses/output
    expect((1 - 2625 / 127500) * 100).toBeCloseTo(97.94, 2);
  });
  it('efficiency peaks where dη/dx = 0, at x = √(P0/Pk) — mathjs symbolic derivative', () => {
    const d = math.derivative('x*S / (x*S + P0 + x^2*Pk)', 'x');
    const x = xfmr('EFFMAXLOAD', 1400, 10500) as number;
    expect(d.evaluate({ x, S: 1e6, P0: 1400, Pk: 10500 })).toBeCloseTo(0, 12);
    expect(xfmr('EFFMAX', 1000, 1400, 10500)).toBeCloseTo(xfmr('EFF', 1000, 1400, 10500, x) as number, 15);
  });
  it('peak efficiency index PEI = 1 − 2(P0+Pc0)/(Sr·√((P0+Pc0)/Pk)) — EU Regulation 548/2014 Annex I (from memory); mathjs', () => {
    const expected = math.evaluate('1 - 2 * (693 + 0) / (1000e3 * sqrt((693 + 0) / 7600))');
    expect(xfmr('PEI', 1000, 693, 7600)).toBeCloseTo(expected, 12);
  });
});

describe('all-day energy', () => {
  // askfilo.com solved question: 15 kVA, 2000/200 V, iron loss 250 W, full-load copper loss 350 W;
  // 9 h at 1/4 load pf 0.6, 7 h at full load pf 0.8, 6 h at 3/4 load pf 1.0, 2 h at no load.
  // Its steps give outputs 2.25, 12 and 11.25 kW and copper losses 21.875, 350 and 196.875 W.
  const loads = col([0.25, 1, 0.75, 0]);
  const pfs = col([0.6, 0.8, 1.0, 1.0]);
  const hours = col([9, 7, 6, 2]);
  it('energy out 2.25·9 + 12·7 + 11.25·6 = 171.75 kWh — askfilo.com solved all-day efficiency question', () => {
    expect(xfmr('EOUT', 15, loads, pfs, hours)).toBeCloseTo(171.75, 9);
  });
  it('energy lost 0.25·24 + (21.875·9 + 350·7 + 196.875·6)/1000 = 9.828 kWh — same question', () => {
    expect(xfmr('ELOSS', 250, 350, loads, hours)).toBeCloseTo(6 + 3.828125, 9);
  });
  it('all-day efficiency 171.75 / (171.75 + 9.828) = 94.59 % — same question, computed from its steps', () => {
    expect((xfmr('ALLDAY', 15, 250, 350, loads, pfs, hours) as number) * 100).toBeCloseTo(94.59, 2);
  });
  const year = Array.from({ length: 8760 }, (_, h) => 0.35 + 0.3 * Math.sin((2 * Math.PI * h) / 24) ** 2 + 0.1 * Math.cos((2 * Math.PI * h) / 8760));
  it('energy lost over 8,760 h equals Σ(P0 + Pk·x²)·1 h — @formulajs/formulajs SUMSQ', () => {
    const expected = (1400 * 8760 + 10500 * (formulajs.SUMSQ(year) as number)) / 1000;
    expect(xfmr('ELOSS', 1400, 10500, col(year))).toBeCloseTo(expected, 6);
  });
  it('load factor = AVERAGE/MAX — @formulajs/formulajs AVERAGE and MAX', () => {
    expect(xfmr('LOADFACTOR', col(year))).toBeCloseTo((formulajs.AVERAGE(year) as number) / (formulajs.MAX(year) as number), 12);
  });
  it('loss factor = SUMSQ/COUNT/MAX² — @formulajs/formulajs SUMSQ, COUNT, MAX', () => {
    expect(xfmr('LOSSFACTOR', col(year))).toBeCloseTo((formulajs.SUMSQ(year) as number) / (formulajs.COUNT(year) as number) / (formulajs.MAX(year) as number) ** 2, 12);
  });
  it('energy out with per-step power factor = Σ x·S·pf·t — @formulajs/formulajs SUMPRODUCT', () => {
    const pf = year.map((_, h) => 0.85 + 0.1 * ((h % 24) / 24));
    expect(xfmr('EOUT', 1000, col(year), col(pf))).toBeCloseTo(1000 * (formulajs.SUMPRODUCT(col(year), col(pf)) as number), 5);
  });
  it('empirical loss factor 0.3·LF + 0.7·LF² — cable-rating reference (k ≈ 0.3)', () => {
    expect(xfmr('LSF', 0.5)).toBeCloseTo(0.3 * 0.5 + 0.7 * 0.25, 12);
    expect(xfmr('LSF', 0.5, 0.15)).toBeCloseTo(0.15 * 0.5 + 0.85 * 0.25, 12);
  });
});
