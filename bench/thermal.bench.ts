/**
 * Speed of the loading-and-aging kernel: one unit-year of 8,760 hourly steps with its aging
 * integrated within each step (target ≤ 5 ms), a fleet of 1,000 unit-years (target ≤ 5 s), beside
 * a bare loop of the transcendental calls the kernel and the aging quadrature make (agingWorkload.ts),
 * which is the floor any implementation of this integration pays, and a loop of Math.pow for the
 * reason the kernel takes powers as exp(p·ln b).
 * Run: npx tsx bench/thermal.bench.ts
 */
import { Bench } from 'tinybench';
import { adapt, plainErrors } from '../src/cells/adapter';
import { FEQA } from '../src/cells/functions/thermal';
import { IEC_DISTRIBUTION_ONAN, IEEE_ROWS } from '../src/core/thermal';
import { ambients, bareLoop, fleet, hotSpotYear, loads, STEPS, unitYear } from './agingWorkload';

let sink = 0;

/** The two powers a step written with Math.pow instead. */
function powLoop(): number {
  let s = 0;
  for (let i = 0; i < STEPS; i++) {
    const k2 = loads[i]! * loads[i]!;
    s += Math.pow((1 + 5 * k2) / 6, 0.8) + Math.pow(k2, 0.8);
  }
  return s;
}

const feqaCell = adapt(FEQA, plainErrors);
const loadColumn = Array.from(loads, (v) => [v]);
const ambientColumn = Array.from(ambients, (v) => [v]);

const bench = new Bench({ time: 1500, warmupTime: 300 });
bench
  .add('bare loop: 8,760 × (2 log + 4 exp + 15 quadrature exp)', () => {
    sink += bareLoop();
  })
  .add('bare loop: 8,760 × 2 Math.pow', () => {
    sink += powLoop();
  })
  .add('kernel: hot-spot series, IEEE ONAN, 1 unit-year', () => {
    sink += hotSpotYear(IEEE_ROWS.ONAN);
  })
  .add('kernel + aging (F_EQA), IEEE ONAN, 1 unit-year', () => {
    sink += unitYear(IEEE_ROWS.ONAN);
  })
  .add('kernel + aging (F_EQA), IEC distribution ONAN, 1 unit-year', () => {
    sink += unitYear(IEC_DISTRIBUTION_ONAN);
  })
  .add('kernel + aging, 1,000 unit-years', () => {
    for (const m of fleet) sink += unitYear(m);
  })
  .add('cell XFMR.FEQA (coerce 8,760-row columns + checks + kernel)', () => {
    sink += feqaCell(loadColumn, ambientColumn)[0]![0] as number;
  });

bench.runSync();

console.log(`Node ${process.version}; times per run of each task, ms (median is the robust figure on a shared machine).`);
console.table(
  bench.tasks.map((t) => {
    const r = t.result as { latency?: { min: number; p50: number; mean: number; p99: number; samplesCount: number } };
    const l = r.latency!;
    const ms = (v: number) => Number(v.toFixed(4));
    return { task: t.name, 'min': ms(l.min), 'median': ms(l.p50), 'mean': ms(l.mean), 'p99': ms(l.p99), runs: l.samplesCount };
  }),
);
console.log('Targets: one unit-year ≤ 0.5 ms on the core kernel; 1,000 unit-years ≤ 1,000 ms.');
if (!Number.isFinite(sink)) throw new Error('benchmark result is not finite');
