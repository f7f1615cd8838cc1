/**
 * The one adapter between spreadsheet cells and the core: it coerces cell values, applies the
 * defaults of blank optional arguments, parses choice arguments, broadcasts ranges like Excel
 * array arithmetic, calls the core once per result element, and turns refusals into error
 * values. Excel, the embedded engine and the tests all go through here; only the error values
 * they need differ (ErrorFactory).
 *
 * A call runs three steps: resolve the shape (each argument read as a matrix and folded into the
 * broadcast shape), coerce the constants (series and single cells, once per call), then evaluate
 * each element (the ranged arguments read straight from their cells, then compute). A column of
 * numbers against constants takes a shorter loop, of which each function runs its own copy where
 * the host gives it one (`AdaptOptions.copyLoop`: the engine compiles them, the add-in's build
 * writes them).
 */
import { argumentMessage, InputError, NoAnswerError, NotInTableError } from '../core/errors';
import { notAnOption, optionMatcher } from '../core/guards';
import type { ArgDecl, ArgValue, BlockCompute, CellFunctionDecl, EachCompute, Scalar } from './declaration';

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
  /**
   * Gives a self-contained function a copy of its own — compiled at run time by the engine
   * (`ownCopy`), written into the bundle by the add-in's build (`prebuiltCopies`) — or returns the
   * function itself. Each adapted function then runs its own copy of the column loop, checked once
   * by `works`. Without it every function shares one loop.
   */
  readonly copyLoop?: <F extends (...args: never[]) => unknown>(f: F, label: string, works: (copy: F) => boolean) => F;
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

/** Why an element, or the whole result, has no value: a refusal of ours, or the host's own error value. */
export type Fault = { readonly kind: 'refused'; readonly message: string } | { readonly kind: 'host'; readonly value: unknown };

const refused = (name: string, reason: string): Fault => ({ kind: 'refused', message: argumentMessage(name, reason) });
const hostError = (value: unknown): Fault => ({ kind: 'host', value });

/** The cell a fault shows as: #VALUE! with the message, or the host's error value unchanged. */
function faultCell(fault: Fault, makeError: ErrorFactory): unknown {
  return fault.kind === 'refused' ? makeError('VALUE', fault.message) : fault.value;
}

/** Thrown by a step when one fault is the whole result (a series, a shape, a block argument). */
class WholeResultFault extends Error {
  constructor(readonly fault: Fault) {
    super(fault.kind === 'refused' ? fault.message : 'a host error value in an argument');
    this.name = 'WholeResultFault';
  }
}

type IsError = (value: unknown) => boolean;
const noHostErrors: IsError = () => false;

const isBlank = (v: unknown): boolean => v === null || v === undefined || v === '';

/** The fast path, the same everywhere: a finite number costs one type test and one subtraction. */
const isFiniteNumber = (v: unknown): v is number => typeof v === 'number' && v - v === 0;

// ---------------------------------------------------------------------------------------------
// Step 1: resolve the shape
// ---------------------------------------------------------------------------------------------

/** An argument as a rectangular matrix of cells: a single value is 1×1, an empty range one blank. */
function asMatrix(name: string, value: unknown): unknown[][] {
  if (!Array.isArray(value)) return [[value]];
  if (value.length === 0) return [[null]];
  if (!Array.isArray(value[0])) return [value];
  const width = (value[0] as unknown[]).length;
  for (const row of value) {
    if (!Array.isArray(row) || row.length !== width) throw new WholeResultFault(refused(name, 'is not a rectangular range'));
  }
  if (width === 0) return [[null]];
  return value as unknown[][];
}

/** The broadcast shape so far: 1×1 fits anything, n×1 fits n×m, 1×m fits n×m. */
class Shape {
  rows = 1;
  cols = 1;
  private rowsFrom = '';
  private colsFrom = '';

  /** Folds in one argument's matrix; a height or width that fits neither refuses the whole call. */
  include(name: string, m: unknown[][]): void {
    const r = m.length;
    const c = m[0]!.length;
    if (r !== 1) {
      if (this.rows !== 1 && r !== this.rows) throw mismatch(this.rowsFrom, this.rows, name, r, 'rows', 'height');
      this.rows = r;
      this.rowsFrom = name;
    }
    if (c !== 1) {
      if (this.cols !== 1 && c !== this.cols) throw mismatch(this.colsFrom, this.cols, name, c, 'columns', 'width');
      this.cols = c;
      this.colsFrom = name;
    }
  }
}

