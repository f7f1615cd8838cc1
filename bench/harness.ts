/**
 * Shared pieces of `npm run bench`: a tinybench run of two tasks measured in the same process,
 * and one row of the results table (ours against a reference, the ratio, the goal).
 */
import { Bench } from 'tinybench';

export interface BenchRow {
  readonly measure: string;
  readonly ours: string;
  readonly reference: string;
  readonly ratio: string;
  readonly goal: string;
  readonly met: boolean;
}

const collectGarbage = (globalThis as { gc?: () => void }).gc;

/**
 * Mean milliseconds per run of each task, measured side by side. Each task's warm-up and run
 * start from a collected heap (with --expose-gc), so no task pays for the garbage of the one
 * measured before it.
 */
export async function meanMs(tasks: Record<string, () => unknown>, options: { time?: number; warmupTime?: number } = {}): Promise<Record<string, number>> {
  const bench = new Bench({ time: options.time ?? 1500, warmupTime: options.warmupTime ?? 300 });
  for (const [name, fn] of Object.entries(tasks)) bench.add(name, fn, { beforeAll: () => collectGarbage?.() });
  await bench.run();
  const out: Record<string, number> = {};
  for (const task of bench.tasks) {
    const result = task.result as { latency?: { mean: number }; error?: unknown };
    if (!result.latency) throw new Error(`benchmark task ${task.name} failed: ${String(result.error)}`);
    out[task.name] = result.latency.mean;
  }
  return out;
}

export const ms = (v: number): string => (v >= 100 ? `${v.toFixed(0)} ms` : v >= 1 ? `${v.toFixed(2)} ms` : `${(v * 1000).toFixed(0)} µs`);

export function printTable(rows: readonly BenchRow[]): void {
  const head: BenchRow = { measure: 'measure', ours: 'Fluxbook', reference: 'reference', ratio: 'ratio', goal: 'goal', met: true };
  const all = [head, ...rows];
  const keys = ['measure', 'ours', 'reference', 'ratio', 'goal'] as const;
  const width = keys.map((k) => Math.max(...all.map((r) => r[k].length)));
  const line = (r: BenchRow, mark: string) => `| ${keys.map((k, i) => r[k].padEnd(width[i]!)).join(' | ')} | ${mark} |`;
  console.log(line(head, 'met'));
  console.log(`|${width.map((w) => '-'.repeat(w + 2)).join('|')}|-----|`);
  for (const r of rows) console.log(line(r, r.met ? 'yes' : 'NO'));
}
