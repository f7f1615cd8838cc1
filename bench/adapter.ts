/**
 * Adapter overhead: XFMR.EFF through the cell adapter over 100,000-element ranges (cells in, a
 * spilled column out, as Excel passes them). The goal is against the floor any spreadsheet-facing
 * code pays — the same core loop reading the cells Excel passes and building the one-cell rows of
 * Excel's spill format, whichever of two ways of making a row (bench/floor.ts) was faster in the
 * run; the raw core loop over Float64Array is reported beside it to show what
 * the cells themselves cost.
 *
 * Measured as a workbook that uses many of our functions leaves the adapter: every function of
 * the catalog is first called over a column of its sample values. Three setups side by side: the
 * engine's (each function's column loop compiled at run time), the add-in as Excel loads it
 * (dist/functions.js, whose build wrote a loop for each function), and one loop shared by every
 * function (a host with neither). The add-in is also measured in headless Chromium, the kind of
 * runtime Excel on the web runs it in.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import vm from 'node:vm';
import { adapt, plainErrors } from '../src/cells/adapter';
import { catalog, findFunction } from '../src/cells/catalog';
import type { CellFunctionDecl } from '../src/cells/declaration';
import { efficiencyAt } from '../src/core/efficiency';
import { engineAdaptOptions } from '../src/engine/functions';
import { addInInChromium } from './adapterChromium';
import { floorLoop, literalRowsLoop, unitColumns } from './floor';
import { type BenchRow, meanMs, ms } from './harness';

type CellFn = (...args: unknown[]) => unknown[][];

/**
 * The functions dist/functions.js registers, with the little of Office's CustomFunctions runtime
 * the bundle touches. It runs in this context: code in a separate vm context reaches every global
 * (Math, Number) through an interceptor, several times slower than any runtime Excel has.
 */
function addInFunctions(): Record<string, CellFn> {
  const registered: Record<string, CellFn> = {};
  class StandInError {
    constructor(
      readonly code: string,
      readonly message?: string,
    ) {}
  }
  const host = globalThis as { CustomFunctions?: unknown };
  host.CustomFunctions = {
    associate: (id: string, fn: CellFn) => {
      registered[id] = fn;
    },
    Error: StandInError,
    ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A', invalidNumber: '#NUM!' },
  };
  try {
    vm.runInThisContext(readFileSync(resolve('dist/functions.js'), 'utf8'), { filename: 'dist/functions.js' });
  } finally {
    delete host.CustomFunctions;
  }
  return registered;
}

/** A call of every `each` function of the catalog over a column of its first argument's sample. */
export function warmUpCalls(): { name: string; args: unknown[] }[] {
  return catalog.flatMap((decl) => {
    if (decl.kind !== 'each') return [];
    const args: unknown[] = decl.args.map((a) => (Array.isArray(a.sample) ? a.sample.map((v) => [v]) : a.sample));
    const first = decl.args.findIndex((a) => a.type === 'number' && !a.series && typeof a.sample === 'number');
    if (first >= 0) args[first] = Array.from({ length: 100 }, () => [decl.args[first]!.sample]);
    return [{ name: decl.name, args }];
  });
}

/** Makes each warm-up call 20 times, as a workbook that uses many of our functions does. */
function useEveryFunction(fnFor: (decl: CellFunctionDecl) => CellFn): void {
  for (const { name, args } of warmUpCalls()) {
    const fn = fnFor(findFunction(name)!);
    for (let k = 0; k < 20; k++) fn(...args);
  }
}

export async function adapterOverhead(n = 100_000): Promise<BenchRow[]> {
  const addIn = addInFunctions();
  useEveryFunction((decl) => adapt(decl, plainErrors, engineAdaptOptions));
  useEveryFunction((decl) => addIn[decl.name]!);
  useEveryFunction((decl) => adapt(decl, plainErrors));
  const { kva, load, kvaCells, loadCells } = unitColumns(n);
  const engineEFF = adapt(findFunction('EFF')!, plainErrors, engineAdaptOptions);
  const addInEFF = addIn.EFF!;
  const sharedEFF = adapt(findFunction('EFF')!, plainErrors);
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
    shared: () => {
      const out = sharedEFF(kvaCells, 1400, 10500, loadCells, null);
      sink += out.length;
    },
    raw: () => {
      const out = new Float64Array(n);
      for (let i = 0; i < n; i++) out[i] = efficiencyAt(kva[i]!, 1400, 10500, load[i]!, 1);
      sink += out[n - 1]!;
    },
    filledRows: () => {
      sink += floorLoop(kvaCells, loadCells).length;
    },
    literalRows: () => {
      sink += literalRowsLoop(kvaCells, loadCells).length;
    },
  }, { warmupTime: 1000 });
  if (sink === 42) console.log(''); // keep the results alive
  const ratio = t.adapter! / t.raw!;
  // The floor is whichever way of making the rows was faster in this run.
  const floor = Math.min(t.filledRows!, t.literalRows!);
  const floorRatio = t.adapter! / floor;
  const addInRatio = t.addIn! / floor;
  const sharedRatio = t.shared! / floor;
  return [{
    measure: `adapter, engine (a column loop per function, compiled at run time): EFF over ${n.toLocaleString('en')} cells vs raw core loop over Float64Array (no cells in or out)`,
    ours: ms(t.adapter!),
    reference: ms(t.raw!),
    ratio: `${ratio.toFixed(2)}×`,
    goal: 'report',
    met: true,
  }, {
    measure: `adapter, engine: the same, vs raw loop reading cells and returning Excel's spill rows (the faster of two ways to make a row, below)`,
    ours: ms(t.adapter!),
    reference: ms(floor),
    ratio: `${floorRatio.toFixed(2)}×`,
    goal: '≤ 1.5×',
    met: floorRatio <= 1.5,
  }, {
    measure: `adapter, add-in (dist/functions.js as Excel loads it, a column loop per function written by the build): the same, vs the same raw loop`,
    ours: ms(t.addIn!),
    reference: ms(floor),
    ratio: `${addInRatio.toFixed(2)}×`,
    goal: '≤ 1.5×',
    met: addInRatio <= 1.5,
  }, {
    measure: `adapter, one column loop shared by every function (a host with no copies): the same, vs the same raw loop`,
    ours: ms(t.shared!),
    reference: ms(floor),
    ratio: `${sharedRatio.toFixed(2)}×`,
    goal: 'report',
    met: true,
  }, {
    measure: 'adapter: the raw loop with each row written as a literal [value], vs the raw loop making each row empty and then filling it (as the adapter does)',
    ours: ms(t.literalRows!),
    reference: ms(t.filledRows!),
    ratio: `${(t.literalRows! / t.filledRows!).toFixed(2)}×`,
    goal: 'report',
    met: true,
  }, await addInInChromium(warmUpCalls(), n)];
}
