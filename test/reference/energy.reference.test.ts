/**
 * All-day energy, load factor and loss factor checked against a published solved question and
 * formulajs sums; each check names its source.
 * Every check goes through the cell layer, as a user's formula would.
 */
import * as formulajs from '@formulajs/formulajs';
import { describe, expect, it } from 'vitest';
import { column as col, xfmr } from '../support/cells';

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
