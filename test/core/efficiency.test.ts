import { describe, expect, it } from 'vitest';
import { NoAnswerError } from '../../src/core/errors';
import { efficiencyAt, efficiencyCurve, maxEfficiency, maxEfficiencyLoad, peakEfficiencyIndex } from '../../src/core/efficiency';

describe('efficiency', () => {
  it('is output over output plus losses', () => {
    expect(efficiencyAt(1000, 1000, 10000, 1, 1)).toBeCloseTo(1000000 / 1011000, 12);
  });
  it('is 0 at no load and undefined with no loss at no load', () => {
    expect(efficiencyAt(1000, 1000, 10000, 0, 1)).toBe(0);
    expect(() => efficiencyAt(1000, 0, 10000, 0, 1)).toThrow(NoAnswerError);
  });
  it('refuses a power factor above 1 or at 0', () => {
    expect(() => efficiencyAt(1000, 1000, 10000, 1, 1.1)).toThrow(/pf/);
    expect(() => efficiencyAt(1000, 1000, 10000, 1, 0)).toThrow(/pf/);
  });
  it('peaks where load loss equals no-load loss', () => {
    const x = maxEfficiencyLoad(1000, 10000);
    expect(x).toBeCloseTo(Math.sqrt(0.1), 12);
    const peak = maxEfficiency(1000, 1000, 10000, 1);
    expect(peak).toBeGreaterThan(efficiencyAt(1000, 1000, 10000, x * 0.99, 1));
    expect(peak).toBeGreaterThan(efficiencyAt(1000, 1000, 10000, x * 1.01, 1));
  });
  it('curve rows run from 0 to max_load', () => {
    const rows = efficiencyCurve(1000, 1000, 10000, 1, 5, 1);
    expect(rows.map((r) => r[0])).toEqual([0, 0.25, 0.5, 0.75, 1]);
    expect(rows[4]![1]).toBeCloseTo(efficiencyAt(1000, 1000, 10000, 1, 1), 12);
    expect(rows[2]![2]).toBe(1000 + 2500);
    expect(() => efficiencyCurve(1000, 1000, 10000, 1, 1, 1)).toThrow(/points/);
  });
  it('peak efficiency index equals the peak efficiency at unity power factor when Pc0 = 0', () => {
    // At the peak, η = 1 − 2·P0 / (x·S + 2·P0); PEI divides by x·S alone, so it sits slightly lower.
    const pei = peakEfficiencyIndex(1000, 1000, 10000, 0);
    const x = Math.sqrt(0.1);
    expect(pei).toBeCloseTo(1 - 2000 / (1e6 * x), 12);
  });
});

describe('efficiencyCurve agrees with efficiencyAt', () => {
  it('every row is the efficiency and the losses at its load', () => {
    for (const [x, eta, losses] of efficiencyCurve(1000, 1400, 10500, 0.9, 11, 1.25)) {
      expect(eta).toBe(efficiencyAt(1000, 1400, 10500, x!, 0.9));
      expect(losses).toBe(1400 + x! * x! * 10500);
    }
  });
  it('with no core loss the zero-load row has no answer, as efficiencyAt refuses it', () => {
    expect(() => efficiencyAt(1000, 0, 10500, 0, 1)).toThrow(NoAnswerError);
    expect(efficiencyCurve(1000, 0, 10500, 1, 3, 1)[0]![1]).toBeNaN();
  });
});
