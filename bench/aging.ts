/**
 * A year of aging: the transient thermal model with the aging integrated within each step for one
 * unit-year (8,760 hourly steps) and for 1,000 unit-years, against the bare loop of agingWorkload.ts.
 */
import { IEEE_ROWS } from '../src/core/thermal';
import { bareLoop, fleet, unitYear } from './agingWorkload';
import { type BenchRow, meanMs, ms } from './harness';

export async function agingBenchmark(): Promise<BenchRow[]> {
  let sink = 0;
  const one = await meanMs({ model: () => void (sink += unitYear(IEEE_ROWS.ONAN)), bare: () => void (sink += bareLoop()) });
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
