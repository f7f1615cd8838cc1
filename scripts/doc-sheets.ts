/**
 * Tiny sheets computed by the embedded engine for the docs. Every example result the docs show is
 * read back from HyperFormula (src/engine) when the docs are generated — never typed by hand — so
 * an example cannot drift from what the add-in computes. All sheets of one document go into one
 * workbook: one engine build instead of a hundred keeps `npm run docs` and its test fast.
 */
import { DetailedCellError, type RawCellContent } from 'hyperformula';
import { createEngine, type Sheets } from '../src/engine/engine';
import { arraySize } from '../src/engine/internals';

/** A formula typed into one cell of a doc sheet. */
export interface DocFormula {
  /** Zero-based row and column of the formula's cell. */
  readonly at: { readonly row: number; readonly col: number };
  /** The formula as a user types it, with the leading `=`. */
  readonly formula: string;
}

/** A tiny sheet: values from A1 (null for an empty cell) and the formulas typed into it. */
export interface DocSheet {
  readonly cells: readonly (readonly RawCellContent[])[];
  readonly formulas: readonly DocFormula[];
}

export type ShownValue = number | string | boolean | { readonly error: string; readonly message: string };

export interface ComputedFormula extends DocFormula {
  /** What the formula shows: 1×1 for a single value, the whole spilled block otherwise. */
  readonly result: readonly (readonly ShownValue[])[];
}

export interface ComputedSheet {
  readonly cells: DocSheet['cells'];
  readonly results: readonly ComputedFormula[];
}

export const isError = (v: ShownValue): v is { error: string; message: string } => typeof v === 'object';

function shown(v: unknown): ShownValue {
  if (v instanceof DetailedCellError) return { error: v.value, message: v.message };
  if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') return v;
  if (v === null || v === undefined) return '';
  throw new Error(`unexpected cell value ${String(v)}`);
}

/** The sheet's rows as the engine takes them: values, with each formula in its cell. */
function engineRows(s: DocSheet): RawCellContent[][] {
  const height = Math.max(s.cells.length, ...s.formulas.map((f) => f.at.row + 1));
  const rows: RawCellContent[][] = [];
  for (let r = 0; r < height; r++) {
    const source = s.cells[r] ?? [];
    const width = Math.max(source.length, ...s.formulas.filter((f) => f.at.row === r).map((f) => f.at.col + 1));
    const row: RawCellContent[] = [];
    for (let c = 0; c < width; c++) row.push(source[c] ?? null);
    rows.push(row);
  }
  for (const f of s.formulas) rows[f.at.row]![f.at.col] = f.formula;
  return rows;
}

/** Evaluates every sheet in one workbook and reads back each formula's (spilled) result. */
export function computeSheets(sheets: readonly DocSheet[]): ComputedSheet[] {
  const workbook: Sheets = {};
  sheets.forEach((s, i) => (workbook[`Doc${i + 1}`] = engineRows(s)));
  const hf = createEngine(workbook);
  try {
    return sheets.map((s, i) => {
      const sheet = hf.getSheetId(`Doc${i + 1}`)!;
      const results = s.formulas.map((f): ComputedFormula => {
        const size = arraySize(hf, { sheet, row: f.at.row, col: f.at.col });
        const result: ShownValue[][] = [];
        for (let r = 0; r < size.rows; r++) {
          const row: ShownValue[] = [];
          for (let c = 0; c < size.cols; c++) row.push(shown(hf.getCellValue({ sheet, row: f.at.row + r, col: f.at.col + c })));
          result.push(row);
        }
        return { ...f, result };
      });
      return { cells: s.cells, results };
    });
  } finally {
    hf.destroy();
  }
}

/** A1-style column letters for a zero-based column. */
export function columnLetters(col: number): string {
  let s = '';
  for (let n = col + 1; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

export const cellName = (row: number, col: number): string => `${columnLetters(col)}${row + 1}`;

/** `A1:A6`, or `B1` for a single cell. */
export function rangeName(row: number, col: number, rows: number, cols: number): string {
  const first = cellName(row, col);
  return rows === 1 && cols === 1 ? first : `${first}:${cellName(row + rows - 1, col + cols - 1)}`;
}

/**
 * A number for reading: 6 significant figures, trailing zeros dropped, never an exponent between
 * 1e-6 and 1e21 (String() of a rounded number), and no "-0".
 */
export function readable(v: number, digits = 6): string {
  if (v === 0) return '0';
  const rounded = Number(v.toPrecision(digits));
  return String(rounded === 0 ? 0 : rounded);
}

/** A cell value as the docs print it: numbers rounded for reading, logical values as Excel shows them. */
export function showValue(v: ShownValue): string {
  if (typeof v === 'number') return readable(v);
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  if (typeof v === 'string') return v;
  return v.error;
}

/** A literal as it is typed in a formula. */
export function formulaLiteral(v: number | string | boolean): string {
  if (typeof v === 'number') return String(v);
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  return `"${v.replace(/"/g, '""')}"`;
}

/** Text made safe for one cell of a Markdown table. */
export const tableCell = (s: string): string => s.replace(/\|/g, '\\|').replace(/\n/g, ' ');

/** A Markdown table: a header row and body rows, numbers right-aligned where `right` says so. */
export function markdownTable(header: readonly string[], body: readonly (readonly string[])[], right: readonly boolean[] = []): string {
  const line = (cells: readonly string[]) => `| ${cells.map(tableCell).join(' | ')} |`;
  const rule = `|${header.map((_, i) => (right[i] ? '---:' : '---')).join('|')}|`;
  return [line(header), rule, ...body.map(line)].join('\n');
}

/**
 * The values of a sheet as a grid with row numbers and column letters, as a user sees it; `labels`
 * add a word under a column letter ("A: loads").
 */
export function sheetTable(cells: readonly (readonly RawCellContent[])[], labels: readonly string[] = [], firstRow = 0): string {
  const width = Math.max(labels.length, ...cells.map((r) => r.length));
  const header = [''];
  for (let c = 0; c < width; c++) header.push(labels[c] ? `${columnLetters(c)}: ${labels[c]}` : columnLetters(c));
  const body = cells.map((r, i) => {
    const row = [String(firstRow + i + 1)];
    for (let c = 0; c < width; c++) {
      const v = r[c];
      row.push(v === null || v === undefined ? '' : typeof v === 'number' || typeof v === 'boolean' || typeof v === 'string' ? showValue(v) : String(v));
    }
    return row;
  });
  return markdownTable(header, body, header.map((_, i) => i === 0));
}
