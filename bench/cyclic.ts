/**
 * CYCLICMAX over a year: the whole root search (how much more load an 8,760-hour profile can take
 * under IEEE normal life expectancy loading) against one run of the same checked profile with
 * its aging (what one LOADOK costs). The ratio is the search's cost in profile runs; the goal is
 * the 40 runs the search is bounded by. The runs without the aging quadrature cost about a fifth
 * of one with it, so the ratio is lower than the count of runs.
 */
import { cyclicMax, IEEE_ROWS, profileCheck } from '../src/core/thermal';
import { type BenchRow, meanMs, ms } from './harness';

const STEPS = 8760;

export async function cyclicBenchmark(): Promise<BenchRow[]> {
  const loads = Float64Array.from({ length: STEPS }, (_, i) => 0.55 + 0.35 * Math.sin((2 * Math.PI * (i - 8)) / 24) + 0.1 * Math.sin(i / 37));
  const ambients = Float64Array.from({ length: STEPS }, (_, i) => 12 + 10 * Math.sin((2 * Math.PI * (i - 2900)) / STEPS) + 4 * Math.sin((2 * Math.PI * i) / 24));
  const m = IEEE_ROWS.ONAN;
  let sink = 0;
  let runs = 0;
  const t = await meanMs({
    search: () => {
      const r = cyclicMax(m, loads, ambients, 1, 'normal', 'distribution');
      runs = r.evaluations;
      sink += r.factor;
    },
    one: () => {
      sink += profileCheck(m, loads, ambients, 1, 'normal', 'distribution').equivalentAging;
    },
  });
  if (!Number.isFinite(sink)) throw new Error('CYCLICMAX benchmark result is not finite');
  const ratio = t.search! / t.one!;
  return [
    {
      measure: `CYCLICMAX: 8,760-hour year, IEEE normal loading (${runs} profile runs), vs one LOADOK run`,
      ours: ms(t.search!),
      reference: ms(t.one!),
      ratio: `${ratio.toFixed(1)}×`,
      goal: '≤ 40 runs, ≤ 40×',
      met: runs <= 40 && ratio <= 40,
    },
  ];
}
