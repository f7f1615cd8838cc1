/**
 * Registers every cell-function declaration of the catalog as a HyperFormula function, through the
 * same adapter Excel uses: nothing here knows any one function. Each argument is declared ANY so
 * a literal, a cell or a whole range reaches the adapter, which coerces, broadcasts and refuses
 * with our messages; the adapter's error values become HyperFormula CellErrors.
 *
 * HyperFormula must know the size of a result before it computes it (a plugin's
 * `sizeOfResultArrayMethod`, called when a formula is parsed):
 *  - `each` declarations: the broadcast shape of the non-series arguments, read from the formula's
 *    syntax tree (ranges have their size there), with the adapter's rule that mismatched shapes
 *    give a single #VALUE!;
 *  - `block` declarations (a curve's rows = its `points` argument, a series as long as its input):
 *    the arguments are evaluated and the block computed once to learn its size. While a workbook is
 *    first built, referenced cells may not be computed yet; then the guess can be wrong, and the
 *    result would be cut or padded to the reserved size. A result whose size differs from the room
 *    reserved for it is therefore never written: it becomes #VALUE! and its address is reported to
 *    the calculation session, which enters the formula again once the arguments have values
 *    (see engine.ts).
 * Sources: HyperFormula guide "Custom functions" (hyperformula.handsontable.com/guide/custom-functions)
 * and the FunctionPlugin / ArraySizePredictor typings of hyperformula 3.5.0.
 */
import {
  ArraySize,
  CellError,
  EmptyValue,
  ErrorType,
  FunctionArgumentType,
  FunctionPlugin,
  HyperFormula,
  SimpleRangeValue,
  type FunctionMetadata,
  type FunctionPluginDefinition,
  type ImplementedFunctions,
  type SimpleCellAddress,
} from 'hyperformula';
import { type AdaptOptions, adapt, type CellFunction, type ErrorKind } from '../cells/adapter';
import { catalog, formulaName } from '../cells/catalog';
import type { CellFunctionDecl } from '../cells/declaration';
import { ownCopy } from './compile';
import { formulaVertex, type PluginInternals, type State } from './internals';

const ERROR_TYPE: Record<ErrorKind, ErrorType> = { VALUE: ErrorType.VALUE, NUM: ErrorType.NUM, NA: ErrorType.NA };

export const hyperFormulaError = (kind: ErrorKind, message: string): CellError => new CellError(ERROR_TYPE[kind], message);

/** How the engine adapts a declaration: HyperFormula's errors pass through, each function has its own column loop. */
export const engineAdaptOptions: AdaptOptions = { isError: (v) => v instanceof CellError, copyLoop: ownCopy };

/**
 * What one calculation wants to hear from the functions while HyperFormula runs them. HyperFormula
 * computes synchronously, so the session active during a call to it is the one the functions see.
 */
export interface CalcSession {
  /** A formula whose result did not fit the room reserved when it was parsed. */
  resized(address: SimpleCellAddress): void;
  /** Called once per evaluation of one of our functions (progress). */
  called?(): void;
}

let session: CalcSession | undefined;

/** Runs `work` (which calls HyperFormula) with `s` listening to our functions. */
export function withSession<T>(s: CalcSession, work: () => T): T {
  const outer = session;
  session = s;
  try {
    return work();
  } finally {
    session = outer;
  }
}

/** A cell value as the adapter expects it: null for blank, plain numbers, CellError kept as is. */
function toAdapterScalar(v: unknown): unknown {
  if (v === EmptyValue || v === undefined) return null;
  if (typeof v === 'object' && v !== null && !(v instanceof CellError) && 'val' in v) {
    // A number with a display subtype (percent, date, currency) from a range.
    return (v as { val: unknown }).val;
  }
  return v;
}

/** True when every cell of a range is already a plain number, as a fleet's columns are. */
function allPlainNumbers(data: readonly (readonly unknown[])[]): boolean {
  for (const row of data) for (const v of row) if (typeof v !== 'number') return false;
  return true;
}

function toAdapterArgument(v: unknown): unknown {
  if (v instanceof SimpleRangeValue) {
    // The adapter only reads its arguments, so a range of plain numbers is handed over as it is:
    // copying a 100,000-row column cell by cell costs more than the computation.
    const data = v.data as unknown[][];
    return allPlainNumbers(data) ? data : data.map((row) => row.map(toAdapterScalar));
  }
  return toAdapterScalar(v);
}

