/**
 * The engine's one call: .xlsx bytes in, recalculated .xlsx bytes and every formula's result out.
 *
 *  1. The package is checked (package.ts) and read (read.ts): values, formulas, names.
 *  2. Columns that repeat one XFMR call row by row over plain values are computed as one range call
 *     through the adapter (columns.ts); everything else goes through HyperFormula, which then sees
 *     those results as values. Their inputs are plain values, never formulas, so no order is lost.
 *  3. A new package is written (patch.ts): every part copied as it was stored, except the
 *     worksheets whose formula cells got new values, in which only those `<c>` elements (and the
 *     cells of spilled results) are replaced.
 */
import { DetailedCellError, HyperFormula, type HyperFormula as HF, type RawCellContent, type SerializedNamedExpression } from 'hyperformula';
import { computeColumns } from './columns';
import { createEngine, ENGINE_CONFIG } from './engine';
import { arraySize } from './internals';
import { toEngineFormula } from './names';
import { checkPackage, WorkbookError, type PackageLimits } from './package';
import { patchPackage } from './patch';
import { a1, readPackage, type FormulaCell, type PackageRead } from './read';
import { openZip } from './zip';

export { WorkbookError } from './package';

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

export type Stage = 'reading' | 'calculating' | 'writing';

export interface CalculateOptions {
  /** Write plain values: every formula removed, its result kept. */
  readonly values?: boolean;
  readonly limits?: PackageLimits;
  /** How far the work is: `done` of `total` in the stage named. */
  readonly onProgress?: (stage: Stage, done: number, total: number) => void;
}

export interface Calculated {
  /** The new package. */
  readonly bytes: Buffer;
  readonly results: FormulaResult[];
  readonly formulas: number;
  /** Formula cells that call an XFMR function. */
  readonly ours: number;
  /** Error values among all results, cells of spills included. */
  readonly errors: number;
  /** Of which in the results of formulas that call an XFMR function. */
  readonly oursErrors: number;
  /** Error values by code. */
  readonly errorCodes: Record<string, number>;
  /** Parts of the package that were rewritten; every other part is copied as it was stored. */
  readonly changedParts: string[];
}

const ZIP_MAGIC = Buffer.from([0x50, 0x4b, 0x03, 0x04]);
const OLE_MAGIC = Buffer.from([0xd0, 0xcf, 0x11, 0xe0]); // .xls, and .xlsx protected by a password

function checkMagic(bytes: Buffer): void {
  if (bytes.length === 0) throw new WorkbookError('the file is empty');
  if (bytes.subarray(0, 4).equals(OLE_MAGIC)) {
    throw new WorkbookError('this is an old .xls workbook or a password-protected one; save it as .xlsx without a password');
  }
  if (!bytes.subarray(0, 4).equals(ZIP_MAGIC)) {
    throw new WorkbookError('this is not an .xlsx workbook (an .xlsx file is a ZIP package; is it a CSV or text file renamed .xlsx?)');
  }
}

/** HyperFormula gives a cycle no message: say what it is and where it runs through. */
function cycleMessage(v: DetailedCellError): string {
  const through = v.address ? ` through ${v.address}` : '';
  return `circular reference${through}: a formula in the cycle needs its own result, so it has no value; break the cycle`;
}

const OTHER_ADDIN = /^Function name XLDUDF\.(\S+) not recognized/;

export function jsonValue(v: unknown): JsonValue {
  if (v instanceof DetailedCellError) {
    if (v.value === '#CYCLE!' && !v.message) return { error: v.value, message: cycleMessage(v) };
    const other = OTHER_ADDIN.exec(v.message ?? '');
    if (other) {
      return { error: '#NAME?', message: `_xldudf_${other[1]} is a function of another add-in; Fluxbook computes only the XFMR functions, so this cell has no value here` };
    }
    return v.message ? { error: v.value, message: v.message } : { error: v.value };
  }
  if (v === undefined) return null;
  return v as JsonValue;
}

const isError = (v: JsonValue): v is { error: string; message?: string } => v !== null && typeof v === 'object';

/** A plain value as the engine reads it, for a result another formula reads. */
function engineInput(v: JsonValue): RawCellContent {
  if (isError(v)) return v.error;
  if (typeof v === 'string') return `'${v}`;
  return v;
}

