/**
 * `npm run bench`: one table of measures taken in the same run. This file is bundled with
 * esbuild before it runs, so our modules are joined into one scope as in the add-in bundle and
 * calls between them cost what they cost in Excel (a module loader's export getters would not).
 * Absolute times vary between machines; the ratios are what to compare.
 */
import { cpus } from 'node:os';
import { adapterOverhead } from './adapter';
import { agingBenchmark } from './aging';
import { bundleSize } from './bundle';
import { calcBenchmark } from './calc';
import { cyclicBenchmark } from './cyclic';
import { fleetBenchmark } from './fleet';
import { printTable } from './harness';

async function main(): Promise<void> {
  const cores = cpus();
  console.log(`Fluxbook benchmark — Node ${process.version}, ${cores.length} cores (${cores[0]?.model.trim() ?? 'unknown CPU'})`);
  if (!(globalThis as { gc?: unknown }).gc) console.log('(run with --expose-gc for steadier memory figures)');
  const fleet = fleetBenchmark();
  const adapter = await adapterOverhead();
  const aging = await agingBenchmark();
  const cyclic = await cyclicBenchmark();
  const calc = await calcBenchmark();
  const rows = [...calc, ...fleet.rows, ...adapter, ...aging, ...cyclic, bundleSize()];
  console.log('');
  printTable(rows);
  const missed = rows.filter((r) => !r.met);
  console.log('');
  console.log(missed.length === 0 ? 'Every goal met.' : `Goals not met: ${missed.map((r) => r.measure.split(':')[0]).join(', ')}.`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
