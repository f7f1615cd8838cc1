/**
 * `npm run bench:rows`: the two ways of making spill rows (bench/floor.ts) timed each in a fresh
 * process of its own, three processes a way, with no other code run before them. It shows what
 * V8's decision to allocate a site's objects in the old generation does to each way, which a
 * shared process such as `npm run bench` may or may not show. Each process warms up with 30
 * calls, collects, then times 200 calls of EFF over 100,000 rows.
 */
import { spawnSync } from 'node:child_process';
import { floorLoop, literalRowsLoop, unitColumns } from './floor';

const WAYS = { filled: floorLoop, literal: literalRowsLoop } as const;
type Way = keyof typeof WAYS;

function timeOneProcess(way: Way): string {
  const { kvaCells, loadCells } = unitColumns(100_000);
  const loop = WAYS[way];
  let sink = 0;
  for (let k = 0; k < 30; k++) sink += loop(kvaCells, loadCells).length;
  (globalThis as { gc?: () => void }).gc?.();
  const times: number[] = [];
  const start = performance.now();
  for (let k = 0; k < 200; k++) {
    const t = performance.now();
    sink += loop(kvaCells, loadCells).length;
    times.push(performance.now() - t);
  }
  const mean = (performance.now() - start) / 200;
  times.sort((a, b) => a - b);
  return `${way.padEnd(8)} mean ${mean.toFixed(2)} ms, median ${times[100]!.toFixed(2)} ms, fastest ${times[0]!.toFixed(2)} ms${sink === 42 ? ' ' : ''}`;
}

const asked = process.argv[2] as Way | undefined;
if (asked !== undefined) {
  console.log(timeOneProcess(asked));
} else {
  console.log('EFF over 100,000 rows, each way in fresh processes (Node ' + process.version + ')');
  for (let round = 0; round < 3; round++) {
    for (const way of Object.keys(WAYS) as Way[]) {
      const r = spawnSync(process.execPath, ['--expose-gc', __filename, way], { encoding: 'utf8' });
      if (r.status !== 0) throw new Error(`${way}: ${r.stderr}`);
      process.stdout.write(r.stdout);
    }
  }
}
