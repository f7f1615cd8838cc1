/**
 * A column that repeats one XFMR call row by row — `=XFMR.EFF(B2,F2,G2,H2)` filled down, as users
 * write a fleet — computed as one call of the adapter over the whole column instead of one
 * HyperFormula formula per cell. The adapter broadcasts over ranges exactly as it does for
 * `=XFMR.EFF(B2:B100001, …)`, so every cell gets the value and message it would get alone.
 *
 * Only calls whose arguments are constants or cells of the same row holding plain values (not
 * formulas, not blank, not an error value, not inside an old array result) qualify: their inputs
 * do not depend on any formula, so computing them first loses no order, and HyperFormula then
 * reads their results as values. Everything else takes the general way.
 */
import { CellError } from 'hyperformula';
import { adapt, type CellFunction } from '../cells/adapter';
import { findFunction, NAMESPACE } from '../cells/catalog';
import type { CellFunctionDecl } from '../cells/declaration';
import { ENGINE_CONFIG } from './engine';
import { engineAdaptOptions, hyperFormulaError } from './functions';
import type { SimpleArg } from './formulas';
import type { FormulaCell, PackageRead } from './read';

export type ColumnValue = number | string | boolean | { error: string; message?: string };

const fns = new Map<string, CellFunction>();

function cellFunction(decl: CellFunctionDecl): CellFunction {
  let fn = fns.get(decl.name);
  if (!fn) {
    fn = adapt(decl, hyperFormulaError, engineAdaptOptions);
    fns.set(decl.name, fn);
  }
  return fn;
}

const DIGITS = ENGINE_CONFIG.precisionRounding ?? 14;

/**
 * A number as HyperFormula gives it out: rounded to `precisionRounding` digits after the first
 * significant one (its "smartRounding", HyperFormula guide "Configuration options", on by default),
 * so a column computed here equals the same column computed cell by cell.
 */
export function engineRounding(value: number): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const places = 10 ** (DIGITS - magnitude);
  return Math.round(value * places) / places;
}

function output(v: unknown): ColumnValue {
  if (v instanceof CellError) return v.message ? { error: v.type === 'VALUE' ? '#VALUE!' : v.type === 'NUM' ? '#NUM!' : v.type === 'NA' ? '#N/A' : `#${v.type}`, message: v.message } : { error: `#${v.type}` };
  if (typeof v === 'number') return engineRounding(v);
  if (typeof v === 'string' || typeof v === 'boolean') return v;
  return 0;
}

/** An input cell's value as the adapter gets it from HyperFormula, or undefined when it does not qualify. */
function plainInput(v: unknown): number | string | boolean | undefined {
  if (typeof v === 'number' || typeof v === 'boolean') return v;
  if (typeof v === 'string' && v.startsWith("'")) return v.slice(1);
  return undefined; // blank, or an error value written as its code
}

/** Arguments a declaration takes: at least its required ones, at most all. */
function argumentCountFits(decl: CellFunctionDecl, n: number): boolean {
  const required = decl.args.filter((a) => !a.optional).length;
  return n >= required && n <= decl.args.length;
}

interface Group {
  readonly decl: CellFunctionDecl;
  readonly args: readonly SimpleArg[];
  readonly cells: FormulaCell[];
  readonly places: number[];
}

/** Cells of a column computed in one call of the adapter. */
const SLICE = 4096;

/**
 * Computes every qualifying column; the values are given by the formula's place among all the
 * workbook's formulas (sheet by sheet, in file order), undefined for the others. `tick` hears how
 * many cells were done.
 */
export function computeColumns(read: PackageRead, tick: (n: number) => void): (ColumnValue | undefined)[] {
  const out: (ColumnValue | undefined)[] = [];
  let offset = 0;
  for (const sheet of read.sheets) {
    const groups = new Map<string, Map<number, Group>>();
    const base = offset;
    offset += sheet.formulas.length;
    out.length = offset;
    for (const [k, f] of sheet.formulas.entries()) {
      if (!f.ours || f.kind === 'array') continue;
      const call = f.template.simple;
      if (!call) continue;
      const decl = findFunction(call.name.slice(NAMESPACE.length + 1));
      if (!decl || decl.kind !== 'each' || decl.args.some((a) => a.series) || !argumentCountFits(decl, call.args.length)) continue;
      const row = sheet.rows[f.row - 1];
      if (call.args.some((a) => 'col' in a && plainInput(row?.[a.col - 1]) === undefined)) continue;
      // By call, then column: the call's key is one string for a whole template, its hash kept.
      let byCol = groups.get(call.key);
      if (!byCol) groups.set(call.key, (byCol = new Map()));
      let g = byCol.get(f.col);
      if (!g) byCol.set(f.col, (g = { decl, args: call.args, cells: [], places: [] }));
      g.cells.push(f);
      g.places.push(base + k);
    }
    for (const g of [...groups.values()].flatMap((byCol) => [...byCol.values()])) {
      const fn = cellFunction(g.decl);
      // A slice of the column at a time: the argument columns and the adapter's result are short-lived.
      for (let from = 0; from < g.cells.length; from += SLICE) {
        const cells = g.cells.slice(from, from + SLICE);
        const args = g.args.map((a) => ('col' in a ? cells.map((f) => [plainInput(sheet.rows[f.row - 1]![a.col - 1])]) : a.value));
        const result = fn(...args);
        const whole = result.length === 1 && result[0]!.length === 1 && cells.length > 1;
        for (let i = 0; i < cells.length; i++) out[g.places[from + i]!] = output(whole ? result[0]![0] : result[i]?.[0]);
        tick(cells.length);
      }
    }
  }
  return out;
}