/** The one message that names two arguments: their ranges cannot be broadcast together. */
function mismatch(first: string, n: number, second: string, m: number, unit: string, extent: string): WholeResultFault {
  const message = `argument ${first} is ${n} ${unit}, ${second} is ${m} ${unit}; give ranges of the same ${extent} or a single cell`;
  return new WholeResultFault({ kind: 'refused', message });
}

// ---------------------------------------------------------------------------------------------
// Step 2: coerce — a cell for its argument, a series whole
// ---------------------------------------------------------------------------------------------

function describe(v: unknown): string {
  if (typeof v === 'string') return `"${v.length > 40 ? `${v.slice(0, 40)}…` : v}" is text`;
  if (typeof v === 'boolean') return `${v ? 'TRUE' : 'FALSE'} is a logical value`;
  if (typeof v === 'number') return `${v} is a number`;
  return 'is not a cell value';
}

/**
 * Reads one cell for one argument into buf[k]: the value compute receives, or the fault that
 * stops it. Each argument gets its reader once, when the function is adapted.
 */
type CellReader = (v: unknown, buf: ArgValue[], k: number) => Fault | undefined;

function cellReader(arg: ArgDecl, isError: IsError): CellReader {
  const typed = typedReader(arg);
  const blank = arg.optional ? undefined : refused(arg.name, 'is blank; a value is required');
  const fallback = arg.default as ArgValue;
  return (v, buf, k) => {
    if (isError(v)) return hostError(v);
    if (isBlank(v)) {
      buf[k] = fallback;
      return blank;
    }
    return typed(v, buf, k);
  };
}

/** The reader of a present, non-error cell, by the argument's type. */
function typedReader(arg: ArgDecl): CellReader {
  const name = arg.name;
  switch (arg.type) {
    case 'number':
      return (v, buf, k) => {
        if (isFiniteNumber(v)) {
          buf[k] = v;
          return undefined;
        }
        return refused(name, typeof v === 'number' ? 'must be a finite number' : `${describe(v)}; a number is needed (${arg.unit})`);
      };
    case 'text': {
      const notText = (v: unknown) => refused(name, `${describe(v)}; text such as "${String(arg.sample)}" is needed`);
      const choices = arg.choices;
      if (choices === undefined) {
        return (v, buf, k) => {
          if (typeof v !== 'string') return notText(v);
          buf[k] = v;
          return undefined;
        };
      }
      const match = optionMatcher(choices.options, choices.aliases);
      return (v, buf, k) => {
        if (typeof v !== 'string') return notText(v);
        const option = match(v);
        if (option === undefined) return refused(name, notAnOption(v, choices.options, choices.aliases));
        buf[k] = option;
        return undefined;
      };
    }
    case 'boolean':
      return (v, buf, k) => {
        if (typeof v === 'boolean') buf[k] = v;
        else if (v === 0 || v === 1) buf[k] = v === 1;
        else if (typeof v === 'string' && /^(true|false)$/i.test(v.trim())) buf[k] = v.trim().toLowerCase() === 'true';
        else return refused(name, `${describe(v)}; TRUE or FALSE is needed`);
        return undefined;
      };
  }
}

/**
 * A series arrives as any block of cells and is read row by row. Blank cells after the last value
 * are dropped (a range drawn longer than the data); a blank inside the series is refused. Any
 * fault is the whole result's.
 */
