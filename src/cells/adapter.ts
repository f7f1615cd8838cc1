/**
 * The one adapter between spreadsheet cells and the core: it coerces cell values, applies the
 * defaults of blank optional arguments, broadcasts ranges like Excel array arithmetic, calls the
 * core once per result element, and turns refusals into error values. Excel, the embedded engine
 * and the tests all go through here; only the error values they need differ (ErrorFactory).
 */
import { InputError, NoAnswerError, NotInTableError } from '../core/errors';
import type { ArgDecl, CellFunctionDecl, Scalar } from './declaration';

/** The Excel error an element gets: #VALUE! (bad input), #NUM! (no numeric answer), #N/A (no table row). */
export type ErrorKind = 'VALUE' | 'NUM' | 'NA';
export type ErrorFactory = (kind: ErrorKind, message: string) => unknown;
export type CellFunction = (...args: unknown[]) => unknown[][];

export interface AdaptOptions {
  /**
   * Recognises an error value of the host spreadsheet inside an argument (a #DIV/0! three rows up
   * a range). Such a value is passed through unchanged to the result elements that read it — the
   * whole result for a series or a block argument — instead of being refused as a wrong type.
   * Without it an error value is refused like any other non-number, with a #VALUE! message.
   */
  readonly isError?: (value: unknown) => boolean;
}

/** A stand-in error value for tests and tools that have no spreadsheet of their own. */
export class CellError {
  constructor(
    readonly kind: ErrorKind,
    readonly message: string,
  ) {}
  get code(): string {
    return this.kind === 'VALUE' ? '#VALUE!' : this.kind === 'NUM' ? '#NUM!' : '#N/A';
  }
}
export const plainErrors: ErrorFactory = (kind, message) => new CellError(kind, message);

/** An argument coerced once, before broadcasting: its shape, values and per-element faults. */
interface Coerced {
  readonly rows: number;
  readonly cols: number;
  readonly values: unknown[];
  /** Per-element faults — a refusal message or a host error passed through — or null when every element is usable. */
  readonly faults: unknown[] | null;
}

class WholeArgumentError extends Error {}

/** A host error value met in a series or block argument: it becomes the whole result. */
class PassedError {
  constructor(readonly value: unknown) {}
}

const noHostErrors = (): boolean => false;

const isBlank = (v: unknown): boolean => v === null || v === undefined || v === '';

function asMatrix(name: string, value: unknown): unknown[][] {
  if (!Array.isArray(value)) return [[value]];
  if (value.length === 0) return [[null]];
  if (!Array.isArray(value[0])) return [value];
  const width = (value[0] as unknown[]).length;
  for (const row of value) {
    if (!Array.isArray(row) || row.length !== width) {
      throw new WholeArgumentError(`argument ${name}: is not a rectangular range`);
    }
  }
  if (width === 0) return [[null]];
  return value as unknown[][];
}

function describe(v: unknown): string {
  if (typeof v === 'string') return `"${v.length > 40 ? `${v.slice(0, 40)}…` : v}" is text`;
  if (typeof v === 'boolean') return `${v ? 'TRUE' : 'FALSE'} is a logical value`;
  if (typeof v === 'number') return `${v} is a number`;
  return 'is not a cell value';
}

/** Coerces one cell for one argument: the value the core receives, or a refusal message. */
function coerceCell(arg: ArgDecl, v: unknown): { value?: unknown; fault?: string } {
  if (isBlank(v)) {
    if (!arg.optional) return { fault: `argument ${arg.name}: is blank; a value is required` };
    return { value: arg.default };
  }
  switch (arg.type) {
    case 'number':
      if (typeof v === 'number') {
        return Number.isFinite(v) ? { value: v } : { fault: `argument ${arg.name}: must be a finite number` };
      }
      return { fault: `argument ${arg.name}: ${describe(v)}; a number is needed (${arg.unit})` };
    case 'text':
      if (typeof v === 'string') return { value: v };
      return { fault: `argument ${arg.name}: ${describe(v)}; text such as "${String(arg.sample)}" is needed` };
    case 'boolean':
      if (typeof v === 'boolean') return { value: v };
      if (v === 0 || v === 1) return { value: v === 1 };
      if (typeof v === 'string' && /^(true|false)$/i.test(v.trim())) return { value: v.trim().toLowerCase() === 'true' };
      return { fault: `argument ${arg.name}: ${describe(v)}; TRUE or FALSE is needed` };
  }
}

