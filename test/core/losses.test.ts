import { describe, expect, it } from 'vitest';
import { loadLossAt, loadLossAtTemperature, totalLossesAt } from '../../src/core/losses';

describe('losses', () => {
  it('load loss scales with load squared; total adds no-load loss', () => {
    expect(loadLossAt(10000, 0.5)).toBe(2500);
    expect(totalLossesAt(1400, 10000, 0.5)).toBe(3900);
    expect(loadLossAt(10000, 1.2)).toBeCloseTo(14400, 9);
  });
  it('refuses a negative load', () => {
    expect(() => loadLossAt(10000, -0.1)).toThrow(/load/);
  });
  it('temperature correction leaves the loss alone when from = to', () => {
    expect(loadLossAtTemperature(10000, 75, 75, 8000, 'Cu', 'IEEE')).toBeCloseTo(10000, 9);
  });
  it('I²R part rises and stray part falls when corrected hotter', () => {
    const all = loadLossAtTemperature(10000, 25, 85, undefined, 'Cu', 'IEEE');
    const split = loadLossAtTemperature(10000, 25, 85, 8000, 'Cu', 'IEEE');
    expect(all).toBeGreaterThan(split);
    expect(split).toBeGreaterThan(10000);
  });
  it('refuses an I²R part larger than the whole', () => {
    expect(() => loadLossAtTemperature(10000, 25, 85, 12000, 'Cu', 'IEEE')).toThrow(/i2r_w/);
  });
});
