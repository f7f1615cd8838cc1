import { describe, expect, it } from 'vitest';
import { loadLossWorth, lossEnergyCost, noLoadLossWorth, presentWorthFactor, totalOwningCost } from '../../src/core/cost';
import { InputError } from '../../src/core/errors';

describe('presentWorthFactor', () => {
  it('is the plain number of years when the rate is 0 (no discounting)', () => {
    expect(presentWorthFactor(0, 25)).toBe(25);
  });
  it('is below the number of years for any positive rate, and one year is worth 1/(1+i)', () => {
    expect(presentWorthFactor(0.08, 1)).toBeCloseTo(1 / 1.08, 12);
    expect(presentWorthFactor(0.08, 30)).toBeLessThan(30);
  });
  it('tends smoothly to the number of years as the rate falls to 0', () => {
    expect(presentWorthFactor(1e-12, 25)).toBeCloseTo(25, 8);
  });
  it('refuses a rate typed as a whole percentage, with the hint', () => {
    expect(() => presentWorthFactor(6, 25)).toThrow(/type it as a percentage/);
  });
  it('refuses negative rates and fractional or absurd periods', () => {
    expect(() => presentWorthFactor(-0.02, 25)).toThrow(InputError);
    expect(() => presentWorthFactor(0.05, 2.5)).toThrow(/whole number from 1 to 100/);
    expect(() => presentWorthFactor(0.05, 0)).toThrow(/years/);
    expect(() => presentWorthFactor(0.05, 101)).toThrow(/years/);
  });
});

describe('A and B factors', () => {
  it('A for one undiscounted year is the price of 8.76 kWh', () => {
    expect(noLoadLossWorth(0.1, 0, 1, 8760)).toBeCloseTo(0.876, 12);
  });
  it('B is A times the loss factor times the peak load squared', () => {
    const a = noLoadLossWorth(0.12, 0.06, 25, 8760);
    expect(loadLossWorth(0.12, 0.35, 0.8, 0.06, 25, 8760)).toBeCloseTo(a * 0.35 * 0.64, 12);
  });
  it('a unit energised part of the year is worth proportionally less', () => {
    expect(noLoadLossWorth(0.12, 0.06, 25, 4380)).toBeCloseTo(noLoadLossWorth(0.12, 0.06, 25, 8760) / 2, 12);
  });
  it('refuses more hours than a leap year has, and a loss factor above 1', () => {
    expect(() => noLoadLossWorth(0.12, 0.06, 25, 9000)).toThrow(/hours/);
    expect(() => loadLossWorth(0.12, 1.2, 0.8, 0.06, 25, 8760)).toThrow(/loss_factor/);
    expect(() => noLoadLossWorth(-0.1, 0.06, 25, 8760)).toThrow(/price_kwh/);
  });
});

describe('totalOwningCost', () => {
  it('is price + A·P0 + B·Pk', () => {
    expect(totalOwningCost(18500, 1100, 9000, 10, 2)).toBe(18500 + 11000 + 18000);
  });
  it('names the argument that is negative', () => {
    expect(() => totalOwningCost(18500, -1, 9000, 10, 2)).toThrow(/p0_w/);
  });
});

describe('lossEnergyCost', () => {
  it('prices the energy lost over the profile', () => {
    // (1000 W × 2 h + 10 000 W × (0.25 + 1) h) / 1000 = 14.5 kWh at 0.10 a kWh
    expect(lossEnergyCost(1000, 10000, Float64Array.of(0.5, 1), 0.1, Float64Array.of(1))).toBeCloseTo(1.45, 12);
  });
});
