/** Regulation and load sharing against textbook worked examples and mathjs complex arithmetic. */
import { complex, add, multiply, divide, abs, type Complex } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { parallelShare, voltageRegulation } from '../../src/core/voltageRegulation';

describe('voltage regulation, textbook worked examples', () => {
  it('2 % resistance, 5 % reactance, full load at 0.8 pf lagging → 4.6375 %', () => {
    // Source: Scilab Textbook Companion 3640, chapter 3, example 3.9 (github FOSSEE/Scilab-TBC-
    // Uploads, 3640/CH3/EX3.9/Ex3_9.sce): I2 = 1∠−acos 0.8, Z = 0.02 + j0.05, V1 = 1 + I2·Z,
    // regulation |V1| − 1 = 0.046375 — the same convention (secondary at rated voltage).
    expect(voltageRegulation(0.02, 0.05, 1, 0.8, false)).toBeCloseTo(0.046375, 6);
  });
  it('3 % resistance, 6 % reactance: regulation is largest at pf 0.45 and is then 6.7 %', () => {
    // Source: R. Anandanatarajan, Electrical Engineering, example 2.29, page 2.52 (Scilab
    // Textbook Companion, github Lavitha/Scilab_TBC): "Power factor is 0.45", "percentage
    // regulation at this power factor is 6.7 percent".
    const pf = Math.cos(Math.atan(6 / 3));
    expect(pf.toFixed(2)).toBe('0.45');
    const reg = voltageRegulation(0.03, 0.06, 1, pf, false);
    expect((reg * 100).toFixed(1)).toBe('6.7');
    for (let p = 0.05; p <= 1; p += 0.05) {
      expect(voltageRegulation(0.03, 0.06, 1, p, false)).toBeLessThanOrEqual(reg + 1e-12);
    }
  });
  it('agrees within 0.005 percentage points with the textbook approximation p cos φ + q sin φ + (q cos φ − p sin φ)²/200', () => {
    // Source: the approximate regulation formula in percent (docs/references.md,
    // Voltage regulation and impedance: confirmed in a printed textbook). It approximates the other
    // convention; for distribution impedances the two meet this closely.
    for (const [p, q, pf] of [
      [1.05, 5.65, 0.85],
      [2, 5, 0.8],
      [0.9, 4.4, 0.95],
    ] as const) {
      const s = Math.sqrt(1 - pf * pf);
      const approx = p * pf + q * s + (q * pf - p * s) ** 2 / 200;
      expect(Math.abs(voltageRegulation(p / 100, q / 100, 1, pf, false) * 100 - approx)).toBeLessThan(0.005);
    }
  });
});

describe('voltage regulation = |1 + I·Z| − 1 computed with mathjs complex numbers', () => {
  const cases: [number, number, number, number, boolean][] = [
    [0.0105, 0.0565, 1, 0.85, false],
    [0.0105, 0.0565, 1, 0.85, true],
    [0.02, 0.05, 0.6, 0.8, true],
    [0.012, 0.045, 1.2, 0.3, false],
  ];
  it.each(cases)('r %s, x %s, load %s, pf %s, leading %s', (r, x, load, pf, leading) => {
    // Source: mathjs complex arithmetic (general-purpose library), phasor sum E = V + I·Z.
    const phi = Math.acos(pf) * (leading ? 1 : -1);
    const i = multiply(complex({ r: load, phi }), complex(r, x)) as Complex;
    const e = abs(add(complex(1, 0), i) as Complex) as unknown as number;
    expect(voltageRegulation(r, x, load, pf, leading)).toBeCloseTo(e - 1, 12);
  });
});

describe('parallel sharing against the complex current divider (mathjs)', () => {
  /** Complex shares S·Z_other/(Z_a + Z_b), impedances on a common base: magnitudes in kVA. */
  function complexShares(load: number, za: Complex, zb: Complex): [number, number] {
    const total = add(za, zb) as Complex;
    return [
      (abs(divide(zb, total) as Complex) as unknown as number) * load,
      (abs(divide(za, total) as Complex) as unknown as number) * load,
    ];
  }
  it('is exact when the units have the same X/R ratio', () => {
    // 1000 kVA at 6 % and 500 kVA at 4 %, both X/R = 5, on a 1000 kVA base: z_b = 2 × 4 %.
    const zr = (z: number) => complex(z / Math.sqrt(26), (5 * z) / Math.sqrt(26));
    const [a, b] = complexShares(1200, zr(0.06), zr(0.08));
    const rows = parallelShare(Float64Array.of(1000, 500), Float64Array.of(0.06, 0.04), 1200);
    expect(rows[0]![0]).toBeCloseTo(a, 9);
    expect(rows[1]![0]).toBeCloseTo(b, 9);
  });
  it('is within 1 % of the complex division for units of unequal X/R', () => {
    // Source: Scilab Textbook Companion 3816, chapter 5, example 5.5 (github sunilshetye/
    // Scilab-TBC-Uploads-1, 3816/CH5/EX5.5/5_5.sce): 500 kVA with 0.010 + j0.05, 250 kVA with
    // 0.015 + j0.04, together carrying 750 kVA; on the 500 kVA base the second is 2 × its value.
    const [a, b] = complexShares(750, complex(0.01, 0.05), complex(0.03, 0.08));
    const z1 = Math.hypot(0.01, 0.05);
    const z2 = Math.hypot(0.015, 0.04);
    const rows = parallelShare(Float64Array.of(500, 250), Float64Array.of(z1, z2), 750);
    expect(Math.abs((rows[0]![0] as number) - a) / a).toBeLessThan(0.01);
    expect(Math.abs((rows[1]![0] as number) - b) / b).toBeLessThan(0.01);
  });
});
