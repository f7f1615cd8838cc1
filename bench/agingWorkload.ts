/**
 * The workload both aging benchmarks measure (npm run bench's aging rows and bench:thermal): one
 * unit-year of 8,760 hourly loads and ambients, a fleet of 1,000 units with their own rated rises,
 * and the bare loop of the transcendental calls a step makes (two logs and three exps for IEEE
 * ONAN), the floor any implementation of these formulas pays.
 */
import { agingRateSum, hotSpotSeriesInto, IEEE_ROWS, type ThermalCharacteristics } from '../src/core/thermal';

export const STEPS = 8760;
export const UNITS = 1000;

export const loads = Float64Array.from({ length: STEPS }, (_, i) => 0.55 + 0.35 * Math.sin((2 * Math.PI * (i - 8)) / 24) + 0.1 * Math.sin(i / 37));
export const ambients = Float64Array.from({ length: STEPS }, (_, i) => 12 + 10 * Math.sin((2 * Math.PI * (i - 2900)) / STEPS) + 4 * Math.sin((2 * Math.PI * i) / 24));
const out = new Float64Array(STEPS);

/** 1,000 units of the fleet: the same profile, each unit with its own rated rises. */
export const fleet: readonly ThermalCharacteristics[] = Array.from({ length: UNITS }, (_, u) => ({
  ...IEEE_ROWS.ONAN,
  topOilRise: 50 + (u % 10),
  hotSpotGradient: 20 + (u % 7),
}));

/** Hot-spot series and aging sum of one unit-year. */
export function unitYear(m: ThermalCharacteristics): number {
  hotSpotSeriesInto(m, loads, ambients, 1, out);
  return agingRateSum(out, 'upgraded');
}

/** The hot-spot series alone, its last value. */
export function hotSpotYear(m: ThermalCharacteristics): number {
  return hotSpotSeriesInto(m, loads, ambients, 1, out)[STEPS - 1]!;
}

/** The calls the kernel and aging sum make per step, with nothing else: two Math.log, three Math.exp. */
export function bareLoop(): number {
  let s = 0;
  for (let i = 0; i < STEPS; i++) {
    const k2 = loads[i]! * loads[i]!;
    s += Math.exp(0.8 * Math.log((1 + 5 * k2) / 6)) + Math.exp(0.8 * Math.log(k2)) + Math.exp(39.16 - 15000 / (ambients[i]! + 353));
  }
  return s;
}
