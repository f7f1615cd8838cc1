/**
 * The one declaration of a cell function. Everything else about a function — the Excel
 * registration, functions.json, the embedded-engine registration, the reference docs and the
 * fuzz tests' argument lists — is derived from this, so nothing is written twice.
 */
export type Scalar = number | string | boolean;

export type ArgType = 'number' | 'text' | 'boolean';

export interface ArgDecl {
  /** snake_case, the trade's words with the unit where it helps: `kva`, `p0_w`, `hv_v`. */
  readonly name: string;
  readonly help: string;
  /** The unit the value is read in, as DESIGN.md fixes it: kVA, V, A, W, kWh, °C, h, per unit... */
  readonly unit: string;
  readonly type: ArgType;
  /** Optional arguments may be left blank or omitted; `default` is then applied by the adapter. */
  readonly optional: boolean;
  readonly default?: Scalar;
  /** A series (a load profile, a list of orders) is taken whole rather than broadcast. */
  readonly series: boolean;
  /** A valid value, used by the docs' worked example and by the bundle tests. */
  readonly sample: Scalar | readonly number[];
}

export interface ResultDecl {
  readonly type: 'number' | 'boolean' | 'text';
  readonly unit: string;
  /** For a block result: what its columns hold, in order. */
  readonly columns?: readonly string[];
}

interface CommonDecl {
  /** Upper-case id without namespace: EFF is XFMR.EFF in Excel. */
  readonly name: string;
  readonly group: string;
  readonly help: string;
  /** The standard, clause or textbook the computation follows. */
  readonly source: string;
  readonly args: readonly ArgDecl[];
  readonly result: ResultDecl;
}

/** One result per element of the broadcast shape of the non-series arguments. */
export interface EachDecl extends CommonDecl {
  readonly kind: 'each';
  // Arguments arrive coerced and in declaration order: numbers, strings, booleans,
  // Float64Array for series, undefined for an omitted optional without a default.
  readonly compute: (...args: any[]) => Scalar;
}

/** One block of results (a curve, a series, a share per unit) from single-valued arguments. */
export interface BlockDecl extends CommonDecl {
  readonly kind: 'block';
  readonly compute: (...args: any[]) => Scalar[][];
}

export type CellFunctionDecl = EachDecl | BlockDecl;

interface ArgOptions {
  readonly default?: Scalar;
  readonly optional?: boolean;
}

function arg(type: ArgType, name: string, unit: string, help: string, sample: Scalar, options: ArgOptions = {}): ArgDecl {
  const optional = options.optional ?? options.default !== undefined;
  return { name, help, unit, type, optional, default: options.default, series: false, sample };
}

export const num = (name: string, unit: string, help: string, sample: number, options?: ArgOptions) =>
  arg('number', name, unit, help, sample, options);

export const text = (name: string, help: string, sample: string, options?: ArgOptions) =>
  arg('text', name, '', help, sample, options);

export const bool = (name: string, help: string, sample: boolean, options?: ArgOptions) =>
  arg('boolean', name, '', help, sample, options);

/** A series of numbers taken whole; a blank optional series becomes the one-value series [default]. */
export function series(name: string, unit: string, help: string, sample: readonly number[], options: ArgOptions = {}): ArgDecl {
  const optional = options.optional ?? options.default !== undefined;
  return { name, help, unit, type: 'number', optional, default: options.default, series: true, sample };
}

export function each(decl: Omit<EachDecl, 'kind'>): EachDecl {
  return { kind: 'each', ...decl };
}

export function block(decl: Omit<BlockDecl, 'kind'>): BlockDecl {
  return { kind: 'block', ...decl };
}
