import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors';
import {
  bestTapPosition,
  idealOutputCurrent,
  idealOutputVoltage,
  ratioDeviation,
  ratioWithinTolerance,
  tapVoltage,
  turnsRatio,
} from '../../src/core/ratio';

describe('turnsRatio', () => {
  it('is the voltage ratio without a vector group', () => {
    expect(turnsRatio(7200, 240)).toBe(30);
  });
  it('uses phase-winding voltages with a vector group', () => {
    expect(turnsRatio(13200, 480, 'Yy0')).toBeCloseTo(27.5, 12);
    expect(turnsRatio(13200, 480, 'Dd0')).toBeCloseTo(27.5, 12);
    expect(turnsRatio(13200, 480, 'Dyn11')).toBeCloseTo(27.5 * Math.sqrt(3), 12);
    expect(turnsRatio(13200, 480, 'YNd1')).toBeCloseTo(27.5 / Math.sqrt(3), 12);
  });
  it('refuses a zero or negative voltage', () => {
    expect(() => turnsRatio(0, 480)).toThrow(InputError);
    expect(() => turnsRatio(13200, -480)).toThrow(/lv_v/);
  });
});

describe('ideal transformer', () => {
  it('steps voltage by turns and current the inverse way', () => {
    expect(idealOutputVoltage(240, 100, 10)).toBe(24);
    expect(idealOutputCurrent(2, 100, 10)).toBe(20);
  });
  it('refuses zero turns', () => {
    expect(() => idealOutputVoltage(240, 0, 10)).toThrow(/turns_in/);
  });
});

describe('taps', () => {
  it('moves the winding voltage by step × position', () => {
    expect(tapVoltage(13200, 0.025, 2)).toBeCloseTo(13860, 9);
    expect(tapVoltage(13200, 0.025, -2)).toBeCloseTo(12540, 9);
    expect(tapVoltage(13200, 0.025, 0)).toBe(13200);
  });
  it('refuses a fractional position and a step typed without %', () => {
    expect(() => tapVoltage(13200, 0.025, 1.5)).toThrow(/whole number/);
    expect(() => tapVoltage(13200, 2.5, 1)).toThrow(/percentage/);
  });
  it('picks the tap that brings LV nearest the target', () => {
    // A supply 2.5 % low is corrected by one step down on an HV-tapped unit.
    expect(bestTapPosition(13200 * 0.975, 480, 13200, 480, 0.025, 2)).toBe(-1);
    expect(bestTapPosition(13200, 480, 13200, 480, 0.025, 2)).toBe(0);
    // Far off the range: the end tap.
    expect(bestTapPosition(13200 * 1.2, 480, 13200, 480, 0.025, 2)).toBe(2);
  });
});

describe('ratio test', () => {
  it('gives the deviation as a fraction of the nameplate ratio', () => {
    expect(ratioDeviation(30.15, 7200, 240)).toBeCloseTo(0.005, 12);
  });
  it('passes a reading exactly on the tolerance and fails one beyond it', () => {
    expect(ratioWithinTolerance(30.15, 7200, 240, undefined, 0.005)).toBe(true);
    expect(ratioWithinTolerance(30.16, 7200, 240, undefined, 0.005)).toBe(false);
  });
});