type Ast = { args: unknown[] };

/** The formula itself under ARRAYFORMULA(…) and parentheses, which do not change a result's size. */
function unwrapped(ast: unknown): unknown {
  let node = ast as { type?: string; procedureName?: string; args?: unknown[]; expression?: unknown } | undefined;
  for (;;) {
    if (node?.type === 'PARENTHESIS') node = node.expression as typeof node;
    else if (node?.type === 'FUNCTION_CALL' && node.procedureName === 'ARRAYFORMULA' && node.args?.length === 1) node = node.args[0] as typeof node;
    else return node;
  }
}

/** The room HyperFormula reserved for the formula whose root is `ast`, or undefined when nested. */
function reservedSize(plugin: PluginInternals, ast: unknown, address: SimpleCellAddress): { rows: number; cols: number } | undefined {
  const vertex = formulaVertex(plugin, address);
  if (vertex === undefined || unwrapped(vertex.formula) !== ast) return undefined;
  return { rows: vertex.rows, cols: vertex.cols };
}

function toHyperFormula(result: unknown[][]): unknown {
  const rows = result.length;
  const cols = result[0]?.length ?? 0;
  if (rows === 1 && cols === 1) return result[0]![0];
  return SimpleRangeValue.onlyValues(result as never);
}

/** Array arithmetic inside our arguments (B2:B15/1000), as the evaluation itself has it. */
const withArrays = (state: State): State => ({ formulaAddress: state.formulaAddress, arraysFlag: true, formulaVertex: state.formulaVertex });

/** Broadcast shape of the non-series arguments from the syntax tree; 1×1 where the adapter refuses. */
function eachSize(plugin: PluginInternals, decl: CellFunctionDecl, ast: Ast, state: State): ArraySize {
  let rows = 1;
  let cols = 1;
  const s = withArrays(state);
  if (argumentCountError(decl, ast.args.length)) return ArraySize.scalar(); // refused: wrong number of arguments
  for (let k = 0; k < ast.args.length; k++) {
    const a = decl.args[k]!;
    if (a.series) continue;
    const size = plugin.arraySizeForAst(ast.args[k], s);
    // A block its argument reads whole (orRange) is one value, not a range to broadcast.
    if (a.range !== undefined && size.height === a.range.rows && size.width === a.range.cols) continue;
    if (size.height !== 1) {
      if (rows !== 1 && size.height !== rows) return ArraySize.scalar();
      rows = size.height;
    }
    if (size.width !== 1) {
      if (cols !== 1 && size.width !== cols) return ArraySize.scalar();
      cols = size.width;
    }
  }
  return new ArraySize(cols, rows);
}

/** A block's size is the size of the block itself: compute it from the arguments as they stand. */
function blockSize(plugin: PluginInternals, fn: CellFunction, ast: Ast, state: State): ArraySize {
  try {
    const s = withArrays(state);
    const values = ast.args.map((a) => {
      const v = plugin.evaluateAst(a, s);
      if (v instanceof CellError) throw v; // HyperFormula answers with the error alone
      return toAdapterArgument(v);
    });
    const result = fn(...values);
    return new ArraySize(result[0]?.length ?? 1, result.length);
  } catch {
    // Arguments not computed yet (the workbook is still being built): guess one cell; the
    // evaluation notices a different size and the session enters the formula again.
    return ArraySize.scalar();
  }
}

const sizeMismatch = (rows: number, cols: number, reserved: { rows: number; cols: number }): CellError =>
  new CellError(
    ErrorType.VALUE,
    `the result is ${rows}×${cols} cells but ${reserved.rows}×${reserved.cols} were reserved when the formula was entered; enter the formula again`,
  );

/** `XFMR.EFF(kva, p0_w, pk_w, [load], [pf])`: the call as its declaration has it, optional arguments in brackets. */
export function signature(decl: CellFunctionDecl): string {
  return `${formulaName(decl)}(${decl.args.map((a) => (a.optional ? `[${a.name}]` : a.name)).join(', ')})`;
}

