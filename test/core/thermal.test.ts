import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, NoAnswerError } from '../../src/core/errors';
import {
  agingAccelerationFactor,
  equivalentAging,
  hotSpotProfile,
  hotSpotSeriesInto,
  hotSpotSteady,
  IEC_DISTRIBUTION_ONAN,
  IEC_POWER,
  IEEE_ROWS,
  lifeFraction,
  lifeUsedHours,
  maxLoadForHotSpot,
  maxSteadyLoad,
  relativeAgingRate,
  steadyHotSpot,
  THERMAL_ROWS,
  thermalModel,
  ultimateHotSpotGradient,
  ultimateTopOilRise,
} from '../../src/core/thermal';

const one = (v: number) => Float64Array.of(v);
const filled = (n: number, v: number) => new Float64Array(n).fill(v);

function argumentOf(fn: () => unknown): string {
  try {
    fn();
  } catch (error) {
    if (error instanceof InputError) return error.argument;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('choosing the table row', () => {
  it('takes the IEC distribution row for IEC ONAN and the power rows otherwise', () => {
    expect(thermalModel('ONAN', 'IEC', undefined, undefined, undefined)).toBe(IEC_DISTRIBUTION_ONAN);
    expect(thermalModel('ONAN', 'IEC-POWER', undefined, undefined, undefined)).toBe(IEC_POWER.ONAN);
    expect(thermalModel('ONAF', 'IEC', undefined, undefined, undefined)).toBe(IEC_POWER.ONAF);
    expect(thermalModel('OD', 'IEEE', undefined, undefined, undefined)).toBe(IEEE_ROWS.OD);
  });

  it("replaces the rated values with the unit's own and checks them by name", () => {
    const m = thermalModel('ONAN', 'IEEE', 50, 20, 4);
    expect([m.topOilRise, m.hotSpotGradient, m.lossRatio, m.oilExponent]).toEqual([50, 20, 4, 0.8]);
    expect(argumentOf(() => thermalModel('ONAN', 'IEEE', 0, undefined, undefined))).toBe('top_oil_rise');
    expect(argumentOf(() => thermalModel('ONAN', 'IEEE', undefined, 150, undefined))).toBe('hs_gradient');
    expect(argumentOf(() => thermalModel('ONAN', 'IEEE', undefined, undefined, -1))).toBe('loss_ratio');
  });
});

describe('steady state', () => {
  it('adds ambient, top-oil rise and hot-spot gradient', () => {
    const m = IEEE_ROWS.ONAN;
    const k = 1.2;
    expect(steadyHotSpot(m, k, 25)).toBeCloseTo(25 + 55 * ((k * k * 5 + 1) / 6) ** 0.8 + 25 * k ** 1.6, 12);
  });

  it('at no load keeps the oil rise of the no-load loss alone, and no gradient', () => {
    const m = IEC_POWER.OF;
    expect(ultimateTopOilRise(m, 0)).toBeCloseTo(56 / 7, 12);
    expect(ultimateHotSpotGradient(m, 0)).toBe(0);
  });

  it('refuses ambient outside -60 to 60 °C and loads out of range, by name', () => {
    expect(argumentOf(() => hotSpotSteady(1, 61, 'ONAN', undefined, undefined, undefined, 'IEEE'))).toBe('ambient_c');
    expect(argumentOf(() => hotSpotSteady(-0.1, 20, 'ONAN', undefined, undefined, undefined, 'IEEE'))).toBe('load');
    expect(argumentOf(() => hotSpotSteady(1000, 20, 'ONAN', undefined, undefined, undefined, 'IEEE'))).toBe('load');
  });
});

describe('largest steady load for a hot-spot limit', () => {
  it('is the load whose steady hot-spot equals the limit', () => {
    for (const row of THERMAL_ROWS) {
      for (const [ambient, limit] of [[0, 98], [20, 110], [40, 140]] as const) {
        const k = maxSteadyLoad(row, ambient, limit);
        expect(steadyHotSpot(row, k, ambient)).toBeCloseTo(limit, 9);
      }
    }
  });

  it('is exactly rated load at the rated point of each guide', () => {
    expect(maxLoadForHotSpot(30, 110, 'ONAN', undefined, undefined, undefined, 'IEEE')).toBeCloseTo(1, 12);
    expect(maxLoadForHotSpot(20, 98, 'ONAN', undefined, undefined, undefined, 'IEC')).toBeCloseTo(1, 12);
  });

  it('falls as the ambient rises', () => {
    const m = IEEE_ROWS.ONAF;
    expect(maxSteadyLoad(m, 40, 110)).toBeLessThan(maxSteadyLoad(m, 20, 110));
  });

  it('has no answer when even no load reaches the limit', () => {
    expect(() => maxSteadyLoad(IEEE_ROWS.ONAN, 55, 60)).toThrow(NoAnswerError);
  });

  it('refuses an implausible limit by name', () => {
    expect(argumentOf(() => maxSteadyLoad(IEEE_ROWS.ONAN, 20, 500))).toBe('limit_c');
  });
});

describe('transient kernel', () => {
  it('settles on a constant profile at the ultimate-rise formulas, every row', () => {
    for (const row of THERMAL_ROWS) {
      for (const k of [0, 0.5, 1, 1.4]) {
        const out = hotSpotSeriesInto(row, filled(24, k), one(30), 1, new Float64Array(24));
        const steady = 30 + ultimateTopOilRise(row, k) + ultimateHotSpotGradient(row, k);
        for (const t of out) expect(t).toBeCloseTo(steady, 10);
      }
    }
  });

  it('reaches the new steady state a long time after a load step', () => {
    for (const row of THERMAL_ROWS) {
      const loads = filled(200, 1.3);
      loads[0] = 0.4;
      const out = hotSpotSeriesInto(row, loads, one(20), 1, new Float64Array(200));
      expect(out[199]).toBeCloseTo(steadyHotSpot(row, 1.3, 20), 6);
    }
  });

  it('gives the same end-of-hour values with quarter-hour steps: each step is solved exactly', () => {
    const hourly = Float64Array.from({ length: 24 }, (_, i) => 0.5 + (i % 7) / 6);
    const quarter = Float64Array.from({ length: 96 }, (_, j) => hourly[Math.floor(j / 4)]!);
    for (const row of THERMAL_ROWS) {
      const a = hotSpotSeriesInto(row, hourly, one(15), 1, new Float64Array(24));
      const b = hotSpotSeriesInto(row, quarter, one(15), 0.25, new Float64Array(96));
      for (let i = 0; i < 24; i++) expect(a[i]).toBeCloseTo(b[4 * i + 3]!, 9);
    }
  });

  it('IEEE moves the hot-spot with the ambient at once; IEC lets the oil lag', () => {
    const loads = filled(2, 1);
    const ambients = Float64Array.of(20, 30);
    const ieee = hotSpotSeriesInto(IEEE_ROWS.ONAN, loads, ambients, 1, new Float64Array(2));
    const iec = hotSpotSeriesInto(IEC_DISTRIBUTION_ONAN, loads, ambients, 1, new Float64Array(2));
    expect(ieee[1]! - ieee[0]!).toBeCloseTo(10, 10);
    // IEC: the top oil closes 1 − e^(−60/180) of the 10 K gap in the hour.
    expect(iec[1]! - iec[0]!).toBeCloseTo(10 * (1 - Math.exp(-60 / 180)), 10);
  });

  it('stays between the steady states of the lowest and highest load (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 2, noNaN: true }), { minLength: 1, maxLength: 60 }), fc.constantFrom(...THERMAL_ROWS), (ks, row) => {
        const loads = Float64Array.from(ks);
        const out = hotSpotSeriesInto(row, loads, one(25), 1, new Float64Array(loads.length));
        const low = steadyHotSpot(row, Math.min(...ks), 25);
        const high = steadyHotSpot(row, Math.max(...ks), 25);
        // IEC's k21 > 1 overshoots the gradient briefly after a rise: allow that margin above.
        const overshoot = (row.k21 - 1) * row.hotSpotGradient * Math.max(...ks) ** row.windingExponent;
        for (const t of out) {
          expect(t).toBeGreaterThanOrEqual(low - 1e-9 - overshoot);
          expect(t).toBeLessThanOrEqual(high + 1e-9 + overshoot);
        }
      }),
    );
  });
});

