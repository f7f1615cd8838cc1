import { describe, expect, it } from 'vitest';
import { altitudeDerating } from '../../src/core/altitude';
import { peakFactor, peakShortCircuitCurrent, shortCircuitTemperature } from '../../src/core/shortCircuit';
import { toleranceLimit, withinTolerance } from '../../src/core/testReport';

describe('test-report tolerances', () => {
  it('a result exactly on the limit passes, the smallest step beyond fails', () => {
    expect(withinTolerance(13200, 12000, 'total loss', 'IEC', undefined, 'two-winding')).toBe(true);
    expect(withinTolerance(13200.01, 12000, 'total loss', 'IEC', undefined, 'two-winding')).toBe(false);
  });
  it('losses below the guarantee always pass; impedance below the band fails', () => {
    expect(withinTolerance(0, 12000, 'total loss', 'IEC', undefined, 'two-winding')).toBe(true);
    expect(withinTolerance(0.05, 0.06, 'impedance', 'IEC', undefined, 'two-winding')).toBe(false);
    expect(withinTolerance(0.055, 0.06, 'impedance', 'IEC', undefined, 'two-winding')).toBe(true);
  });
  it('names the argument at fault', () => {
    expect(() => toleranceLimit('impedance', 6, 'IEC', 'upper', undefined, 'two-winding')).toThrow(/argument guaranteed: 6 is 100 %/);
    expect(() => withinTolerance(-1, 100, 'total loss', 'IEC', undefined, 'two-winding')).toThrow(/argument measured/);
    expect(() => toleranceLimit('ratio', 25, 'IEC', 'upper', 6, 'two-winding')).toThrow(/argument z/);
    expect(() => toleranceLimit('impedance', 0.06, 'IEC', 'upper', undefined, 'other')).toThrow(/argument windings/);
  });
});

describe('short circuit', () => {
  it('the peak factor rises from √2 (pure resistance) towards 2√2 and is capped at 2.55 above X/R 14', () => {
    expect(peakFactor(1e-6)).toBeCloseTo(Math.SQRT2, 6);
    expect(peakFactor(2)).toBeGreaterThan(peakFactor(1));
    expect(peakFactor(14.0001)).toBeCloseTo(2.5456, 4);
  });
  it('a source X/R without a source is refused', () => {
    expect(() => peakShortCircuitCurrent(1000, 480, 0.0575, 5, undefined, 10, 3)).toThrow(/argument source_x_r: is given without source_mva/);
  });
  it('a stiffer source gives a larger peak', () => {
    const weak = peakShortCircuitCurrent(1000, 480, 0.0575, 5, 50, 10, 3);
    const stiff = peakShortCircuitCurrent(1000, 480, 0.0575, 5, 500, 10, 3);
    expect(stiff).toBeGreaterThan(weak);
  });
  it('SCTEMP: longer or denser means hotter; arguments are named', () => {
    expect(shortCircuitTemperature(60, 3, 'Cu', 105)).toBeGreaterThan(shortCircuitTemperature(60, 2, 'Cu', 105));
    expect(() => shortCircuitTemperature(60, 0, 'Cu', 105)).toThrow(/argument t_s/);
    expect(() => shortCircuitTemperature(-1, 2, 'Cu', 105)).toThrow(/argument j_a_mm2/);
    expect(() => shortCircuitTemperature(60, 2, 'Cu', 500)).toThrow(/argument theta0_c/);
  });
});

describe('altitude', () => {
  it('refuses an altitude beyond any site', () => {
    expect(() => altitudeDerating(9000, 'ONAN', 'IEEE', 'kva')).toThrow(/argument altitude_m/);
  });
});
