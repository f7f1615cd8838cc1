/**
 * Formula text as a file stores it (A1 references, ECMA-376 Part 1 §18.17): moving a shared
 * formula to the cells that share it, and recognising the simple one-call formula a filled-down
 * column repeats, which the engine can compute for the whole column in one call.
 */
import { outsideQuotes } from './names';

const MAX_ROW = 1_048_576;
const MAX_COL = 16_384;

// A cell reference: not part of a longer name, not a function ("LOG10(") nor a sheet ("Sheet1!").
const CELL_REF = /(?<![\w.$!:])(\$?)([A-Z]{1,3})(\$?)(\d{1,7})(?![\w(!.])/gi;
// The second half of a range ("A1:B2") is a reference too, and so is a sheet-qualified one.
const RANGE_END = /(?<=[:!])(\$?)([A-Z]{1,3})(\$?)(\d{1,7})(?![\w(!.])/gi;
// Whole columns ("A:C", "Sheet1!$B:B") and whole rows ("3:5").
const COLUMNS = /(?<![\w.$:])(\$?)([A-Z]{1,3}):(\$?)([A-Z]{1,3})(?![\w(!.:])/gi;
const ROWS = /(?<![\w.$:])(\$?)(\d{1,7}):(\$?)(\d{1,7})(?![\w(!.:])/g;

function colNumber(letters: string): number {
  let n = 0;
  for (const ch of letters.toUpperCase()) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n;
}

function colLetters(col: number): string {
  let s = '';
  for (let n = col; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

function shiftRef(colAbs: string, col: string, rowAbs: string, row: string, dr: number, dc: number): string {
  const c = colNumber(col);
  if (c > MAX_COL) return `${colAbs}${col}${rowAbs}${row}`; // a name such as "ABCD1", not a cell
  const nc = colAbs ? c : c + dc;
  const nr = rowAbs ? Number(row) : Number(row) + dr;
  if (nc < 1 || nc > MAX_COL || nr < 1 || nr > MAX_ROW) return '#REF!';
  return `${colAbs}${colLetters(nc)}${rowAbs}${nr}`;
}

/**
 * The master formula of a shared group as it reads in a cell `dr` rows and `dc` columns away:
 * relative references move, absolute ones ($A$1) stay (ECMA-376 Part 1 §18.3.1.40, `t="shared"`).
 */
export function shiftFormula(formula: string, dr: number, dc: number): string {
  if (dr === 0 && dc === 0) return formula;
  const move = (_: string, ca: string, c: string, ra: string, r: string) => shiftRef(ca, c, ra, r, dr, dc);
  const moveColumns = (whole: string, a1: string, c1: string, a2: string, c2: string) => shiftLine(whole, [a1, colNumber(c1)], [a2, colNumber(c2)], dc, MAX_COL, colLetters);
  const moveRows = (whole: string, a1: string, r1: string, a2: string, r2: string) => shiftLine(whole, [a1, Number(r1)], [a2, Number(r2)], dr, MAX_ROW, String);
  return outsideQuotes(formula, (code) => code.replace(CELL_REF, move).replace(RANGE_END, move).replace(COLUMNS, moveColumns).replace(ROWS, moveRows));
}

/** A whole-column or whole-row range moved by `d`, each end unless it is absolute ($). */
function shiftLine(whole: string, [abs1, n1]: [string, number], [abs2, n2]: [string, number], d: number, max: number, name: (n: number) => string): string {
  if (n1 < 1 || n1 > max || n2 < 1 || n2 > max) return whole; // not a range of this sheet: a name, say
  const m1 = abs1 ? n1 : n1 + d;
  const m2 = abs2 ? n2 : n2 + d;
  if (m1 < 1 || m1 > max || m2 < 1 || m2 > max) return '#REF!';
  return `${abs1}${name(m1)}:${abs2}${name(m2)}`;
}

/** One argument of a simple call: a cell of the formula's own row, or a constant. */
export type SimpleArg = { readonly col: number } | { readonly value: number | string | boolean };

export interface SimpleCall {
  /** The function's name in the engine's form, upper case: XFMR.EFF. */
  readonly name: string;
  readonly args: readonly SimpleArg[];
  /** A key that is the same for every row of a filled-down column. */
  readonly key: string;
}

const CALL = /^\s*(XFMR\.[A-Z0-9_.]+)\s*\((.*)\)\s*$/i;
const REF_ARG = /^\s*\$?([A-Z]{1,3})(\d{1,7}|\u0000)\s*$/i;
const NUM_ARG = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:E[+-]?\d+)?)\s*$/i;
const STR_ARG = /^\s*"((?:[^"]|"")*)"\s*$/;
const BOOL_ARG = /^\s*(TRUE|FALSE)\s*$/i;

/**
 * `XFMR.NAME(B7, F7, 0.5, "ONAN")` in row 7 (`row` may be a mark standing for the row number in a
 * template): a call whose arguments are cells of the same row
 * (relative rows, any column) or constants — the form a filled-down column has. Anything else
 * (nesting, operators, ranges, other rows, names) is undefined and goes the general way.
 */
export function simpleCall(engineFormula: string, row: number | string): SimpleCall | undefined {
  const m = CALL.exec(engineFormula);
  if (!m) return undefined;
  const inner = m[2]!;
  if (/[()]/.test(inner.replace(/"(?:[^"]|"")*"/g, ''))) return undefined;
  const parts = inner.trim() === '' ? [] : splitArgs(inner);
  if (parts === undefined) return undefined;
  const args: SimpleArg[] = [];
  let key = m[1]!.toUpperCase();
  for (const p of parts) {
    let a: RegExpExecArray | null;
    if ((a = REF_ARG.exec(p))) {
      if (a[2] !== String(row) || p.includes(`$${a[2]}`)) return undefined;
      const col = colNumber(a[1]!);
      if (col > MAX_COL) return undefined;
      args.push({ col });
      key += `|c${col}`;
    } else if (p.includes('\u0000')) {
      return undefined; // the row number inside a constant: not the same in every row
    } else if ((a = NUM_ARG.exec(p))) {
      args.push({ value: Number(a[1]) });
      key += `|n${Number(a[1])}`;
    } else if ((a = STR_ARG.exec(p))) {
      const value = a[1]!.replace(/""/g, '"');
      args.push({ value });
      key += `|s${JSON.stringify(value)}`;
    } else if ((a = BOOL_ARG.exec(p))) {
      const value = a[1]!.toUpperCase() === 'TRUE';
      args.push({ value });
      key += `|b${value}`;
    } else return undefined;
  }
  return { name: m[1]!.toUpperCase(), args, key };
}

/** Splits at the commas outside string literals; undefined for an empty argument (a blank). */
function splitArgs(inner: string): string[] | undefined {
  const out: string[] = [];
  let cur = '';
  let quoted = false;
  for (const ch of inner) {
    if (ch === '"') quoted = !quoted;
    if (ch === ',' && !quoted) {
      out.push(cur);
      cur = '';
    } else cur += ch;
  }
  out.push(cur);
  return out.some((p) => p.trim() === '') ? undefined : out;
}
