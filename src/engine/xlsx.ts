/**
 * Reads an .xlsx workbook (exceljs), recalculates it in the embedded engine, and writes every
 * formula back with its computed value, so Excel shows values before the add-in loads and
 * LibreOffice shows them at all. Only formula cells and the cells of their spilled results are
 * changed; every other cell, style and sheet is written as it was read.
 *
 * Spilled results (a range argument, or a block such as XFMR.EFFCURVE): the anchor cell gets an
 * array formula over the whole result (`<f t="array" ref="A1:C11">`, ECMA-376 Part 1, the `f`
 * element of a cell) and every cell of the range gets its computed value. Excel opens that as an
 * array formula over a fixed range — shown with braces, {=XFMR.EFFCURVE(…)} — which the add-in
 * recalculates, but which does not grow or shrink by itself the way a dynamic-array spill does
 * (that needs the dynamic-array cell metadata, which exceljs does not write); re-entering the
 * formula in Excel makes it a dynamic array again. Array formulas read from a file (Excel's
 * dynamic arrays are stored the same way) are recalculated with array arithmetic
 * (HyperFormula's ARRAYFORMULA), and the values in their old range are not read as input.
 */
import ExcelJS from 'exceljs';
import { DetailedCellError, type HyperFormula, type RawCellContent, type SerializedNamedExpression } from 'hyperformula';
import { arraySize, createEngine } from './engine';
import { callsOurFunctions, toEngineFormula, toStoredFormula } from './names';
import { checkPackage, WorkbookError, type PackageLimits } from './package';

export { WorkbookError } from './package';

const ZIP_MAGIC = Buffer.from([0x50, 0x4b, 0x03, 0x04]);
const OLE_MAGIC = Buffer.from([0xd0, 0xcf, 0x11, 0xe0]); // .xls, and .xlsx protected by a password

/**
 * Loads .xlsx bytes, or throws WorkbookError saying why they are not a workbook; the package is
 * checked first (package.ts) so that a damaged, crafted or oversized one is refused before exceljs
 * unpacks it.
 */
export async function loadWorkbook(bytes: Buffer, limits?: PackageLimits): Promise<ExcelJS.Workbook> {
  if (bytes.length === 0) throw new WorkbookError('the file is empty');
  if (bytes.subarray(0, 4).equals(OLE_MAGIC)) {
    throw new WorkbookError('this is an old .xls workbook or a password-protected one; save it as .xlsx without a password');
  }
  if (!bytes.subarray(0, 4).equals(ZIP_MAGIC)) {
    throw new WorkbookError('this is not an .xlsx workbook (an .xlsx file is a ZIP package; is it a CSV or text file renamed .xlsx?)');
  }
  await checkPackage(bytes, limits);
  const workbook = new ExcelJS.Workbook();
  try {
    await workbook.xlsx.load(bytes as unknown as ExcelJS.Buffer);
  } catch (error) {
    const reason = error instanceof Error ? error.message.split('\n')[0] : String(error);
    throw new WorkbookError(`this .xlsx package cannot be read (${reason})`);
  }
  if (workbook.worksheets.length === 0) throw new WorkbookError('this package holds no worksheet; is it an .xlsx workbook?');
  return workbook;
}

/** One formula cell as read: where it is and its formula as the file stores it (no "="). */
export interface FormulaCell {
  readonly sheetIndex: number;
  readonly sheet: string;
  /** 1-based, as exceljs counts. */
  readonly row: number;
  readonly col: number;
  readonly address: string;
  readonly stored: string;
  /** The formula in the engine's form, with "=": =XFMR.EFF(…). */
  readonly formula: string;
  /** It was an array formula in the file (Excel's dynamic arrays are stored so). */
  readonly array: boolean;
  /** The range its array result covered in the file, when larger than the cell itself. */
  readonly oldRange?: CellRange;
  readonly ours: boolean;
}

interface CellRange {
  readonly top: number;
  readonly left: number;
  readonly bottom: number;
  readonly right: number;
}

export interface ReadWorkbook {
  readonly sheets: Record<string, RawCellContent[][]>;
  readonly names: SerializedNamedExpression[];
  readonly formulas: FormulaCell[];
  /** Cells of the largest range a formula of ours reads (a profile of 8,760 hours is 8,760). */
  readonly longestRange: number;
}

const EXCEL_EPOCH_1900 = Date.UTC(1899, 11, 30);
const EXCEL_EPOCH_1904 = Date.UTC(1904, 0, 1);
const DAY_MS = 86_400_000;

function parseRange(ref: string): CellRange | undefined {
  const m = /^\$?([A-Z]{1,3})\$?(\d+)(?::\$?([A-Z]{1,3})\$?(\d+))?$/i.exec(ref.trim());
  if (!m) return undefined;
  const a = { row: Number(m[2]), col: columnNumber(m[1]!) };
  const b = m[3] ? { row: Number(m[4]), col: columnNumber(m[3]) } : a;
  return { top: Math.min(a.row, b.row), left: Math.min(a.col, b.col), bottom: Math.max(a.row, b.row), right: Math.max(a.col, b.col) };
}

