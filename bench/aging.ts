/**
 * A year of aging: the transient thermal model with the aging integrated along each step for one
 * unit-year (8,760 hourly steps) and for 1,000 unit-years, against a bare loop of the
 * transcendental calls a step makes (for IEEE ONAN two logs and four exps for the temperatures,
 * the step's top-oil time constant included, and one exp at each of the 15 quadrature nodes),
 * which any implementation of this integration pays.
 */
import { agingNodes, IEEE_ROWS, runProfile, type ThermalCharacteristics } from '../src/core/thermal';
import { type BenchRow, meanMs, ms } from './harness';

const STEPS = 8760;

export async function agingBenchmark(): Promise<BenchRow[]> {
  const loads = Float64Array.from({ length: STEPS }, (_, i) => 0.55 + 0.35 * Math.sin((2 * Math.PI * (i - 8)) / 24) + 0.1 * Math.sin(i / 37));
  const ambients = Float64Array.from({ length: STEPS }, (_, i) => 12 + 10 * Math.sin((2 * Math.PI * (i - 2900)) / STEPS) + 4 * Math.sin((2 * Math.PI * i) / 24));
  const fleet: ThermalCharacteristics[] = Array.from({ length: 1000 }, (_, u) => ({ ...IEEE_ROWS.ONAN, topOilRise: 50 + (u % 10), hotSpotGradient: 20 + (u % 7) }));
  let sink = 0;
  const unitYear = (m: ThermalCharacteristics): number => runProfile(m, loads, ambients, 1, { paper: 'upgraded' }).agingHours;
  const nodes = agingNodes(60, 4).t.length;
  const bare = (): number => {
    let s = 0;
    for (let i = 0; i < STEPS; i++) {
      const k2 = loads[i]! * loads[i]!;
      const a = ambients[i]!;
      s += Math.exp(0.8 * Math.log((1 + 5 * k2) / 6)) + Math.exp(0.8 * Math.log(k2)) + Math.exp(-60 / (150 + a)) + Math.exp(-a / 100);
      for (let j = 0; j < nodes; j++) s += Math.exp(39.16 - 15000 / (a + 353 + j));
    }
    return s;
  };
  const one = await meanMs({ model: () => void (sink += unitYear(IEEE_ROWS.ONAN)), bare: () => void (sink += bare()) });
  const many = await meanMs({ model: () => { for (const m of fleet) sink += unitYear(m); } }, { time: 4000, warmupTime: 500 });
  if (!Number.isFinite(sink)) throw new Error('aging benchmark result is not finite');
  const ratio = one.model! / one.bare!;
  return [
    {
      measure: 'aging: one unit-year, hot-spot + F_EQA integrated within each step (IEEE ONAN), vs bare loop of its exp/log calls',
      ours: ms(one.model!),
      reference: ms(one.bare!),
      ratio: `${ratio.toFixed(2)}×`,
      goal: '≤ 5 ms and ≤ 2×',
      met: one.model! <= 5 && ratio <= 2,
    },
    {
      measure: 'aging: 1,000 unit-years',
      ours: ms(many.model!),
      reference: ms(one.bare! * 1000),
      ratio: `${(many.model! / (one.bare! * 1000)).toFixed(2)}×`,
      goal: '≤ 5 s',
      met: many.model! <= 5000,
    },
  ];
}
