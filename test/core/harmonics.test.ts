import { describe, expect, it } from 'vitest';
import { InputError, NoAnswerError } from '../../src/core/errors';
import { harmonicDerating, harmonicLossFactor, kFactor } from '../../src/core/harmonics';

const f = (...v: number[]) => Float64Array.from(v);

describe('harmonicLossFactor', () => {
  it('is 1 for a pure sine, and does not depend on the unit of the currents', () => {
    expect(harmonicLossFactor(f(1), f(120))).toBe(1);
    expect(harmonicLossFactor(f(1, 5, 7), f(100, 20, 14))).toBeCloseTo(harmonicLossFactor(f(1, 5, 7), f(1, 0.2, 0.14)), 12);
  });
  it('one 5th harmonic of 20 %: (1 + 0.04·25) / 1.04', () => {
    expect(harmonicLossFactor(f(1, 5), f(1, 0.2))).toBeCloseTo(2 / 1.04, 12);
  });
  it('refuses mismatched lengths, an order below 1 and an all-zero spectrum', () => {
    expect(() => harmonicLossFactor(f(1, 5), f(1))).toThrow(/one current per order/);
    expect(() => harmonicLossFactor(f(0.5, 5), f(1, 0.2))).toThrow(/below the fundamental/);
    expect(() => harmonicLossFactor(f(1, 5), f(0, 0))).toThrow(NoAnswerError);
    expect(() => harmonicLossFactor(f(1, 5), f(1, -0.2))).toThrow(/currents \(step 2\)/);
  });
});

describe('kFactor', () => {
  it('is 1 for a linear load at rated current', () => {
    expect(kFactor(f(1), f(1))).toBe(1);
  });
  it('falls with the square of the load: a quarter at half the current', () => {
    const full = kFactor(f(1, 5, 7), f(0.95, 0.25, 0.18));
    expect(kFactor(f(1, 5, 7), f(0.475, 0.125, 0.09))).toBeCloseTo(full / 4, 12);
  });
  it('equals the harmonic loss factor when the spectrum is scaled to an rms of 1 per unit', () => {
    const h = f(1, 3, 5, 7);
    const i = f(1, 0.3, 0.2, 0.1);
    const rms = Math.hypot(...i);
    expect(kFactor(h, i.map((x) => x / rms))).toBeCloseTo(harmonicLossFactor(h, i), 12);
  });
  it('refuses currents that look like amperes', () => {
    expect(() => kFactor(f(1, 5), f(100, 20))).toThrow(/not in A/);
  });
});

describe('harmonicDerating', () => {
  it('is 1 for a sine (hlf 1) and when the winding has no eddy loss', () => {
    expect(harmonicDerating(1, 0.1)).toBe(1);
    expect(harmonicDerating(8, 0)).toBe(1);
  });
  it('at the derated current the winding loss equals the rated one: I²·(1 + F_HL·P_EC) = 1 + P_EC', () => {
    const i = harmonicDerating(8.35, 0.08);
    expect(i * i * (1 + 8.35 * 0.08)).toBeCloseTo(1.08, 12);
  });
  it('refuses a loss factor below 1 and a negative eddy loss', () => {
    expect(() => harmonicDerating(0.8, 0.1)).toThrow(InputError);
    expect(() => harmonicDerating(3, -0.1)).toThrow(/eddy_pu/);
  });
});
