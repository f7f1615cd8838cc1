/**
 * Adapter overhead: XFMR.EFF through the cell adapter over 100,000-element ranges (cells in, a
 * spilled column out, as Excel passes them). The goal is against the floor any spreadsheet-facing
 * code pays — the same core loop reading the cells Excel passes and building the one-cell rows of
 * Excel's spill format; the raw core loop over Float64Array is reported beside it to show what
 * the cells themselves cost.
 */
import { adapt, plainErrors } from '../src/cells/adapter';
import { findFunction } from '../src/cells/catalog';
import { efficiencyAt } from '../src/core/efficiency';
import { type BenchRow, meanMs, ms } from './harness';

export async function adapterOverhead(n = 100_000): Promise<BenchRow[]> {
  const kva = new Float64Array(n);
  const load = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    kva[i] = 500 + (i % 20) * 100;
    load[i] = 0.2 + (i % 50) / 50;
  }
  const kvaCells = Array.from(kva, (v) => [v]);
  const loadCells = Array.from(load, (v) => [v]);
  const EFF = adapt(findFunction('EFF')!, plainErrors);
  let sink = 0;
  const t = await meanMs({
    adapter: () => {
      const out = EFF(kvaCells, 1400, 10500, loadCells, null);
      sink += out.length;
    },
    raw: () => {
      const out = new Float64Array(n);
      for (let i = 0; i < n; i++) out[i] = efficiencyAt(kva[i]!, 1400, 10500, load[i]!, 1);
      sink += out[n - 1]!;
    },
    // The least any spreadsheet-facing code pays: the same loop reading the cells Excel passes and
    // returning the one-cell rows Excel's spill format needs.
    rawWithCells: () => {
      const out = new Array<number[]>(n);
      for (let i = 0; i < n; i++) out[i] = [efficiencyAt(kvaCells[i]![0]!, 1400, 10500, loadCells[i]![0]!, 1)];
      sink += out.length;
    },
  });
  if (sink === 42) console.log(''); // keep the results alive
  const ratio = t.adapter! / t.raw!;
  const floorRatio = t.adapter! / t.rawWithCells!;
  return [{
    measure: `adapter: EFF over ${n.toLocaleString('en')} cells vs raw core loop over Float64Array (no cells in or out)`,
    ours: ms(t.adapter!),
    reference: ms(t.raw!),
    ratio: `${ratio.toFixed(2)}×`,
    goal: 'report',
    met: true,
  }, {
    measure: `adapter: the same, vs raw loop reading cells and returning Excel's spill rows`,
    ours: ms(t.adapter!),
    reference: ms(t.rawWithCells!),
    ratio: `${floorRatio.toFixed(2)}×`,
    goal: '≤ 1.5×',
    met: floorRatio <= 1.5,
  }];
}