function coerceSeries(arg: ArgDecl, raw: unknown, isError: IsError): Float64Array | undefined {
  const m = asMatrix(arg.name, raw);
  const flat: unknown[] = [];
  for (const row of m) for (const v of row) flat.push(v);
  let end = flat.length;
  while (end > 0 && isBlank(flat[end - 1])) end--;
  if (end === 0) {
    if (!arg.optional) throw new WholeResultFault(refused(arg.name, 'is blank; give a range of values'));
    return arg.default === undefined ? undefined : Float64Array.of(arg.default as number);
  }
  const out = new Float64Array(end);
  for (let i = 0; i < end; i++) {
    const v = flat[i];
    if (isFiniteNumber(v)) {
      out[i] = v;
      continue;
    }
    if (isError(v)) throw new WholeResultFault(hostError(v));
    const what = isBlank(v) ? 'is blank' : typeof v === 'number' ? 'is not a finite number' : describe(v);
    throw new WholeResultFault(refused(arg.name, `value ${i + 1} ${what}; every value of the series must be a number (${arg.unit})`));
  }
  return out;
}

/**
 * A block of the shape an argument's range reader takes: read whole, once a call. A host error
 * value inside it is the whole result; the reader's refusal names the argument.
 */
function coerceRange(arg: ArgDecl, m: unknown[][], isError: IsError): ArgValue {
  for (const row of m) for (const v of row) if (isError(v)) throw new WholeResultFault(hostError(v));
  try {
    return arg.range!.read(m);
  } catch (error) {
    if (error instanceof InputError) throw new WholeResultFault({ kind: 'refused', message: error.message });
    throw error;
  }
}

/** True when an argument reads this matrix whole: it has a range reader of exactly this shape. */
const readWhole = (arg: ArgDecl, m: unknown[][]): boolean => arg.range !== undefined && m.length === arg.range.rows && m[0]!.length === arg.range.cols;

/**
 * Step 2 for an argument coerced whole, once a call — a series, or a range its reader takes as one
 * value: the value goes into buf[k] and nothing is returned. Any other argument's cells are
 * returned, for the caller to read cell by cell.
 */
function coerceWhole(arg: ArgDecl, raw: unknown, isError: IsError, buf: ArgValue[], k: number): unknown[][] | undefined {
  if (arg.series) {
    buf[k] = coerceSeries(arg, raw, isError);
    return undefined;
  }
  const m = asMatrix(arg.name, raw);
  if (!readWhole(arg, m)) return m;
  buf[k] = coerceRange(arg, m, isError);
  return undefined;
}

// ---------------------------------------------------------------------------------------------
// Step 3: evaluate — compute's refusals and results as cells
// ---------------------------------------------------------------------------------------------

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

