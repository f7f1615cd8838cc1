/** Harmonic loss factor and K-factor against a published worked example and the definitions. */
import { describe, expect, it } from 'vitest';
import { harmonicLossFactor, kFactor } from '../../src/core/harmonics';

// Source: worked K-factor table for a six-pulse spectrum in a derating calculation sheet whose
// publisher is not identified (docs/references.md, Losses): harmonic
// numbers 1, 5, 7, 11, 13, 17, 19, 23, 25 with Ih/I1 = 1, 0.200, 0.140, 0.091, 0.077, 0.058,
// 0.056, 0.043, 0.040; Σ (Ih/I1)² = 1.0838, I = 1.0410 (rms), "k-factor = 8.3476" from
// Σ (Ih/I)²·h² with the currents per unit of the rms current.
const orders = Float64Array.of(1, 5, 7, 11, 13, 17, 19, 23, 25);
const perFundamental = Float64Array.of(1, 0.2, 0.14, 0.091, 0.077, 0.058, 0.056, 0.043, 0.04);

describe('six-pulse worked example', () => {
  it('Σ (Ih/I1)² = 1.0838 and rms 1.0410', () => {
    const sum = perFundamental.reduce((s, x) => s + x * x, 0);
    expect(sum).toBeCloseTo(1.0838, 4);
    expect(Math.sqrt(sum)).toBeCloseTo(1.041, 4);
  });
  it('K-factor with the currents per unit of the rms current: 8.3476', () => {
    const rms = Math.sqrt(perFundamental.reduce((s, x) => s + x * x, 0));
    expect(kFactor(orders, perFundamental.map((x) => x / rms))).toBeCloseTo(8.3476, 3);
  });
  it('harmonic loss factor F_HL of the same spectrum is the same 8.3476 (IEEE C57.110 definition)', () => {
    // Source: IEEE Xplore document 4523666 quoting IEEE C57.110:
    // F_HL = Σ (Ih/I1)² h² / Σ (Ih/I1)² = Σ (Ih/I)² h² / Σ (Ih/I)².
    expect(harmonicLossFactor(orders, perFundamental)).toBeCloseTo(8.3476, 3);
  });
});

describe('UL K-factor definition', () => {
  it('K = Σ Ih(pu)² h²: a linear load is K-1', () => {
    // Source: encyclopedia entry "K-factor (electrical engineering)": K = Σ Ih² h², Ih the
    // per-unit current at order h; K-factor 1 is a standard transformer for linear loads.
    expect(kFactor(Float64Array.of(1), Float64Array.of(1))).toBe(1);
    expect(kFactor(Float64Array.of(1, 3), Float64Array.of(0.8, 0.6))).toBeCloseTo(0.64 + 0.36 * 9, 12);
  });
});

describe('K-factor of a spectrum in per cent of the fundamental (basis "fundamental")', () => {
  it('the six-pulse spectrum as a meter reports it (100 %, 20 %, 14 % …) gives the sheet’s 8.3476', () => {
    // Same source as above: the sheet's K-factor is taken with the spectrum scaled to its rms.
    const percent = perFundamental.map((x) => x * 100);
    expect(kFactor(orders, percent, 'fundamental')).toBeCloseTo(8.3476, 3);
    expect(kFactor(orders, perFundamental, 'fundamental')).toBeCloseTo(8.3476, 3);
  });
  it('the same per-cent spectrum on the default basis "rated" is refused, naming the basis', () => {
    const percent = perFundamental.map((x) => x * 100);
    expect(() => kFactor(orders, percent)).toThrow(/argument currents: .*basis "fundamental"/);
  });
});
