/**
 * Adapter overhead: XFMR.EFF through the cell adapter over 100,000-element ranges (cells in, a
 * spilled column out, as Excel passes them). The goal is against the floor any spreadsheet-facing
 * code pays — the same core loop reading the cells Excel passes and building the one-cell rows of
 * Excel's spill format; the raw core loop over Float64Array is reported beside it to show what
 * the cells themselves cost.
 *
 * Measured as a workbook that uses many of our functions leaves the adapter: every function of
 * the catalog is first called over a column of its sample values. The engine's adapter (each
 * function with its own column loop) and the add-in's (one shared loop, as its bundle builds no
 * code at run time) are measured side by side.
 */
import { type AdaptOptions, adapt, plainErrors } from '../src/cells/adapter';
import { catalog, findFunction } from '../src/cells/catalog';
import { efficiencyAt } from '../src/core/efficiency';
import { engineAdaptOptions } from '../src/engine/functions';
import { type BenchRow, meanMs, ms } from './harness';

const engineLike: AdaptOptions = engineAdaptOptions;
const addInLike: AdaptOptions = {};

/** Calls every `each` function of the catalog over a column of its first argument's sample. */
function useEveryFunction(options: AdaptOptions): void {
  for (const decl of catalog) {
    if (decl.kind !== 'each') continue;
    const fn = adapt(decl, plainErrors, options);
    const args: unknown[] = decl.args.map((a) => (Array.isArray(a.sample) ? a.sample.map((v) => [v]) : a.sample));
    const first = decl.args.findIndex((a) => a.type === 'number' && !a.series && typeof a.sample === 'number');
    if (first >= 0) args[first] = Array.from({ length: 100 }, () => [decl.args[first]!.sample]);
    for (let k = 0; k < 20; k++) fn(...args);
  }
}

export async function adapterOverhead(n = 100_000): Promise<BenchRow[]> {
  useEveryFunction(engineLike);
  useEveryFunction(addInLike);
  const kva = new Float64Array(n);
  const load = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    kva[i] = 500 + (i % 20) * 100;
    load[i] = 0.2 + (i % 50) / 50;
  }
  const kvaCells = Array.from(kva, (v) => [v]);
  const loadCells = Array.from(load, (v) => [v]);
  const engineEFF = adapt(findFunction('EFF')!, plainErrors, engineLike);
  const addInEFF = adapt(findFunction('EFF')!, plainErrors, addInLike);
  let sink = 0;
  const t = await meanMs({
    adapter: () => {
      const out = engineEFF(kvaCells, 1400, 10500, loadCells, null);
      sink += out.length;
    },
    addIn: () => {
      const out = addInEFF(kvaCells, 1400, 10500, loadCells, null);
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
  }, { warmupTime: 1000 });
  if (sink === 42) console.log(''); // keep the results alive
  const ratio = t.adapter! / t.raw!;
  const floorRatio = t.adapter! / t.rawWithCells!;
  const addInRatio = t.addIn! / t.rawWithCells!;
  return [{
    measure: `adapter, engine (a column loop per function): EFF over ${n.toLocaleString('en')} cells vs raw core loop over Float64Array (no cells in or out)`,
    ours: ms(t.adapter!),
    reference: ms(t.raw!),
    ratio: `${ratio.toFixed(2)}×`,
    goal: 'report',
    met: true,
  }, {
    measure: `adapter, engine: the same, vs raw loop reading cells and returning Excel's spill rows`,
    ours: ms(t.adapter!),
    reference: ms(t.rawWithCells!),
    ratio: `${floorRatio.toFixed(2)}×`,
    goal: '≤ 1.5×',
    met: floorRatio <= 1.5,
  }, {
    measure: `adapter, add-in (one shared column loop): the same, vs the same raw loop`,
    ours: ms(t.addIn!),
    reference: ms(t.rawWithCells!),
    ratio: `${addInRatio.toFixed(2)}×`,
    goal: '≤ 1.5×',
    met: addInRatio <= 1.5,
  }];
}
