/**
 * Physical invariants as properties over generated units and loads (fast-check). Each is a fact of
 * the trade that must hold whatever the numbers: energy balance, reversibility of the ideal
 * transformer, where efficiency peaks, and monotone energy loss.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { allDayEfficiency, energyLost } from '../../src/core/energy';
import { efficiencyAt, maxEfficiency, maxEfficiencyLoad } from '../../src/core/efficiency';
import { totalLossesAt } from '../../src/core/losses';
import { agingRateSum, IEEE_ROWS, lifeUsedHours } from '../../src/core/thermal';
import { idealOutputCurrent, idealOutputVoltage } from '../../src/core/ratio';

const kva = fc.double({ min: 5, max: 100_000, noNaN: true });
const p0 = fc.double({ min: 1, max: 100_000, noNaN: true });
const pk = fc.double({ min: 1, max: 500_000, noNaN: true });
const load = fc.double({ min: 0.01, max: 2, noNaN: true });
const pf = fc.double({ min: 0.05, max: 1, noNaN: true });
const turns = fc.integer({ min: 1, max: 100_000 });

describe('invariants', () => {
  it('power in = power out + losses (relative 1e-9) — conservation of energy', () => {
    fc.assert(
      fc.property(kva, p0, pk, load, pf, (s, a, b, x, cos) => {
        const out = x * s * 1000 * cos;
        const input = out / efficiencyAt(s, a, b, x, cos);
        const losses = totalLossesAt(a, b, x);
        expect(Math.abs(input - (out + losses)) / input).toBeLessThan(1e-9);
      }),
    );
  });

  it('ratio then inverse ratio returns the input — ideal transformer', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), turns, turns, (v, n1, n2) => {
        const back = idealOutputVoltage(idealOutputVoltage(v, n1, n2), n2, n1);
        expect(back).toBeCloseTo(v, Math.abs(v) > 1 ? 6 : 9);
        const iBack = idealOutputCurrent(idealOutputCurrent(v, n1, n2), n2, n1);
        expect(iBack).toBeCloseTo(v, Math.abs(v) > 1 ? 6 : 9);
      }),
    );
  });

  it('efficiency peaks at √(P0/Pk) and stays below 1', () => {
    fc.assert(
      fc.property(kva, p0, pk, pf, fc.double({ min: 0.05, max: 20, noNaN: true }), (s, a, b, cos, k) => {
        const x = maxEfficiencyLoad(a, b);
        const peak = maxEfficiency(s, a, b, cos);
        expect(peak).toBeLessThan(1);
        // Any other load does no better (a hair of rounding allowed).
        expect(efficiencyAt(s, a, b, x * k, cos)).toBeLessThanOrEqual(peak + 1e-12);
      }),
    );
  });

  it('all-day efficiency of a flat profile equals EFF at that load', () => {
    fc.assert(
      fc.property(kva, p0, pk, load, pf, fc.integer({ min: 1, max: 200 }), (s, a, b, x, cos, n) => {
        const flat = new Float64Array(n).fill(x);
        expect(allDayEfficiency(s, a, b, flat, Float64Array.of(cos), Float64Array.of(1))).toBeCloseTo(efficiencyAt(s, a, b, x, cos), 12);
      }),
    );
  });

  it('energy lost is monotone in each load', () => {
    fc.assert(
      fc.property(
        p0,
        pk,
        fc.array(fc.double({ min: 0, max: 2, noNaN: true }), { minLength: 1, maxLength: 48 }),
        fc.nat(),
        fc.double({ min: 1e-6, max: 1, noNaN: true }),
        (a, b, loads, at, bump) => {
          const before = Float64Array.from(loads);
          const after = Float64Array.from(loads);
          after[at % loads.length]! += bump;
          expect(energyLost(a, b, after, Float64Array.of(1))).toBeGreaterThanOrEqual(energyLost(a, b, before, Float64Array.of(1)));
        },
      ),
    );
  });

  it('aging of a constant 110 °C hot-spot over T hours is T hours — IEEE C57.91 clause 5 (F_AA = 1 at 110 °C)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2000 }), fc.double({ min: 0.01, max: 24, noNaN: true }), (steps, hours) => {
        const hotSpots = new Float64Array(steps).fill(110);
        expect(agingRateSum(hotSpots, 'upgraded') * hours).toBeCloseTo(steps * hours, 9);
        // Through the whole model: rated load at 30 °C ambient holds the IEEE default unit at
        // 30 + 55 + 25 = 110 °C (65 °C-rise design, common practice).
        const loads = new Float64Array(steps).fill(1);
        const ambients = Float64Array.of(30);
        const used = lifeUsedHours(IEEE_ROWS.ONAN, loads, ambients, hours, 'upgraded');
        expect(Math.abs(used - steps * hours) / (steps * hours)).toBeLessThan(1e-9);
      }),
      { numRuns: 200 },
    );
  });
});
