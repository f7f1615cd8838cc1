/** Allowances for sites above 1000 m against the rules as stated in stored copies. */
import { describe, expect, it } from 'vitest';
import { altitudeDerating } from '../../src/core/altitude';

describe('IEEE: the kVA rating falls by a fixed share per 100 m above 1000 m', () => {
  it('dry-type self-cooled: 0.3 % per 100 m', () => {
    // Source: trcsupport.eaton.com, "How to derate a transformer for use at high altitudes" ("derate
    // the nameplate kVA by 0.3% for each 330 feet (100 meters) in excess of 3300 feet (1000 meters)");
    // the same 0.3 % per 100 m in hammondpowersolutions.com's FAQ.
    expect(altitudeDerating(2000, 'AN', 'IEEE', 'kva')).toBeCloseTo(0.97, 12);
    expect(altitudeDerating(3000, 'AN', 'IEEE', 'kva')).toBeCloseTo(0.94, 12);
  });
  it('liquid-immersed: 0.4 % self-cooled, 0.5 % with forced cooling (from memory)', () => {
    expect(altitudeDerating(2000, 'ONAN', 'IEEE', 'kva')).toBeCloseTo(0.96, 12);
    expect(altitudeDerating(2500, 'ONAF', 'IEEE', 'kva')).toBeCloseTo(0.925, 12);
  });
  it('no derating up to 1000 m', () => {
    expect(altitudeDerating(1000, 'ONAN', 'IEEE', 'kva')).toBe(1);
    expect(altitudeDerating(-200, 'ONAN', 'IEEE', 'kva')).toBe(1);
  });
});

describe('IEC 60076-2: the temperature-rise limits fall instead', () => {
  // Source: ask.abb.com, "How does altitude affect transformer performance?": "for a naturally-
  // cooled transformer (....AN) ... reduced by 1 K for every interval of 400 m by which the
  // installation's altitude exceeds 1,000 m; for a forced-cooled transformer (…. AF), the
  // reduction shall be 1 K for every 250 m". A started interval is counted whole here.
  it('ONAN: 1 K per 400 m', () => {
    expect(altitudeDerating(1800, 'ONAN', 'IEC', 'rise')).toBe(2);
    expect(altitudeDerating(1900, 'ONAN', 'IEC', 'rise')).toBe(3);
  });
  it('forced cooling: 1 K per 250 m', () => {
    expect(altitudeDerating(1750, 'ONAF', 'IEC', 'rise')).toBe(3);
    expect(altitudeDerating(1800, 'OFAF', 'IEC', 'rise')).toBe(4);
  });
  it('asks for the other quantity where a standard has no such rule', () => {
    expect(() => altitudeDerating(2000, 'ONAN', 'IEC', 'kva')).toThrow(/argument quantity: IEC 60076-2 reduces/);
    expect(() => altitudeDerating(2000, 'AN', 'IEC', 'rise')).toThrow(/argument cooling/);
  });
});
