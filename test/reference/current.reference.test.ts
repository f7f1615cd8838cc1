/**
 * Currents and apparent power checked against S = √3·V·I, IEC 60076-5's short-circuit relation and
 * mathjs units; each check names its source.
 * Every check goes through the cell layer, as a user's formula would.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { errorOf, xfmr } from '../support/cells';

describe('current and power', () => {
  it('1000 kVA at 480 V three-phase is 1202.8 A — common practice (I = S/(√3·V)); mathjs units', () => {
    const amps = xfmr('IRATED', 1000, 480) as number;
    expect(amps).toBeCloseTo(1202.8, 1);
    expect(amps).toBeCloseTo(math.evaluate('1000 kVA / (sqrt(3) * 480 V)').toNumber('A'), 9);
  });
  it('1000 kVA at 400 V three-phase is 1443.4 A — common practice; mathjs units', () => {
    expect(xfmr('IRATED', 1000, 400)).toBeCloseTo(1443.4, 1);
    expect(xfmr('IRATED', 1000, 400)).toBeCloseTo(math.evaluate('1000 kVA / (sqrt(3) * 400 V)').toNumber('A'), 9);
  });
  it('50 kVA at 240 V single-phase is 208.3 A — common practice (I = S/V); mathjs units', () => {
    expect(xfmr('IRATED', 50, 240, 1)).toBeCloseTo(math.evaluate('50 kVA / 240 V').toNumber('A'), 9);
  });
  it('apparent power from current inverts it: 1202.8 A at 480 V is 1000 kVA — common practice; mathjs units', () => {
    expect(xfmr('KVA', 1202.813, 480)).toBeCloseTo(math.evaluate('sqrt(3) * 480 V * 1202.813 A').toNumber('kVA'), 9);
  });
  it('a delta winding carries line current / √3 — common practice', () => {
    expect(xfmr('IWINDING', 1000, 13200, 'D')).toBeCloseTo((xfmr('IRATED', 1000, 13200) as number) / Math.sqrt(3), 9);
  });
  it('fault current on an infinite bus is Ir / z: 1000 kVA, 480 V, 5.75 % → 20,918 A — common practice', () => {
    expect(xfmr('ISC', 1000, 480, 0.0575)).toBeCloseTo(20918.5, 0);
  });
  it('fault current with a 500 MVA source: U/(√3·(z·U²/Sr + U²/Ss)) — IEC 60076-5 clause 4.2 (from memory); mathjs units', () => {
    const zt = math.evaluate('0.0575 * (480 V)^2 / (1000 kVA)');
    const zs = math.evaluate('(480 V)^2 / (500 MVA)');
    const amps = math.divide(math.unit(480, 'V'), math.multiply(Math.sqrt(3), math.add(zt, zs))) as math.Unit;
    expect(xfmr('ISC', 1000, 480, 0.0575, 500)).toBeCloseTo(amps.toNumber('A'), 6);
  });
});

describe('IWINDING with a vector group', () => {
  it('1000 kVA at 480 V on the star (LV) side of Dyn11 carries 1,202.8 A — common practice (S = √3·V·I, star = line current)', () => {
    // Before: 694.4 A, the HV delta letter applied to the LV voltage.
    expect(xfmr('IWINDING', 1000, 480, 'Dyn11', 3, 'LV')).toBeCloseTo(1202.8, 1);
    expect(xfmr('IWINDING', 1000, 480, 'yn')).toBeCloseTo(1202.8, 1);
    expect(xfmr('IWINDING', 1000, 480, 'Dyn11', 3, 'LV')).toBeCloseTo(math.evaluate('1000 kVA / (sqrt(3) * 480 V)').toNumber('A'), 9);
  });
  it('the HV delta of the same unit at 13.2 kV carries line current / √3 — common practice', () => {
    expect(xfmr('IWINDING', 1000, 13200, 'Dyn11', 3, 'HV')).toBeCloseTo((xfmr('IRATED', 1000, 13200) as number) / Math.sqrt(3), 9);
  });
  it('a whole vector group without a side is refused, saying what to type', () => {
    expect(errorOf(xfmr('IWINDING', 1000, 480, 'Dyn11')).message).toMatch(
      /argument vector_letter: "Dyn11" names both windings; type the letter .*"D" for the HV side, "yn" for the LV side/,
    );
  });
});