function coerceBroadcast(arg: ArgDecl, raw: unknown, isError: (v: unknown) => boolean): Coerced {
  const m = asMatrix(arg.name, raw);
  const rows = m.length;
  const cols = m[0]!.length;
  const values = new Array<unknown>(rows * cols);
  let faults: unknown[] | null = null;
  let k = 0;
  for (let i = 0; i < rows; i++) {
    const row = m[i]!;
    for (let j = 0; j < cols; j++, k++) {
      const v = row[j];
      // The common case, a finite number for a number argument, costs one test.
      if (arg.type === 'number' && typeof v === 'number' && Number.isFinite(v)) {
        values[k] = v;
        continue;
      }
      const c: { value?: unknown; fault?: unknown } = isError(v) ? { fault: v } : coerceCell(arg, v);
      if (c.fault !== undefined) {
        faults ??= new Array<unknown>(rows * cols);
        faults[k] = c.fault;
      } else {
        values[k] = c.value;
      }
    }
  }
  return { rows, cols, values, faults };
}

/**
 * A series arrives as any block of cells and is read row by row. Blank cells after the last value
 * are dropped (a range drawn longer than the data); a blank inside the series is refused.
 */
function coerceSeries(arg: ArgDecl, raw: unknown, isError: (v: unknown) => boolean): Float64Array | undefined {
  const m = asMatrix(arg.name, raw);
  const flat: unknown[] = [];
  for (const row of m) for (const v of row) flat.push(v);
  let end = flat.length;
  while (end > 0 && isBlank(flat[end - 1])) end--;
  if (end === 0) {
    if (!arg.optional) throw new WholeArgumentError(`argument ${arg.name}: is blank; give a range of values`);
    return arg.default === undefined ? undefined : Float64Array.of(arg.default as number);
  }
  const out = new Float64Array(end);
  for (let i = 0; i < end; i++) {
    const v = flat[i];
    if (typeof v === 'number' && Number.isFinite(v)) {
      out[i] = v;
      continue;
    }
    if (isError(v)) throw new PassedError(v);
    const what = isBlank(v) ? 'is blank' : typeof v === 'number' ? 'is not a finite number' : describe(v);
    throw new WholeArgumentError(`argument ${arg.name}: value ${i + 1} ${what}; every value of the series must be a number (${arg.unit})`);
  }
  return out;
}

function refusal(error: unknown, makeError: ErrorFactory): unknown {
  if (error instanceof InputError) return makeError('VALUE', error.message);
  if (error instanceof NotInTableError) return makeError('NA', error.message);
  if (error instanceof NoAnswerError) return makeError('NUM', error.reason);
  throw error; // a programmer mistake: let the tests see it
}

function resultCell(value: Scalar, makeError: ErrorFactory): unknown {
  if (typeof value === 'number' && !Number.isFinite(value)) return makeError('NUM', 'the result is not a finite number');
  return value;
}

/** Builds the spreadsheet-facing function for a declaration. */
export function adapt(decl: CellFunctionDecl, makeError: ErrorFactory, options: AdaptOptions = {}): CellFunction {
  const args = decl.args;
  const isError = options.isError ?? noHostErrors;
  return (...raw: unknown[]): unknown[][] => {
    try {
      return decl.kind === 'each'
        ? runEach(decl.compute, args, raw, makeError, isError)
        : runBlock(decl.compute, args, raw, makeError, isError);
    } catch (error) {
      if (error instanceof WholeArgumentError) return [[makeError('VALUE', error.message)]];
      if (error instanceof PassedError) return [[error.value]];
      return [[refusal(error, makeError)]];
    }
  };
}

/** Calls compute with the buffer's values without spreading an array on every element. */
function caller(compute: (...a: any[]) => Scalar, n: number): (b: unknown[]) => Scalar {
  switch (n) {
    case 1:
      return (b) => compute(b[0]);
    case 2:
      return (b) => compute(b[0], b[1]);
    case 3:
      return (b) => compute(b[0], b[1], b[2]);
    case 4:
      return (b) => compute(b[0], b[1], b[2], b[3]);
    case 5:
      return (b) => compute(b[0], b[1], b[2], b[3], b[4]);
    case 6:
      return (b) => compute(b[0], b[1], b[2], b[3], b[4], b[5]);
    default:
      return (b) => compute(...b);
  }
}

