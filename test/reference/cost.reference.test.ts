/**
 * The present-worth factor against a general-purpose spreadsheet library, and A and B against a
 * published loss-capitalisation worked example.
 */
import * as formulajs from '@formulajs/formulajs';
import { describe, expect, it } from 'vitest';
import { loadLossWorth, noLoadLossWorth, presentWorthFactor } from '../../src/core/cost';

describe('present-worth factor = −PV(rate, years, 1) of @formulajs/formulajs', () => {
  const cases: [number, number][] = [
    [0, 20],
    [0.03, 10],
    [0.05, 25],
    [0.065, 30],
    [0.08, 40],
    [0.12, 15],
  ];
  it.each(cases)('rate %s, %s years', (rate, years) => {
    // Source: @formulajs/formulajs PV (Excel's PV): present value of a level payment of −1 a period.
    const pv = formulajs.PV(rate, years, -1) as number;
    expect(presentWorthFactor(rate, years)).toBeCloseTo(pv, 10);
  });
});

describe('loss capitalisation worked example', () => {
  // Source: "Capitalization of Losses: Present Value Calculation" (scribd.com/document/327649859,
  // "Present Value for Customers"): electricity 0.055 EUR/kWh, 8760 h, interest 6.50 %, life 30
  // years → present value 6300 EUR/kW; load factor 45 % of maximum current → load losses 1280
  // EUR/kW. The sheet shows its results rounded (6300 to the hundred; 1280 = 6300 × 0.45²
  // rounded to ten), so the check allows for that rounding.
  it('A: 6300 EUR per kW of no-load loss', () => {
    const a = noLoadLossWorth(0.055, 0.065, 30, 8760); // EUR/W
    expect(Math.round((a * 1000) / 100) * 100).toBe(6300);
  });
  it('B: 1280 EUR per kW of load loss at a steady 45 % load (loss factor 1)', () => {
    const b = loadLossWorth(0.055, 1, 0.45, 0.065, 30, 8760);
    expect(Math.abs(b * 1000 - 1280) / 1280).toBeLessThan(0.005);
  });
});

describe('demand charge and responsibility factor in A and B (IEEE C57.120 loss evaluation, from memory)', () => {
  it('a demand charge alone is worth demand / 1000 × PW a watt of no-load loss', () => {
    // Source: @formulajs/formulajs PV for the present-worth factor.
    const pw = -(formulajs.PV(0.07, 20, 1) as number);
    expect(noLoadLossWorth(0, 0.07, 20, 8760, 95)).toBeCloseTo((95 / 1000) * pw, 10);
  });
  it('the load-loss share carries the square of the unit’s load at the system peak', () => {
    // Load loss at the system peak is Pk × (responsibility × peak)² (load loss goes with current², common practice).
    const pw = -(formulajs.PV(0.07, 20, 1) as number);
    expect(loadLossWorth(0, 0.3, 0.8, 0.07, 20, 8760, 95, 0.9)).toBeCloseTo((95 / 1000) * pw * 0.81 * 0.64, 10);
  });
  it('without a demand charge A and B are the energy terms alone', () => {
    expect(loadLossWorth(0.1, 0.3, 0.8, 0.07, 20, 8760, 0, 0.5)).toBeCloseTo(loadLossWorth(0.1, 0.3, 0.8, 0.07, 20, 8760), 12);
  });
});