function columnNumber(letters: string): number {
  let n = 0;
  for (const ch of letters.toUpperCase()) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n;
}

export function columnLetters(col: number): string {
  let s = '';
  for (let n = col; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

const a1 = (row: number, col: number): string => `${columnLetters(col)}${row}`;

/** The number of cells of the largest A1:B2 range in a formula (whole columns count as `sheetRows`). */
function largestRange(formula: string, sheetRows: number): number {
  let largest = 0;
  for (const m of formula.matchAll(/\$?([A-Z]{1,3})\$?(\d+):\$?([A-Z]{1,3})\$?(\d+)/gi)) {
    const r = parseRange(`${m[1]}${m[2]}:${m[3]}${m[4]}`)!;
    largest = Math.max(largest, (r.bottom - r.top + 1) * (r.right - r.left + 1));
  }
  for (const m of formula.matchAll(/(?<![\w$])\$?([A-Z]{1,3}):\$?([A-Z]{1,3})(?![\w(])/gi)) {
    largest = Math.max(largest, sheetRows * (Math.abs(columnNumber(m[2]!) - columnNumber(m[1]!)) + 1));
  }
  return largest;
}

/** A plain cell value as the engine reads it: text is marked as text so "123" stays text. */
function engineValue(value: ExcelJS.CellValue, date1904: boolean): RawCellContent {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number' || typeof value === 'boolean') return value;
  if (typeof value === 'string') return `'${value}`;
  if (value instanceof Date) return (value.getTime() - (date1904 ? EXCEL_EPOCH_1904 : EXCEL_EPOCH_1900)) / DAY_MS;
  if ('richText' in value) return `'${value.richText.map((r) => r.text).join('')}`;
  if ('hyperlink' in value) return `'${value.text}`;
  if ('error' in value) return value.error;
  return null;
}

/** Reads every sheet's values and formulas into the engine's form. */
export function readCells(workbook: ExcelJS.Workbook): ReadWorkbook {
  const date1904 = Boolean((workbook.properties as { date1904?: boolean } | undefined)?.date1904);
  const sheets: Record<string, RawCellContent[][]> = {};
  const formulas: FormulaCell[] = [];
  let longestRange = 0;
  workbook.worksheets.forEach((ws, sheetIndex) => {
    const rows: RawCellContent[][] = [];
    const spilled = new Set<string>();
    const sheetRows = ws.rowCount;
    ws.eachRow({ includeEmpty: false }, (row, r) => {
      const out: RawCellContent[] = (rows[r - 1] = []);
      row.eachCell({ includeEmpty: false }, (cell, c) => {
        if (cell.isMerged && cell.master !== cell) return; // a merged area's value lives in its first cell
        if (spilled.has(a1(r, c))) return; // part of an array result read from the file
        if (cell.type !== ExcelJS.ValueType.Formula) {
          out[c - 1] = engineValue(cell.value, date1904);
          return;
        }
        const stored = cell.formula;
        if (!stored) return;
        const model = cell.value as { shareType?: string; ref?: string };
        const array = model.shareType === 'array';
        const range = array && model.ref ? parseRange(model.ref) : undefined;
        const oldRange = range && (range.bottom > range.top || range.right > range.left) ? range : undefined;
        if (oldRange) {
          for (let i = oldRange.top; i <= oldRange.bottom; i++) {
            for (let j = oldRange.left; j <= oldRange.right; j++) if (i !== r || j !== c) spilled.add(a1(i, j));
          }
        }
        const engine = toEngineFormula(stored);
        const ours = callsOurFunctions(stored);
        formulas.push({ sheetIndex, sheet: ws.name, row: r, col: c, address: a1(r, c), stored, formula: `=${engine}`, array, oldRange, ours });
        out[c - 1] = array ? `=ARRAYFORMULA(${engine})` : `=${engine}`;
        if (ours) longestRange = Math.max(longestRange, largestRange(engine, sheetRows));
      });
    });
    for (let i = 0; i < rows.length; i++) rows[i] ??= [];
    sheets[ws.name] = rows;
  });
  return { sheets, names: definedNames(workbook), formulas, longestRange };
}

/** Workbook-level names of ranges (Price_kWh = Inputs!$B$2), which exceljs reads. */
function definedNames(workbook: ExcelJS.Workbook): SerializedNamedExpression[] {
  const model = (workbook.definedNames as unknown as { model: { name: string; ranges: string[] }[] }).model;
  return model
    .filter((d) => d.ranges.length === 1 && /^[A-Za-z_][A-Za-z0-9_.]*$/.test(d.name) && !d.name.startsWith('_xlnm.'))
    .map((d) => ({ name: d.name, expression: `=${d.ranges[0]}` }));
}

/** A computed value as --json prints it; errors carry their code and our message. */
export type JsonValue = number | string | boolean | null | { error: string; message?: string };

export interface FormulaResult {
  sheet: string;
  cell: string;
  formula: string;
  value: JsonValue;
  /** A spilled result: its range and every value of it, row by row. */
  spill?: { ref: string; values: JsonValue[][] };
}

/** HyperFormula gives a cycle no message: say what it is and where it runs through. */
function cycleMessage(v: DetailedCellError): string {
  const through = v.address ? ` through ${v.address}` : '';
  return `circular reference${through}: a formula in the cycle needs its own result, so it has no value; break the cycle`;
}

function jsonValue(v: unknown): JsonValue {
  if (v instanceof DetailedCellError) {
    if (v.value === '#CYCLE!' && !v.message) return { error: v.value, message: cycleMessage(v) };
    return v.message ? { error: v.value, message: v.message } : { error: v.value };
  }
  if (v === undefined) return null;
  return v as JsonValue;
}

// The error codes a file can hold (ECMA-376 Part 1, cell error values); HyperFormula's own
// (#CYCLE!, #ERROR!, #LIC!, #SPILL!) are stored as #VALUE!, and --json gives the real one.
const FILE_ERRORS = new Set(['#NULL!', '#DIV/0!', '#VALUE!', '#REF!', '#NAME?', '#NUM!', '#N/A']);

function fileValue(v: JsonValue): ExcelJS.CellValue {
  if (v !== null && typeof v === 'object') {
    return { error: (FILE_ERRORS.has(v.error) ? v.error : '#VALUE!') as ExcelJS.CellErrorValue['error'] };
  }
  return v;
}

function fileResult(v: JsonValue): ExcelJS.CellFormulaValue['result'] {
  const f = fileValue(v);
  return f === null ? undefined : (f as ExcelJS.CellFormulaValue['result']);
}

/** Builds the engine for what was read; tries again without the defined names if it refuses them. */
export function calculate(read: ReadWorkbook, onCall?: () => void): HyperFormula {
  try {
    return createEngine(read.sheets, { onCall, namedExpressions: read.names });
  } catch (error) {
    if (read.names.length === 0) throw error;
    return createEngine(read.sheets, { onCall });
  }
}

/**
 * Writes every formula with its computed value into the workbook (in memory) and returns the
 * results. Array results go into cells that were empty for the engine (it answers #SPILL! rather
 * than cover a value), and cells of an old, larger array result are cleared.
 */
export function storeResults(workbook: ExcelJS.Workbook, read: ReadWorkbook, hf: HyperFormula, onStored?: () => void): FormulaResult[] {
  const results: FormulaResult[] = [];
  // Old array ranges first: a new result may now cover part of another formula's old range.
  for (const f of read.formulas) if (f.oldRange) clearRange(workbook.worksheets[f.sheetIndex]!, f.oldRange, f);
  for (const f of read.formulas) {
    const ws = workbook.worksheets[f.sheetIndex]!;
    const address = { sheet: f.sheetIndex, row: f.row - 1, col: f.col - 1 };
    const value = jsonValue(hf.getCellValue(address));
    const size = arraySize(hf, address);
    const formula = toStoredFormula(f.stored);
    const result: FormulaResult = { sheet: f.sheet, cell: f.address, formula: f.formula, value };
    if (size.rows > 1 || size.cols > 1) {
      const ref = `${f.address}:${a1(f.row + size.rows - 1, f.col + size.cols - 1)}`;
      const values = (hf.getRangeValues({ start: address, end: { ...address, row: address.row + size.rows - 1, col: address.col + size.cols - 1 } }) as unknown[][]).map(
        (r) => r.map(jsonValue),
      );
      values.forEach((r, i) =>
        r.forEach((v, j) => {
          if (i > 0 || j > 0) ws.getCell(f.row + i, f.col + j).value = fileValue(v);
        }),
      );
      ws.getCell(f.row, f.col).value = { formula, result: fileResult(value), shareType: 'array', ref } as ExcelJS.CellValue;
      result.spill = { ref, values };
    } else if (f.array) {
      ws.getCell(f.row, f.col).value = { formula, result: fileResult(value), shareType: 'array', ref: f.address } as ExcelJS.CellValue;
    } else {
      ws.getCell(f.row, f.col).value = { formula, result: fileResult(value) };
    }
    results.push(result);
    onStored?.();
  }
  return results;
}

/** Empties the cells of an old array result, all but its anchor. */
function clearRange(ws: ExcelJS.Worksheet, old: CellRange, anchor: { row: number; col: number }): void {
  for (let i = old.top; i <= old.bottom; i++) {
    for (let j = old.left; j <= old.right; j++) if (i !== anchor.row || j !== anchor.col) ws.getCell(i, j).value = null;
  }
}

/** Reads, calculates and stores in one go (the demo, the tests); returns the results. */
export function recalculate(workbook: ExcelJS.Workbook): FormulaResult[] {
  const read = readCells(workbook);
  const hf = calculate(read);
  try {
    return storeResults(workbook, read, hf);
  } finally {
    hf.destroy();
  }
}