/** A ranged argument, read straight from its cells in the element loop (no copy of the range). */
interface Varying {
  readonly k: number;
  readonly decl: ArgDecl;
  readonly cells: unknown[][];
  readonly numeric: boolean;
  readonly rowSel: number;
  readonly colSel: number;
}

function runEach(
  compute: (...a: any[]) => Scalar,
  decls: readonly ArgDecl[],
  raw: unknown[],
  makeError: ErrorFactory,
  isError: (v: unknown) => boolean,
): unknown[][] {
  const n = decls.length;
  const buf = new Array<unknown>(n);
  const varying: Varying[] = [];
  let rows = 1;
  let cols = 1;
  let rowsFrom = '';
  let colsFrom = '';
  // A single-cell argument's fault spoils every element alike; the first one found is reported.
  // A message becomes #VALUE!; a host error value is passed through as it is.
  let constantFault: unknown;
  for (let k = 0; k < n; k++) {
    const d = decls[k]!;
    if (d.series) {
      buf[k] = coerceSeries(d, raw[k], isError);
      continue;
    }
    const m = asMatrix(d.name, raw[k]);
    const r = m.length;
    const c = m[0]!.length;
    if (r !== 1) {
      if (rows !== 1 && r !== rows) throw new WholeArgumentError(`argument ${rowsFrom} is ${rows} rows, ${d.name} is ${r} rows; give ranges of the same height or a single cell`);
      rows = r;
      rowsFrom = d.name;
    }
    if (c !== 1) {
      if (cols !== 1 && c !== cols) throw new WholeArgumentError(`argument ${colsFrom} is ${cols} columns, ${d.name} is ${c} columns; give ranges of the same width or a single cell`);
      cols = c;
      colsFrom = d.name;
    }
    if (r === 1 && c === 1) {
      // Coerced once and held in the buffer for every element.
      const cell = m[0]![0];
      const one: { value?: unknown; fault?: unknown } = isError(cell) ? { fault: cell } : coerceCell(d, cell);
      buf[k] = one.value;
      if (one.fault !== undefined && constantFault === undefined) constantFault = one.fault;
    } else {
      varying.push({ k, decl: d, cells: m, numeric: d.type === 'number', rowSel: r === 1 ? 0 : 1, colSel: c === 1 ? 0 : 1 });
    }
  }
  const call = caller(compute, n);
  const v = varying.length;
  const element = (i: number, j: number): unknown => {
    if (constantFault !== undefined) return typeof constantFault === 'string' ? makeError('VALUE', constantFault) : constantFault;
    for (let q = 0; q < v; q++) {
      const a = varying[q]!;
      const cell = a.cells[i * a.rowSel]![j * a.colSel];
      // The common case, a finite number for a number argument, costs one test.
      if (a.numeric && typeof cell === 'number' && cell - cell === 0) {
        buf[a.k] = cell;
        continue;
      }
      if (isError(cell)) return cell;
      const c = coerceCell(a.decl, cell);
      if (c.fault !== undefined) return makeError('VALUE', c.fault);
      buf[a.k] = c.value;
    }
    try {
      return resultCell(call(buf), makeError);
    } catch (error) {
      return refusal(error, makeError);
    }
  };
  const out = new Array<unknown[]>(rows);
  if (cols === 1) {
    for (let i = 0; i < rows; i++) out[i] = [element(i, 0)];
    return out;
  }
  for (let i = 0; i < rows; i++) {
    const row = new Array<unknown>(cols);
    for (let j = 0; j < cols; j++) row[j] = element(i, j);
    out[i] = row;
  }
  return out;
}

function runBlock(
  compute: (...a: any[]) => Scalar[][],
  decls: readonly ArgDecl[],
  raw: unknown[],
  makeError: ErrorFactory,
  isError: (v: unknown) => boolean,
): unknown[][] {
  const values = decls.map((d, k) => {
    if (d.series) return coerceSeries(d, raw[k], isError);
    const c = coerceBroadcast(d, raw[k], isError);
    if (c.rows !== 1 || c.cols !== 1) {
      throw new WholeArgumentError(`argument ${d.name}: is ${c.rows}×${c.cols} cells; this function takes a single value here`);
    }
    if (c.faults !== null) {
      const fault = c.faults[0];
      throw typeof fault === 'string' ? new WholeArgumentError(fault) : new PassedError(fault);
    }
    return c.values[0];
  });
  const result = compute(...values);
  return result.map((row) => row.map((v) => resultCell(v, makeError)));
}
