/**
 * Winding current with a vector group, and load loss moved between reference temperatures:
 * the values a practitioner's independent calculation gives.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { windingCurrent } from '../../src/core/current';
import { loadLossAtTemperature } from '../../src/core/losses';

describe('IWINDING with a vector group', () => {
  it('1000 kVA at 480 V on the star (LV) side of Dyn11 carries 1,202.8 A', () => {
    // Source: S = √3·V·I (common practice): 1 000 000 / (√3 × 480) = 1202.8 A; a star winding
    // carries the line current. Before: 694.4 A, the HV delta letter applied to the LV voltage.
    expect(windingCurrent(1000, 480, 'Dyn11', 3, 'LV')).toBeCloseTo(1202.8, 1);
    expect(windingCurrent(1000, 480, 'yn', 3)).toBeCloseTo(1202.8, 1);
  });
  it('the HV delta of the same unit at 13.2 kV carries line current / √3', () => {
    expect(windingCurrent(1000, 13200, 'Dyn11', 3, 'HV')).toBeCloseTo(1e6 / (Math.sqrt(3) * 13200) / Math.sqrt(3), 9);
  });
  it('a whole vector group without a side is refused, saying what to type', () => {
    expect(() => windingCurrent(1000, 480, 'Dyn11', 3)).toThrow(/argument vector_letter: "Dyn11" names both windings; type the letter .*"D" for the HV side, "yn" for the LV side/);
  });
});

describe('LOSSTEMP: load loss between reference temperatures', () => {
  // Source: IEEE C57.12.90 load-loss correction (from memory), P(to) = I²R·f + stray/f,
  // f = (234.5 + to)/(234.5 + from) for copper.
  const f = (234.5 + 55) / (234.5 + 85);
  it('85 → 55 °C with 20 % stray: 9,456 W (not the 9,061 W of an all-I²R reading)', () => {
    expect(loadLossAtTemperature(10000, 85, 55, 8000, 'Cu', 'IEEE')).toBeCloseTo(8000 * f + 2000 / f, 6);
    expect(Math.round(loadLossAtTemperature(10000, 85, 55, 8000, 'Cu', 'IEEE'))).toBe(9456);
    expect(Math.round(10000 * f)).toBe(9061); // what a blank i2r_w gave before
  });
  it('correcting cooler with i2r_w blank is refused: it would understate the loss', () => {
    expect(() => loadLossAtTemperature(10000, 85, 55, undefined, 'Cu', 'IEEE')).toThrow(/argument i2r_w: is blank; correcting from 85 °C down to 55 °C/);
  });
  it('correcting hotter with i2r_w blank gives the largest result any split could give', () => {
    // Property (fast-check): for every I²R share, the blank reading is not below the split one.
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: -20, max: 80, noNaN: true }),
        fc.double({ min: 0, max: 60, noNaN: true }),
        (share, from, rise) => {
          const to = from + rise;
          const blank = loadLossAtTemperature(10000, from, to, undefined, 'Cu', 'IEEE');
          const split = loadLossAtTemperature(10000, from, to, 10000 * share, 'Cu', 'IEEE');
          return blank >= split * (1 - 1e-12);
        },
      ),
    );
  });
});