/** Calls compute with the buffer's values without spreading an array on every element. */
function caller(compute: EachCompute, n: number): (b: ArgValue[]) => Scalar {
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

/**
 * The common case, a column of numbers against constants: each row tests its cells and calls
 * compute without the general element step; a row with any other cell is left to that step, its
 * index pushed to `others`. It reads nothing but its parameters and calls nothing but compute and
 * the two small result functions, so that each adapted function can run a copy of its own (see
 * `AdaptOptions.copyLoop`) in which compute is inlined.
 */
export function numberColumnLoop(
  compute: EachCompute,
  buf: ArgValue[],
  columns: readonly unknown[][][],
  slots: readonly number[],
  rows: number,
  others: number[],
  makeError: ErrorFactory,
  finish: typeof resultCell,
  refuse: typeof refusal,
): unknown[][] {
  const out = new Array<unknown[]>(rows);
  const v = columns.length;
  const arity = buf.length;
  // compute's arguments, in an array each copy allocates at a site of its own: where all of a
  // function's arguments are numbers V8 keeps them unboxed there, so reading a cell into it
  // allocates nothing (the caller's buffer, shared by every function, holds boxed values).
  const args: ArgValue[] = [];
  for (let k = 0; k < arity; k++) args.push(slots.includes(k) ? 0 : buf[k]);
  for (let i = 0; i < rows; i++) {
    let q = 0;
    for (; q < v; q++) {
      const cell = columns[q]![i]![0];
      if (typeof cell !== 'number' || cell - cell !== 0) break;
      args[slots[q]!] = cell;
    }
    if (q < v) {
      others.push(i);
      continue;
    }
    try {
      // Written out per arity so that the call is a plain one compute can be inlined into.
      let value: Scalar;
      if (arity === 1) value = compute(args[0]);
      else if (arity === 2) value = compute(args[0], args[1]);
      else if (arity === 3) value = compute(args[0], args[1], args[2]);
      else if (arity === 4) value = compute(args[0], args[1], args[2], args[3]);
      else if (arity === 5) value = compute(args[0], args[1], args[2], args[3], args[4]);
      else if (arity === 6) value = compute(args[0], args[1], args[2], args[3], args[4], args[5]);
      else value = compute(...args);
      // A finite number is tested here rather than in finish: a call left out of line (compute
      // inlined can use up the inlining budget) would box every result to pass it.
      if (typeof value === 'number' && value - value === 0) {
        // Its row is made empty and then filled, not written as a literal: the element is stored
        // as a raw double either way, but V8 (Node 20's) may decide that a literal whose rows all
        // outlive a long loop is to be allocated in the old generation, where such a loop has
        // taken 1.5 to 1.8 times as long (`npm run bench:rows` times both ways alone).
        const row = new Array<unknown>(1);
        row[0] = value;
        out[i] = row;
      } else out[i] = [finish(value, makeError)];
    } catch (error) {
      out[i] = [refuse(error, makeError)];
    }
  }
  return out;
}

export type NumberColumnLoop = typeof numberColumnLoop;

/**
 * The copy runs and leaves a text cell to the element step. Only that path is tried: a compute
 * called here would be a second callee at the copy's call site, which is what the copy avoids.
 */
function columnLoopWorks(loop: NumberColumnLoop): boolean {
  const unused = (): never => {
    throw new Error('not called');
  };
  const others: number[] = [];
  const out = loop(unused, [0], [[['text']]], [0], 1, others, unused, resultCell, refusal);
  return out.length === 1 && others.length === 1 && others[0] === 0;
}

/**
 * The copy where it is a function that passes `works`, else the original: a copy a build step
 * rewrote (a coverage counter, a bundler's helper) can name something it cannot see, and is
 * checked once before it is used.
 */
export function checkedCopy<F extends (...args: never[]) => unknown>(copy: unknown, works: (copy: F) => boolean, original: F): F {
  try {
    if (typeof copy === 'function' && works(copy as F)) return copy as F;
  } catch {
    // falls through to the original
  }
  return original;
}

/**
 * `copyLoop` for a host whose build wrote copies of `numberColumnLoop` into its code (the add-in,
 * which compiles nothing at run time): each adapted function takes the next copy. A copy that
 * fails its check, or one more function than there are copies, gets the shared loop.
 */
export function prebuiltCopies(copies: readonly unknown[]): NonNullable<AdaptOptions['copyLoop']> {
  let next = 0;
  return (f, _label, works) => checkedCopy(copies[next++], works, f);
}

/** A ranged argument, read straight from its cells in the element loop (no copy of the range). */
interface Varying {
  readonly k: number;
  readonly cells: unknown[][];
  readonly read: CellReader;
  readonly numeric: boolean;
  readonly rowSel: number;
  readonly colSel: number;
}

/** What steps 1 and 2 leave for the element loop. */
interface Prepared {
  readonly rows: number;
  readonly cols: number;
  readonly buf: ArgValue[];
  readonly varying: readonly Varying[];
  /** The first single-cell argument's fault: it spoils every element alike. */
  readonly constantFault: Fault | undefined;
}

/** What `adapt` fixes once for a declaration: its arguments, their cell readers and the host's errors. */
interface Adapted {
  readonly decls: readonly ArgDecl[];
  readonly readers: readonly CellReader[];
  readonly makeError: ErrorFactory;
  readonly isError: IsError;
}

/** What `adapt` fixes for an `each` function besides: its compute and its own column loop. */
interface AdaptedEach extends Adapted {
  readonly compute: EachCompute;
  readonly numberColumn: NumberColumnLoop;
}

/** Steps 1 and 2 for an `each` function, argument by argument in declaration order. */
function prepare({ decls, readers, isError }: Adapted, raw: unknown[]): Prepared {
  const n = decls.length;
  const buf = new Array<ArgValue>(n);
  const varying: Varying[] = [];
  const shape = new Shape();
  let constantFault: Fault | undefined;
  for (let k = 0; k < n; k++) {
    const d = decls[k]!;
    const m = coerceWhole(d, raw[k], isError, buf, k);
    if (m === undefined) continue;
    shape.include(d.name, m);
    const r = m.length;
    const c = m[0]!.length;
    if (r === 1 && c === 1) {
      const fault = readers[k]!(m[0]![0], buf, k);
      if (fault !== undefined) constantFault ??= fault;
    } else {
      varying.push({ k, cells: m, read: readers[k]!, numeric: d.type === 'number', rowSel: r === 1 ? 0 : 1, colSel: c === 1 ? 0 : 1 });
    }
  }
  return { rows: shape.rows, cols: shape.cols, buf, varying, constantFault };
}

function runEach(a: AdaptedEach, call: (b: ArgValue[]) => Scalar, raw: unknown[]): unknown[][] {
  const makeError = a.makeError;
  const { rows, cols, buf, varying, constantFault } = prepare(a, raw);
  const v = varying.length;
  const element = (i: number, j: number): unknown => {
    if (constantFault !== undefined) return faultCell(constantFault, makeError);
    for (let q = 0; q < v; q++) {
      const r = varying[q]!;
      const cell = r.cells[i * r.rowSel]![j * r.colSel];
      if (r.numeric && isFiniteNumber(cell)) {
        buf[r.k] = cell;
        continue;
      }
      const fault = r.read(cell, buf, r.k);
      if (fault !== undefined) return faultCell(fault, makeError);
    }
    try {
      return resultCell(call(buf), makeError);
    } catch (error) {
      return refusal(error, makeError);
    }
  };
  if (cols === 1) {
    if (constantFault === undefined && varying.every((r) => r.numeric && r.rowSel === 1)) {
      const columns = varying.map((r) => r.cells);
      const slots = varying.map((r) => r.k);
      const others: number[] = [];
      const out = a.numberColumn(a.compute, buf, columns, slots, rows, others, makeError, resultCell, refusal);
      for (const i of others) out[i] = [element(i, 0)];
      return out;
    }
    const out = new Array<unknown[]>(rows);
    for (let i = 0; i < rows; i++) out[i] = [element(i, 0)];
    return out;
  }
  const out = new Array<unknown[]>(rows);
  for (let i = 0; i < rows; i++) {
    const row = new Array<unknown>(cols);
    for (let j = 0; j < cols; j++) row[j] = element(i, j);
    out[i] = row;
  }
  return out;
}

/** A block function takes single values (or whole series); any fault is the whole result. */
function runBlock({ decls, readers, makeError, isError }: Adapted, compute: BlockCompute, raw: unknown[]): unknown[][] {
  const values = new Array<ArgValue>(decls.length);
  decls.forEach((d, k) => {
    const m = coerceWhole(d, raw[k], isError, values, k);
    if (m === undefined) return;
    if (m.length !== 1 || m[0]!.length !== 1) {
      throw new WholeResultFault(refused(d.name, `is ${m.length}×${m[0]!.length} cells; this function takes a single value here`));
    }
    const fault = readers[k]!(m[0]![0], values, k);
    if (fault !== undefined) throw new WholeResultFault(fault);
  });
  const result = compute(...values);
  return result.map((row) => row.map((v) => resultCell(v, makeError)));
}

/** Builds the spreadsheet-facing function for a declaration. */
export function adapt(decl: CellFunctionDecl, makeError: ErrorFactory, options: AdaptOptions = {}): CellFunction {
  const isError = options.isError ?? noHostErrors;
  const a: Adapted = { decls: decl.args, readers: decl.args.map((d) => cellReader(d, isError)), makeError, isError };
  let run: (raw: unknown[]) => unknown[][];
  if (decl.kind === 'each') {
    const call = caller(decl.compute, decl.args.length);
    const numberColumn = options.copyLoop?.(numberColumnLoop, `${decl.name}.column`, columnLoopWorks) ?? numberColumnLoop;
    const each: AdaptedEach = { ...a, compute: decl.compute, numberColumn };
    run = (raw) => runEach(each, call, raw);
  } else {
    const compute = decl.compute;
    run = (raw) => runBlock(a, compute, raw);
  }
  return (...raw: unknown[]): unknown[][] => {
    try {
      return run(raw);
    } catch (error) {
      if (error instanceof WholeResultFault) return [[faultCell(error.fault, makeError)]];
      return [[refusal(error, makeError)]];
    }
  };
}
