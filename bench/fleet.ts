/**
 * A fleet of 100,000 units in the embedded engine: three range formulas of ours (IRATED, EFF at
 * 50 % load, LOADLOSS) against the same sums written as 300,000 per-cell native formulas, in the
 * same HyperFormula engine. Times include building the engine and computing every formula; peak
 * heap is sampled while each workbook is held.
 */
import type { RawCellContent } from 'hyperformula';
import { createEngine } from '../src/engine/engine';
import { type BenchRow, ms } from './harness';

function fleetColumns(n: number): RawCellContent[][] {
  const rows: RawCellContent[][] = [];
  for (let i = 0; i < n; i++) {
    const kva = [300, 500, 750, 1000, 1500, 2000, 2500][i % 7]!;
    // Invented losses of the right order for efficient liquid-immersed units.
    rows.push([kva, i % 3 === 0 ? 480 : 415, Math.round(kva * 0.9 + (i % 11) * 10), Math.round(kva * 8.5 + (i % 13) * 40)]);
  }
  return rows;
}

function withOurs(data: RawCellContent[][]): RawCellContent[][] {
  const n = data.length;
  const rows = data.map((r) => [...r]);
  rows[0]!.push(`=XFMR.IRATED(A1:A${n}, B1:B${n})`, `=XFMR.EFF(A1:A${n}, C1:C${n}, D1:D${n}, 0.5)`, `=XFMR.LOADLOSS(D1:D${n}, 0.5)`);
  return rows;
}

function withNative(data: RawCellContent[][]): RawCellContent[][] {
  return data.map((r, i) => {
    const k = i + 1;
    return [
      ...r,
      `=A${k}*1000/(SQRT(3)*B${k})`,
      `=0.5*A${k}*1000/(0.5*A${k}*1000+C${k}+0.25*D${k})`,
      `=D${k}*0.25`,
    ];
  });
}

const gc = (globalThis as { gc?: () => void }).gc;

/** Best of `runs` wall times for building + computing, and the heap held once built. */
function measure(sheet: () => RawCellContent[][], check: (hf: ReturnType<typeof createEngine>) => void, runs: number): { ms: number; heapMb: number } {
  let best = Infinity;
  let heapMb = 0;
  for (let r = 0; r < runs; r++) {
    const rows = sheet();
    gc?.();
    const before = process.memoryUsage().heapUsed;
    const t = performance.now();
    const hf = createEngine({ Fleet: rows });
    const elapsed = performance.now() - t;
    check(hf);
    heapMb = Math.max(heapMb, (process.memoryUsage().heapUsed - before) / 2 ** 20);
    hf.destroy();
    best = Math.min(best, elapsed);
  }
  return { ms: best, heapMb };
}

export interface FleetResult {
  readonly rows: BenchRow[];
  readonly peakHeapMb: number;
}

export function fleetBenchmark(n = 100_000): FleetResult {
  const data = fleetColumns(n);
  const lastRow = { sheet: 0, row: n - 1, col: 5 };
  // The same last efficiency from both workbooks: the comparison is of like with like.
  let oursLast = 0;
  let nativeLast = 0;
  const ours = measure(() => withOurs(data), (hf) => void (oursLast = hf.getCellValue(lastRow) as number), 3);
  const native = measure(() => withNative(data), (hf) => void (nativeLast = hf.getCellValue(lastRow) as number), 2);
  if (Math.abs(oursLast - nativeLast) > 1e-12) throw new Error(`fleet results differ: ${oursLast} vs ${nativeLast}`);
  const speedup = native.ms / ours.ms;
  return {
    rows: [
      {
        measure: `fleet: ${n.toLocaleString('en')} units × 3 functions in the engine (ours: 3 range formulas; reference: ${(3 * n).toLocaleString('en')} native formulas)`,
        ours: ms(ours.ms),
        reference: ms(native.ms),
        ratio: `${speedup.toFixed(1)}× faster`,
        goal: '≥ 20× faster',
        met: speedup >= 20,
      },
      {
        measure: `memory: heap held by the ${n.toLocaleString('en')}-unit fleet workbook once computed`,
        ours: `${ours.heapMb.toFixed(0)} MB`,
        reference: `${native.heapMb.toFixed(0)} MB`,
        ratio: `${(native.heapMb / ours.heapMb).toFixed(1)}× less`,
        goal: 'report',
        met: true,
      },
    ],
    peakHeapMb: ours.heapMb,
  };
}