/** One #VALUE! for a call with too few or too many arguments, naming the function's signature. */
function argumentCountError(decl: CellFunctionDecl, given: number): CellError | undefined {
  const required = decl.args.filter((a) => !a.optional).length;
  const most = decl.args.length;
  if (given >= required && given <= most) return undefined;
  const takes = required === most ? `${most}` : `${required} to ${most}`;
  return new CellError(ErrorType.VALUE, `${formulaName(decl)} takes ${takes} argument${most === 1 ? '' : 's'}, ${signature(decl)}; ${given} ${given === 1 ? 'was' : 'were'} given`);
}

function evaluate(plugin: PluginInternals, decl: CellFunctionDecl, fn: CellFunction, metadata: FunctionMetadata, ast: Ast, state: State): unknown {
  session?.called?.();
  const wrongCount = argumentCountError(decl, ast.args.length);
  if (wrongCount) return wrongCount;
  return plugin.runFunction(ast.args, state, metadata, (...values: unknown[]) => {
    const result = fn(...values.map(toAdapterArgument));
    const rows = result.length;
    const cols = result[0]?.length ?? 0;
    if (rows === 1 && cols === 1 && result[0]![0] instanceof CellError) {
      return result[0]![0]; // one error for the whole call fills whatever room there is
    }
    const reserved = reservedSize(plugin, ast, state.formulaAddress);
    if (reserved !== undefined && (reserved.rows !== rows || reserved.cols !== cols)) {
      session?.resized(state.formulaAddress);
      return sizeMismatch(rows, cols, reserved);
    }
    return toHyperFormula(result);
  });
}

function methodName(decl: CellFunctionDecl): string {
  return `xfmr_${decl.name.replace(/\W/g, '_')}`;
}

/** Builds the plugin class for a list of declarations (the catalog, or a test's own list). */
export function buildPlugin(decls: readonly CellFunctionDecl[]): FunctionPluginDefinition {
  class FluxbookPlugin extends FunctionPlugin {}
  const implemented: ImplementedFunctions = {};
  const proto = FluxbookPlugin.prototype as unknown as Record<string, unknown>;
  for (const decl of decls) {
    const method = methodName(decl);
    const metadata: FunctionMetadata = {
      method,
      sizeOfResultArrayMethod: `${method}_size`,
      // Every argument may be left out, and more may be given, as far as HyperFormula is concerned:
      // the count is checked against the declaration (argumentCountError), and the adapter applies
      // the defaults and names a blank required argument in its message.
      parameters: [...decl.args.map(() => ({ argumentType: FunctionArgumentType.ANY, optionalArg: true })), { argumentType: FunctionArgumentType.ANY, optionalArg: true }],
      repeatLastArgs: 1,
      vectorizationForbidden: true, // we broadcast ourselves, with our messages
      enableArrayArithmeticForArguments: true,
    };
    implemented[formulaName(decl)] = metadata;
    const fn = adapt(decl, hyperFormulaError, engineAdaptOptions);
    proto[method] = function (this: PluginInternals, ast: Ast, state: State) {
      return evaluate(this, decl, fn, metadata, ast, state);
    };
    proto[`${method}_size`] = function (this: PluginInternals, ast: Ast, state: State) {
      if (decl.kind === 'each') return eachSize(this, decl, ast, state);
      return argumentCountError(decl, ast.args.length) ? ArraySize.scalar() : blockSize(this, fn, ast, state);
    };
  }
  (FluxbookPlugin as unknown as { implementedFunctions: ImplementedFunctions }).implementedFunctions = implemented;
  return FluxbookPlugin as unknown as FunctionPluginDefinition;
}

/** Names in formulas are the same in every language HyperFormula has registered. */
function translations(decls: readonly CellFunctionDecl[]): Record<string, Record<string, string>> {
  const names = Object.fromEntries(decls.map((d) => [formulaName(d), formulaName(d)]));
  return Object.fromEntries(HyperFormula.getRegisteredLanguagesCodes().map((code) => [code, names]));
}

let registered = false;

/** Registers the catalog with HyperFormula once per process. */
export function registerCatalog(): void {
  if (registered) return;
  HyperFormula.registerFunctionPlugin(buildPlugin(catalog), translations(catalog));
  registered = true;
}
