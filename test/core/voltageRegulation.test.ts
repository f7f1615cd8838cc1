import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors';
import { baseImpedance, parallelShare, percentReactance, percentResistance, voltageRegulation } from '../../src/core/voltageRegulation';

const f = (...v: number[]) => Float64Array.from(v);

describe('percentResistance and percentReactance', () => {
  it('10 500 W on 1000 kVA is 1.05 % resistance; with 5.75 % impedance the reactance is 5.653 %', () => {
    expect(percentResistance(10500, 1000)).toBeCloseTo(0.0105, 12);
    expect(percentReactance(0.0575, 0.0105)).toBeCloseTo(Math.sqrt(0.0575 ** 2 - 0.0105 ** 2), 12);
  });
  it('refuses a resistance above the impedance, and a load loss that is the whole rating (kW typed as W)', () => {
    expect(() => percentReactance(0.04, 0.05)).toThrow(/cannot exceed z/);
    expect(() => percentResistance(2_000_000, 1000)).toThrow(/pk_w/);
  });
  it('hints at the % sign when the impedance is typed as a whole number', () => {
    expect(() => percentReactance(5.75, 0.01)).toThrow(/5\.75%/);
  });
});

describe('voltageRegulation', () => {
  it('is 0 at no load and for an ideal transformer', () => {
    expect(voltageRegulation(0.01, 0.05, 0, 0.8, false)).toBe(0);
    expect(voltageRegulation(0, 0, 1, 0.8, false)).toBe(0);
  });
  it('at unity power factor is about r + x²/2', () => {
    expect(voltageRegulation(0.01, 0.05, 1, 1, false)).toBeCloseTo(Math.hypot(1.01, 0.05) - 1, 14);
  });
  it('scales almost linearly with load', () => {
    const full = voltageRegulation(0.01, 0.05, 1, 0.8, false);
    const half = voltageRegulation(0.01, 0.05, 0.5, 0.8, false);
    expect(half / full).toBeCloseTo(0.5, 2);
  });
  it('a leading load of enough reactance raises the voltage: negative regulation', () => {
    expect(voltageRegulation(0.01, 0.05, 1, 0.8, true)).toBeLessThan(0);
  });
  it('accepts a power factor of 0 (a purely reactive load) and refuses one above 1', () => {
    // I = −j: I·Z = x − jr, so |1 + x − jr| − 1
    expect(voltageRegulation(0.01, 0.05, 1, 0, false)).toBeCloseTo(Math.hypot(1.05, 0.01) - 1, 14);
    expect(() => voltageRegulation(0.01, 0.05, 1, 1.2, false)).toThrow(/pf/);
  });
  it('refuses a negative load', () => {
    expect(() => voltageRegulation(0.01, 0.05, -1, 0.8, false)).toThrow(InputError);
  });
});

describe('baseImpedance', () => {
  it('480 V, 1000 kVA → 0.2304 Ω', () => {
    expect(baseImpedance(480, 1000)).toBeCloseTo(0.2304, 12);
  });
});

describe('parallelShare', () => {
  it('two equal units with equal impedance split the load in half', () => {
    const rows = parallelShare(f(1000, 1000), f(0.06), 1500);
    expect(rows).toEqual([
      [750, 0.75, false],
      [750, 0.75, false],
    ]);
  });
  it('the unit with the lower impedance takes more than its share and is flagged when overloaded', () => {
    const rows = parallelShare(f(1000, 500), f(0.05, 0.06), 1500);
    const [a, b] = rows as [[number, number, boolean], [number, number, boolean]];
    expect(a[0] + b[0]).toBeCloseTo(1500, 9);
    // shares ∝ S/z: 20 000 and 8 333.3 → 1058.8 and 441.2 kVA
    expect(a[0]).toBeCloseTo((1500 * 20000) / (20000 + 500 / 0.06), 9);
    expect(a[2]).toBe(true);
    expect(b[2]).toBe(false);
  });
  it('refuses a count of impedances that is neither one nor one per unit', () => {
    expect(() => parallelShare(f(1000, 500, 500), f(0.05, 0.06), 1500)).toThrow(/zs/);
  });
  it('names the unit whose impedance is out of range', () => {
    expect(() => parallelShare(f(1000, 500), f(0.05, 6), 1500)).toThrow(/zs \(step 2\)/);
  });
});
