/**
 * What the adapter rows are measured against: XFMR.EFF's core over a column of units as Excel
 * passes it (one-cell rows in, one-cell rows out), written as a plain loop. Shared by the Node
 * bench and the page the Chromium row runs in, so both measure the same code.
 */
import { efficiencyAt } from '../src/core/efficiency';

/** The unit data of the adapter rows: rated kVA and per-unit load, as columns of one-cell rows. */
export function unitColumns(n: number): { kva: Float64Array; load: Float64Array; kvaCells: number[][]; loadCells: number[][] } {
  const kva = new Float64Array(n);
  const load = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    kva[i] = 500 + (i % 20) * 100;
    load[i] = 0.2 + (i % 50) / 50;
  }
  return { kva, load, kvaCells: Array.from(kva, (v) => [v]), loadCells: Array.from(load, (v) => [v]) };
}

/**
 * The least any spreadsheet-facing code pays: the loop reading the cells Excel passes and
 * returning the one-cell rows its spill format needs, each row made as the adapter makes a
 * number's row (empty, then filled). The bench takes this or literalRowsLoop, whichever is faster.
 */
export function floorLoop(kvaCells: readonly number[][], loadCells: readonly number[][]): number[][] {
  const n = kvaCells.length;
  const out = new Array<number[]>(n);
  for (let i = 0; i < n; i++) {
    const row = new Array<number>(1);
    row[0] = efficiencyAt(kvaCells[i]![0]!, 1400, 10500, loadCells[i]![0]!, 1);
    out[i] = row;
  }
  return out;
}

/** The same loop with each row written as a literal, `[value]`: the other way to make a row. */
export function literalRowsLoop(kvaCells: readonly number[][], loadCells: readonly number[][]): number[][] {
  const n = kvaCells.length;
  const out = new Array<number[]>(n);
  for (let i = 0; i < n; i++) out[i] = [efficiencyAt(kvaCells[i]![0]!, 1400, 10500, loadCells[i]![0]!, 1)];
  return out;
}
