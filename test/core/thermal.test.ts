import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, NoAnswerError } from '../../src/core/errors';
import {
  agingAccelerationFactor,
  equivalentAging,
  hotSpotProfile,
  hotSpotSeriesInto,
  IEC_DISTRIBUTION_ONAN,
  IEC_POWER,
  IEEE_ROWS,
  lifeFraction,
  lifeUsedHours,
  loadingYear,
  maxSteadyLoad,
  relativeAgingRate,
  steadyHotSpot,
  THERMAL_ROWS,
  thermalModel,
  ultimateHotSpotGradient,
  topOilProfile,
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
    expect(thermalModel('IEC', 'ONAN')).toBe(IEC_DISTRIBUTION_ONAN);
    expect(thermalModel('IEC-POWER', 'ONAN')).toBe(IEC_POWER.ONAN);
    expect(thermalModel('IEC', 'ONAF')).toBe(IEC_POWER.ONAF);
    expect(thermalModel('IEEE', 'OD')).toBe(IEEE_ROWS.OD);
    expect(thermalModel('IEEE', 'ONAN', { topOilRise: undefined })).toBe(IEEE_ROWS.ONAN);
  });

  it("replaces the rated values with the unit's own and checks them by name", () => {
    const m = thermalModel('IEEE', 'ONAN', { topOilRise: 50, hotSpotGradient: 20, lossRatio: 4 });
    expect([m.topOilRise, m.hotSpotGradient, m.lossRatio, m.oilExponent]).toEqual([50, 20, 4, 0.8]);
    expect(argumentOf(() => thermalModel('IEEE', 'ONAN', { topOilRise: 0 }))).toBe('top_oil_rise');
    expect(argumentOf(() => thermalModel('IEEE', 'ONAN', { hotSpotGradient: 150 }))).toBe('hs_gradient');
    expect(argumentOf(() => thermalModel('IEEE', 'ONAN', { lossRatio: -1 }))).toBe('loss_ratio');
  });

  it('takes every other thermal parameter from the unit too, each checked by its argument name', () => {
    const m = thermalModel('IEC', 'ONAF', {
      oilTimeConstant: 120, windingTimeConstant: 6, oilExponent: 0.9, windingExponentM: 0.7, k11: 0.6, k21: 1.8, k22: 1.5, paper: 'upgraded', normalLifeHours: 150_000,
    });
    expect([m.oilTimeConstant, m.windingTimeConstant, m.oilExponent, m.windingExponent, m.k11, m.k21, m.k22, m.paper, m.normalLifeHours])
      .toEqual([120, 6, 0.9, 1.4, 0.6, 1.8, 1.5, 'upgraded', 150_000]);
    expect(argumentOf(() => thermalModel('IEEE', 'ONAN', { oilTimeConstant: -1 }))).toBe('tau_oil_min');
    expect(argumentOf(() => thermalModel('IEEE', 'ONAN', { windingTimeConstant: 0 }))).toBe('tau_winding_min');
    expect(argumentOf(() => thermalModel('IEEE', 'ONAN', { oilExponent: 3 }))).toBe('n');
    expect(argumentOf(() => thermalModel('IEEE', 'ONAN', { windingExponentM: 0.1 }))).toBe('m');
    expect(argumentOf(() => thermalModel('IEC', 'ONAN', { k21: 0.5 }))).toBe('k21');
    expect(argumentOf(() => thermalModel('IEC', 'ONAN', { normalLifeHours: 5 }))).toBe('normal_life_h');
  });

  it('reads an IEC heat-run report as H · gr when the hot-spot factor is given', () => {
    expect(thermalModel('IEC', 'ONAN', { hotSpotGradient: 20, hotSpotFactor: 1.2 }).hotSpotGradient).toBeCloseTo(24, 12);
    expect(argumentOf(() => thermalModel('IEC', 'ONAN', { hotSpotFactor: 1.2 }))).toBe('hs_factor');
  });

  it('ages IEEE rows on upgraded paper and the IEC rows, rated at 98 °C, on kraft paper', () => {
    for (const row of THERMAL_ROWS) expect(row.paper).toBe(row.method === 'IEEE' ? 'upgraded' : 'normal');
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
    expect(argumentOf(() => steadyHotSpot(IEEE_ROWS.ONAN, 1, 61))).toBe('ambient_c');
    expect(argumentOf(() => steadyHotSpot(IEEE_ROWS.ONAN, -0.1, 20))).toBe('load');
    expect(argumentOf(() => steadyHotSpot(IEEE_ROWS.ONAN, 1000, 20))).toBe('load');
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
    expect(maxSteadyLoad(IEEE_ROWS.ONAN, 30, 110)).toBeCloseTo(1, 12);
    expect(maxSteadyLoad(IEC_DISTRIBUTION_ONAN, 20, 98)).toBeCloseTo(1, 12);
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
    expect(argumentOf(() => maxSteadyLoad(IEEE_ROWS.ONAN, 60, 60))).toBe('limit_c');
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

  it('gives the same end-of-hour values with quarter-hour steps where the time constants are fixed: each step is solved exactly', () => {
    const hourly = Float64Array.from({ length: 24 }, (_, i) => 0.5 + (i % 7) / 6);
    const quarter = Float64Array.from({ length: 96 }, (_, j) => hourly[Math.floor(j / 4)]!);
    for (const row of THERMAL_ROWS.filter((r) => r.method === 'IEC' || r.oilExponent === 1)) {
      const a = hotSpotSeriesInto(row, hourly, one(15), 1, new Float64Array(24));
      const b = hotSpotSeriesInto(row, quarter, one(15), 0.25, new Float64Array(96));
      for (let i = 0; i < 24; i++) expect(a[i]).toBeCloseTo(b[4 * i + 3]!, 9);
    }
  });

  it("IEEE's step-dependent top-oil time constant (n ≠ 1) moves the end-of-hour values by well under a kelvin between hourly and quarter-hour steps", () => {
    const hourly = Float64Array.from({ length: 24 }, (_, i) => 0.5 + (i % 7) / 6);
    const quarter = Float64Array.from({ length: 96 }, (_, j) => hourly[Math.floor(j / 4)]!);
    for (const row of THERMAL_ROWS.filter((r) => r.method === 'IEEE' && r.oilExponent !== 1)) {
      const a = hotSpotSeriesInto(row, hourly, one(15), 1, new Float64Array(24));
      const b = hotSpotSeriesInto(row, quarter, one(15), 0.25, new Float64Array(96));
      for (let i = 0; i < 24; i++) expect(Math.abs(a[i]! - b[4 * i + 3]!)).toBeLessThan(0.5);
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
  it('names the step of a bad load and the length of a bad ambient range', () => {
    expect(argumentOf(() => hotSpotProfile(IEEE_ROWS.ONAN, Float64Array.of(1, -1), one(20), 1))).toBe('loads (step 2)');
    expect(argumentOf(() => hotSpotProfile(IEEE_ROWS.ONAN, Float64Array.of(1, 1, 1), Float64Array.of(20, 21), 1))).toBe('ambients');
    expect(argumentOf(() => hotSpotProfile(IEEE_ROWS.ONAN, Float64Array.of(1), Float64Array.of(99), 1))).toBe('ambients (step 1)');
    expect(argumentOf(() => hotSpotProfile(IEEE_ROWS.ONAN, Float64Array.of(1), one(20), 0))).toBe('hours');
    expect(argumentOf(() => hotSpotProfile(IEEE_ROWS.ONAN, new Float64Array(0), one(20), 1))).toBe('loads');
  });

  it('ages at the normal rate at the rated point: F_EQA 1, one hour of life per hour', () => {
    const year = filled(8760, 1);
    expect(equivalentAging(IEEE_ROWS.ONAN, year, one(30), 1)).toBeCloseTo(1, 10);
    expect(lifeUsedHours(IEEE_ROWS.ONAN, year, one(30), 1)).toBeCloseTo(8760, 6);
    // IEC's default paper is kraft, rated at 98 °C: its rated point ages at the normal rate.
    expect(equivalentAging(IEC_DISTRIBUTION_ONAN, year, one(20), 1)).toBeCloseTo(1, 10);
    expect(equivalentAging(IEC_DISTRIBUTION_ONAN, year, one(20), 1, 'upgraded')).toBeCloseTo(relativeAgingRate(98, 'upgraded'), 10);
  });

  it('F_EQA is the time-weighted mean of the aging rate when each step holds its hot-spot', () => {
    // Steps long enough to settle (1,000 h against τo = 150 min): the end-of-step hot-spot is the
    // step's but for the first hours after each change.
    const loads = Float64Array.of(0.5, 1.1, 1.3, 0.9);
    const hs = hotSpotProfile(IEEE_ROWS.ONAF, loads, one(25), 1000);
    const mean = Array.from(hs, (t) => agingAccelerationFactor(t)).reduce((s, v) => s + v) / 4;
    const feqa = equivalentAging(IEEE_ROWS.ONAF, loads, one(25), 1000);
    expect(Math.abs(feqa / mean - 1)).toBeLessThan(0.01);
    expect(lifeUsedHours(IEEE_ROWS.ONAF, loads, one(25), 1000) / 4000).toBeCloseTo(feqa, 12);
  });

  it('refuses a hot-spot outside the aging laws, by name', () => {
    expect(relativeAgingRate(110, 'upgraded')).toBe(1);
    expect(argumentOf(() => agingAccelerationFactor(400))).toBe('hotspot_c');
  });

  it('gives life as a fraction of the 180,000 h normal life', () => {
    expect(lifeFraction(8760)).toBeCloseTo(8760 / 180_000, 15);
    expect(lifeFraction(9000, 150_000)).toBeCloseTo(0.06, 15);
  });

  it('loadingYear gives the demo everything at once', () => {
    const loads = Float64Array.from({ length: 8760 }, (_, i) => 0.6 + 0.4 * Math.sin((2 * Math.PI * i) / 24));
    const ambients = Float64Array.from({ length: 8760 }, (_, i) => 10 + 12 * Math.sin((2 * Math.PI * (i - 2000)) / 8760));
    const y = loadingYear(loads, ambients);
    expect(y.hotSpots).toHaveLength(8760);
    expect(y.peakHotSpot).toBe(Math.max(...y.hotSpots));
    expect(y.lifeUsedHours).toBeCloseTo(y.equivalentAging * 8760, 6);
    expect(y.lifeFraction).toBeCloseTo(y.lifeUsedHours / 180_000, 12);
    expect([y.paper, y.referenceHotSpot, y.model]).toEqual(['upgraded', 110, IEEE_ROWS.ONAN]);
    expect(y.lifeUsedHours).toBeCloseTo(lifeUsedHours(IEEE_ROWS.ONAN, loads, ambients, 1), 9);
    expect(y.topOils).toEqual(topOilProfile(IEEE_ROWS.ONAN, loads, ambients, 1));
    const kraft = loadingYear(loads, ambients, { method: 'IEC' });
    expect([kraft.paper, kraft.referenceHotSpot]).toEqual(['normal', 98]);
    expect(loadingYear(loads, ambients, { data: { lossRatio: 7.8 } }).model.lossRatio).toBe(7.8);
  });
});
