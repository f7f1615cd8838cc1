import { describe, expect, it } from 'vitest';
import { allDayEfficiency, energyDelivered, energyLost, loadFactor, lossFactor, lossFactorEstimate } from '../../src/core/energy';
import { efficiencyAt } from '../../src/core/efficiency';

const f = (...v: number[]) => Float64Array.from(v);

describe('energy over a profile', () => {
  it('sums output with fixed and per-step hours and power factors', () => {
    expect(energyDelivered(100, f(0.5, 1), f(1), f(2))).toBe(300);
    expect(energyDelivered(100, f(0.5, 1), f(0.8, 1), f(1, 3))).toBeCloseTo(40 + 300, 9);
  });
  it('sums losses: no-load loss all the time, load loss by load squared', () => {
    expect(energyLost(1000, 4000, f(0, 0.5, 1), f(1))).toBeCloseTo((3000 + 1000 + 4000) / 1000, 12);
  });
  it('all-day efficiency of a flat profile equals efficiency at that load', () => {
    const flat = new Float64Array(24).fill(0.6);
    expect(allDayEfficiency(500, 900, 6000, flat, f(0.9), f(1))).toBeCloseTo(efficiencyAt(500, 900, 6000, 0.6, 0.9), 12);
  });
  it('refuses a series of the wrong length and names the step of a bad value', () => {
    expect(() => energyLost(1000, 4000, f(0.5, 1), f(1, 1, 1))).toThrow(/hours: has 3 values/);
    expect(() => energyLost(1000, 4000, f(0.5, -1), f(1))).toThrow(/loads \(step 2\)/);
    expect(() => energyDelivered(100, f(0.5), f(1.2), f(1))).toThrow(/pfs/);
  });
  it('load factor and loss factor of a two-level profile', () => {
    expect(loadFactor(f(0.5, 1))).toBeCloseTo(0.75, 12);
    expect(lossFactor(f(0.5, 1))).toBeCloseTo(0.625, 12);
    expect(() => loadFactor(f(0, 0))).toThrow(/undefined/);
  });
  it('empirical loss factor lies between LF² and LF', () => {
    const lsf = lossFactorEstimate(0.6, 0.3);
    expect(lsf).toBeCloseTo(0.3 * 0.6 + 0.7 * 0.36, 12);
    expect(lsf).toBeGreaterThan(0.36);
    expect(lsf).toBeLessThan(0.6);
    expect(() => lossFactorEstimate(1.2, 0.3)).toThrow(/load_factor/);
  });
});
