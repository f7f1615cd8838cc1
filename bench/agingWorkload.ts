/**
 * The workload both aging benchmarks measure (npm run bench's aging rows and bench:thermal): one
 * unit-year of 8,760 hourly loads and ambients, a fleet of 1,000 units with their own rated rises,
 * and the bare loop of the transcendental calls a step makes — for IEEE ONAN two logs and four
 * exps for the temperatures (the step's top-oil time constant included) and one exp at each node
 * of the aging quadrature (15 for an hourly step) — the floor any implementation of this
 * integration pays.
 */
import { agingNodes, hotSpotSeriesInto, IEEE_ROWS, runProfile, type ThermalCharacteristics } from '../src/core/thermal';

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

/** Hot-spot and aging of one unit-year, the aging integrated along each step (F_EQA's path). */
export function unitYear(m: ThermalCharacteristics): number {
  return runProfile(m, loads, ambients, 1, { paper: 'upgraded' }).agingHours;
}

/** The hot-spot series alone, its last value. */
export function hotSpotYear(m: ThermalCharacteristics): number {
  return hotSpotSeriesInto(m, loads, ambients, 1, out)[STEPS - 1]!;
}

const NODES = agingNodes(60, 4).t.length;

/** The calls the kernel and the aging quadrature make per step, with nothing else. */
export function bareLoop(): number {
  let s = 0;
  for (let i = 0; i < STEPS; i++) {
    const k2 = loads[i]! * loads[i]!;
    const a = ambients[i]!;
    s += Math.exp(0.8 * Math.log((1 + 5 * k2) / 6)) + Math.exp(0.8 * Math.log(k2)) + Math.exp(-60 / (150 + a)) + Math.exp(-a / 100);
    for (let j = 0; j < NODES; j++) s += Math.exp(39.16 - 15000 / (a + 353 + j));
  }
  return s;
}
