import { describe, expect, it } from 'vitest';
import { apparentPowerKva, faultCurrent, ratedCurrent, windingCurrent } from '../../src/core/current';

describe('currents', () => {
  it('rated current three- and single-phase', () => {
    expect(ratedCurrent(1000, 480, 3)).toBeCloseTo(1202.813, 3);
    expect(ratedCurrent(50, 240, 1)).toBeCloseTo(208.333, 3);
  });
  it('refuses a phase count other than 1 or 3', () => {
    expect(() => ratedCurrent(1000, 480, 2)).toThrow(/phases/);
  });
  it('winding current is line / √3 in delta only', () => {
    const line = ratedCurrent(1000, 13200, 3);
    expect(windingCurrent(1000, 13200, 'D', 3)).toBeCloseTo(line / Math.sqrt(3), 9);
    expect(windingCurrent(1000, 13200, 'yn', 3)).toBeCloseTo(line, 9);
    expect(windingCurrent(1000, 13200, 'Dyn11', 3, 'HV')).toBeCloseTo(line / Math.sqrt(3), 9);
    expect(() => windingCurrent(1000, 13200, 'Dyn11', 3)).toThrow(/names both windings.*"D" for the HV side, "yn" for the LV side/);
    expect(() => windingCurrent(1000, 13200, 'X', 3)).toThrow(/vector_letter/);
  });
  it('kVA from current inverts rated current', () => {
    expect(apparentPowerKva(ratedCurrent(750, 415, 3), 415, 3)).toBeCloseTo(750, 9);
  });
  it('fault current: infinite source and a finite one', () => {
    expect(faultCurrent(1000, 480, 0.0575, undefined, 3)).toBeCloseTo(1202.813 / 0.0575, 1);
    expect(faultCurrent(1000, 480, 0.0575, 500, 3)).toBeLessThan(faultCurrent(1000, 480, 0.0575, undefined, 3));
    expect(() => faultCurrent(1000, 480, 5.75, undefined, 3)).toThrow(/5.75%/);
  });
});
