/**
 * Efficiency, its peak and the peak efficiency index checked against published solved problems,
 * a mathjs derivative and EU 548/2014; each check names its source.
 * Every check goes through the cell layer, as a user's formula would.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { xfmr } from '../support/cells';

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