/** Workbook and sheet names HyperFormula accepts; a name it refuses is left out (its users get #NAME?). */
function namedExpressions(read: PackageRead): SerializedNamedExpression[] {
  const names: SerializedNamedExpression[] = [];
  for (const n of read.names) {
    if (n.name.startsWith('_xlnm.') || !/^[A-Za-z_\\][A-Za-z0-9_.]*$/.test(n.name) || n.formula.trim() === '') continue;
    if (/#REF!/.test(n.formula)) continue;
    const expression = `=${toEngineFormula(n.formula)}`;
    names.push(n.sheet !== undefined && n.sheet < read.sheets.length ? { name: n.name, expression, scope: n.sheet } : { name: n.name, expression });
  }
  return names;
}

/** Keeps the names HyperFormula can build on their own (tried one by one on empty sheets of the same names). */
function acceptedNames(read: PackageRead, names: SerializedNamedExpression[]): SerializedNamedExpression[] {
  const empty = Object.fromEntries(read.sheets.map((s) => [s.name, [] as RawCellContent[][]]));
  return names.filter((n) => {
    try {
      HyperFormula.buildFromSheets(empty, ENGINE_CONFIG, [n]).destroy();
      return true;
    } catch {
      return false;
    }
  });
}

function buildEngine(sheets: Record<string, RawCellContent[][]>, read: PackageRead, onCall: () => void): HF {
  const names = namedExpressions(read);
  try {
    return createEngine(sheets, { onCall, namedExpressions: names });
  } catch (error) {
    if (names.length === 0) throw error;
    return createEngine(sheets, { onCall, namedExpressions: acceptedNames(read, names) });
  }
}

/** The result of one formula cell: its value, and the values of its spill when larger than one cell. */
export interface CellResult {
  readonly cell: FormulaCell;
  readonly value: JsonValue;
  readonly spill?: JsonValue[][];
}

function calculateCells(read: PackageRead, onProgress: (done: number, total: number) => void): CellResult[] {
  const all: FormulaCell[] = [];
  for (const s of read.sheets) for (const f of s.formulas) all.push(f);
  let ours = 0;
  for (const f of all) if (f.ours) ours++;
  let done = 0;
  const total = Math.max(1, ours);
  const tick = (n = 1) => {
    done += n;
    if (done <= total) onProgress(done, total);
  };
  const columns = computeColumns(read, tick);
  const results: CellResult[] = new Array(all.length);
  const rest: number[] = [];
  for (let i = 0; i < all.length; i++) {
    const c = columns[i];
    if (c !== undefined) results[i] = { cell: all[i]!, value: c };
    else rest.push(i);
  }
  if (rest.length > 0) {
    const sheets: Record<string, RawCellContent[][]> = {};
    let place = 0;
    for (const s of read.sheets) {
      const rows = s.rows.map((r) => (r ? [...r] : []));
      for (const f of s.formulas) {
        const c = columns[place++];
        (rows[f.row - 1] ??= [])[f.col - 1] = c !== undefined ? engineInput(c) : f.kind === 'array' ? `=ARRAYFORMULA(${f.engine})` : `=${f.engine}`;
      }
      for (let i = 0; i < rows.length; i++) rows[i] ??= [];
      sheets[s.name] = rows;
    }
    const hf = buildEngine(sheets, read, () => tick());
    try {
      for (const i of rest) {
        const f = all[i]!;
        const address = { sheet: f.sheet, row: f.row - 1, col: f.col - 1 };
        const value = jsonValue(hf.getCellValue(address));
        const size = arraySize(hf, address);
        if (size.rows > 1 || size.cols > 1) {
          const end = { ...address, row: address.row + size.rows - 1, col: address.col + size.cols - 1 };
          const spill = (hf.getRangeValues({ start: address, end }) as unknown[][]).map((r) => r.map(jsonValue));
          results[i] = { cell: f, value, spill };
        } else {
          results[i] = { cell: f, value };
        }
      }
    } finally {
      hf.destroy();
    }
  }
  onProgress(total, total);
  return results;
}

/** Reads, recalculates and writes a workbook: the one way through the engine. */
export async function calculateWorkbook(bytes: Buffer, options: CalculateOptions = {}): Promise<Calculated> {
  const progress = options.onProgress ?? (() => {});
  checkMagic(bytes);
  const zip = await openZip(bytes);
  try {
    checkPackage(zip.entries, options.limits);
    const read = await readPackage(zip, (done, total) => progress('reading', done, total));
    progress('calculating', 0, 1);
    await new Promise((r) => setImmediate(r));
    const cells = calculateCells(read, (done, total) => progress('calculating', done, total));
    for (const s of read.sheets) s.rows.length = 0; // the values were the engine's input only
    await new Promise((r) => setImmediate(r));
    const written = await patchPackage(zip, read, cells, { values: Boolean(options.values), onProgress: (done, total) => progress('writing', done, total) });
    let results: FormulaResult[] | undefined;
    return {
      bytes: written.bytes,
      changedParts: written.changedParts,
      ...counts(cells),
      // Built when asked for: 400,000 result objects cost more than the summary needs.
      get results() {
        return (results ??= resultList(read, cells));
      },
    };
  } finally {
    zip.close();
  }
}

function counts(cells: CellResult[]): Omit<Calculated, 'bytes' | 'changedParts' | 'results'> {
  const errorCodes: Record<string, number> = {};
  let errors = 0;
  let oursErrors = 0;
  let ours = 0;
  const count = (v: JsonValue, f: FormulaCell) => {
    if (!isError(v)) return;
    errors++;
    if (f.ours) oursErrors++;
    errorCodes[v.error] = (errorCodes[v.error] ?? 0) + 1;
  };
  for (const c of cells) {
    if (c.cell.ours) ours++;
    if (c.spill) for (const row of c.spill) for (const v of row) count(v, c.cell);
    else count(c.value, c.cell);
  }
  return { formulas: cells.length, ours, errors, oursErrors, errorCodes };
}

function resultList(read: PackageRead, cells: CellResult[]): FormulaResult[] {
  return cells.map((c) => {
    const f = c.cell;
    const result: FormulaResult = { sheet: read.sheets[f.sheet]!.name, cell: a1(f.row, f.col), formula: `=${f.engine}`, value: c.value };
    if (c.spill) result.spill = { ref: `${a1(f.row, f.col)}:${a1(f.row + c.spill.length - 1, f.col + (c.spill[0]?.length ?? 1) - 1)}`, values: c.spill };
    return result;
  });
}