describe('profiles: checks, aging and life', () => {
  const none = [undefined, undefined, undefined] as const;

  it('names the step of a bad load and the length of a bad ambient range', () => {
    expect(argumentOf(() => hotSpotProfile(Float64Array.of(1, -1), one(20), 1, 'ONAN', ...none, 'IEEE'))).toBe('loads (step 2)');
    expect(argumentOf(() => hotSpotProfile(Float64Array.of(1, 1, 1), Float64Array.of(20, 21), 1, 'ONAN', ...none, 'IEEE'))).toBe('ambients');
    expect(argumentOf(() => hotSpotProfile(Float64Array.of(1), Float64Array.of(99), 1, 'ONAN', ...none, 'IEEE'))).toBe('ambients (step 1)');
    expect(argumentOf(() => hotSpotProfile(Float64Array.of(1), one(20), 0, 'ONAN', ...none, 'IEEE'))).toBe('hours');
    expect(argumentOf(() => hotSpotProfile(new Float64Array(0), one(20), 1, 'ONAN', ...none, 'IEEE'))).toBe('loads');
  });

  it('ages at the normal rate at the rated point: F_EQA 1, one hour of life per hour', () => {
    const year = filled(8760, 1);
    expect(equivalentAging(year, one(30), 1, 'ONAN', ...none, 'IEEE', 'upgraded')).toBeCloseTo(1, 10);
    expect(lifeUsedHours(year, one(30), 1, 'ONAN', ...none, 'IEEE', 'upgraded')).toBeCloseTo(8760, 6);
    expect(equivalentAging(year, one(20), 1, 'ONAN', ...none, 'IEC', 'normal')).toBeCloseTo(1, 10);
  });

  it('F_EQA is the time-weighted mean of the step aging rates', () => {
    const loads = Float64Array.of(0.5, 1.1, 1.3, 0.9);
    const hs = hotSpotProfile(loads, one(25), 2, 'ONAF', ...none, 'IEEE');
    const mean = Array.from(hs, (t) => agingAccelerationFactor(t)).reduce((s, v) => s + v) / 4;
    expect(equivalentAging(loads, one(25), 2, 'ONAF', ...none, 'IEEE', 'upgraded')).toBeCloseTo(mean, 12);
    expect(lifeUsedHours(loads, one(25), 2, 'ONAF', ...none, 'IEEE', 'upgraded')).toBeCloseTo(mean * 8, 12);
  });

  it('refuses a hot-spot outside the aging laws, by name', () => {
    expect(relativeAgingRate(110, 'upgraded')).toBe(1);
    expect(argumentOf(() => agingAccelerationFactor(400))).toBe('hotspot_c');
  });

  it('gives life as a fraction of the 180,000 h normal life', () => {
    expect(lifeFraction(8760)).toBeCloseTo(8760 / 180_000, 15);
    expect(lifeFraction(9000, 150_000)).toBeCloseTo(0.06, 15);
  });
});
