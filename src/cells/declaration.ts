/**
 * The one declaration of a cell function. Everything else about a function — the Excel
 * registration, functions.json, the embedded-engine registration, the reference docs and the
 * fuzz tests' argument lists — is derived from this, so nothing is written twice.
 *
 * The argument builders (num, text, choice, bool, series) carry the type of the value the adapter
 * hands to compute, so `each({ args: [num(...), choice(...)], compute })` checks compute's
 * parameters against the declared arguments.
 */
export type Scalar = number | string | boolean;

export type ArgType = 'number' | 'text' | 'boolean';

/** What an argument's range reader makes of a whole range (a labelled block of a unit's data). */
export interface RangeValue {
  readonly kind: string;
}

/** A value compute can receive: what the adapter makes of a cell or a range for one argument. */
export type ArgValue = number | string | boolean | Float64Array | RangeValue | undefined;

/**
 * A block of cells of one fixed shape that a single-value argument also takes whole (see
 * `orRange`): `read` turns it into the value compute receives, or throws InputError naming the
 * argument.
 */
export interface RangeReader {
  readonly rows: number;
  readonly cols: number;
  readonly read: (cells: readonly (readonly unknown[])[]) => RangeValue;
}

/** The options of a `choice` argument: the spellings compute receives, and other accepted spellings. */
export interface Choices {
  readonly options: readonly string[];
  readonly aliases: Readonly<Record<string, string>>;
}

export interface ArgDecl {
  /** snake_case, the trade's words with the unit where it helps: `kva`, `p0_w`, `hv_v`. */
  readonly name: string;
  readonly help: string;
  /** The unit the value is read in: kVA, V, A, W, kWh, °C, h, per unit... */
  readonly unit: string;
  readonly type: ArgType;
  /** Optional arguments may be left blank or omitted; `default` is then applied by the adapter. */
  readonly optional: boolean;
  readonly default?: Scalar;
  /** A series (a load profile, a list of orders) is taken whole rather than broadcast. */
  readonly series: boolean;
  /** A valid value, used by the docs' worked example and by the bundle tests. */
  readonly sample: Scalar | readonly number[];
  /** A text argument with a fixed set of options, parsed by the adapter (see `choice`). */
  readonly choices?: Choices;
  /** A single-value argument that also takes a whole range, read by this (see `orRange`). */
  readonly range?: RangeReader;
}

/** An argument declaration that also records the type compute receives for it. */
export interface Arg<V extends ArgValue> extends ArgDecl {
  /** Type-level only: never set. */
  readonly __value?: V;
}

/** The values compute receives, in declaration order. */
export type ArgValues<A extends readonly ArgDecl[]> = { -readonly [K in keyof A]: A[K] extends Arg<infer V> ? V : ArgValue };

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

/**
 * compute as the adapter sees it. The adapter builds each value from the argument's declaration,
 * so the values match the parameter types `each`/`block` checked at the declaration.
 */
export type EachCompute = (...args: ArgValue[]) => Scalar;
export type BlockCompute = (...args: ArgValue[]) => Scalar[][];

/** One result per element of the broadcast shape of the non-series arguments. */
export interface EachDecl extends CommonDecl {
  readonly kind: 'each';
  readonly compute: EachCompute;
}

/** One block of results (a curve, a series, a share per unit) from single-valued arguments. */
export interface BlockDecl extends CommonDecl {
  readonly kind: 'block';
  readonly compute: BlockCompute;
}

export type CellFunctionDecl = EachDecl | BlockDecl;

/** What a group file writes for one function: compute typed from the declared arguments. */
type GroupSpec<A extends readonly ArgDecl[], R> = Omit<CommonDecl, 'args' | 'group'> & {
  readonly args: A;
  readonly compute: (...args: ArgValues<A>) => R;
};

/** A declaration with its group. */
type Spec<A extends readonly ArgDecl[], R> = GroupSpec<A, R> & { readonly group: string };

/** The option shapes of the builders: required, with a default, or blank-able without one. */
interface NoDefault {
  readonly default?: undefined;
  readonly optional?: false;
}
interface Defaulted<T extends Scalar> {
  readonly default: T;
}
interface Blankable {
  readonly default?: undefined;
  readonly optional: true;
}

function arg(type: ArgType, name: string, unit: string, help: string, sample: Scalar, options: { default?: Scalar; optional?: boolean } = {}): ArgDecl {
  const optional = options.optional ?? options.default !== undefined;
  return { name, help, unit, type, optional, default: options.default, series: false, sample };
}

export function num(name: string, unit: string, help: string, sample: number, options?: NoDefault | Defaulted<number>): Arg<number>;
export function num(name: string, unit: string, help: string, sample: number, options: Blankable): Arg<number | undefined>;
export function num(name: string, unit: string, help: string, sample: number, options?: { default?: number; optional?: boolean }): ArgDecl {
  return arg('number', name, unit, help, sample, options);
}

/** Free text the core reads as a notation of the trade (a vector group such as Dyn11). */
export function text(name: string, help: string, sample: string, options?: NoDefault | Defaulted<string>): Arg<string>;
export function text(name: string, help: string, sample: string, options: Blankable): Arg<string | undefined>;
export function text(name: string, help: string, sample: string, options?: { default?: string; optional?: boolean }): ArgDecl {
  return arg('text', name, '', help, sample, options);
}

export function bool(name: string, help: string, sample: boolean, options?: NoDefault | Defaulted<boolean>): Arg<boolean>;
export function bool(name: string, help: string, sample: boolean, options: Blankable): Arg<boolean | undefined>;
export function bool(name: string, help: string, sample: boolean, options?: { default?: boolean; optional?: boolean }): ArgDecl {
  return arg('boolean', name, '', help, sample, options);
}

/**
 * One of a fixed set of text options. The adapter matches the cell's text once per cell — case,
 * surrounding blanks and the separator (blank, _ or -) do not matter; an alias stands for its
 * option — and compute receives the option as `options` spells it. Unknown text is #VALUE!.
 */
export function choice<const T extends string>(
  name: string,
  help: string,
  spec: { readonly options: readonly T[]; readonly aliases?: Readonly<Record<string, T>>; readonly default?: T },
): Arg<T> {
  const { options, aliases = {}, default: fallback } = spec;
  return {
    name,
    help,
    unit: '',
    type: 'text',
    optional: fallback !== undefined,
    default: fallback,
    series: false,
    sample: fallback ?? options[0]!,
    choices: { options, aliases },
  };
}

/**
 * The same argument, also taking a block of exactly `rows` × `cols` cells, which `read` turns into
 * one value for every element: a range of that shape is read whole, never broadcast; any other
 * shape, and a single cell, is read as the argument always reads it. The heat-run block a unit's
 * thermal data spills, given in place of the cooling name, is read this way.
 */
export function orRange<V extends ArgValue, R extends RangeValue>(
  arg: Arg<V>,
  shape: { readonly rows: number; readonly cols: number },
  read: (cells: readonly (readonly unknown[])[]) => R,
): Arg<V | R> {
  return { ...arg, range: { rows: shape.rows, cols: shape.cols, read } };
}

/** A series of numbers taken whole; a blank optional series becomes the one-value series [default]. */
export function series(name: string, unit: string, help: string, sample: readonly number[], options?: NoDefault | Defaulted<number>): Arg<Float64Array>;
export function series(name: string, unit: string, help: string, sample: readonly number[], options: Blankable): Arg<Float64Array | undefined>;
export function series(name: string, unit: string, help: string, sample: readonly number[], options: { default?: number; optional?: boolean } = {}): ArgDecl {
  const optional = options.optional ?? options.default !== undefined;
  return { name, help, unit, type: 'number', optional, default: options.default, series: true, sample };
}

export function each<const A extends readonly ArgDecl[]>(decl: Spec<A, Scalar>): EachDecl {
  return { kind: 'each', ...decl, compute: decl.compute as unknown as EachCompute };
}

export function block<const A extends readonly ArgDecl[]>(decl: Spec<A, Scalar[][]>): BlockDecl {
  return { kind: 'block', ...decl, compute: decl.compute as unknown as BlockCompute };
}

/**
 * each and block for the functions of one group, which then need not repeat it:
 * `const { each, block } = inGroup('Efficiency')` at the top of a group file.
 */
export function inGroup(group: string) {
  return {
    each: <const A extends readonly ArgDecl[]>(decl: GroupSpec<A, Scalar>): EachDecl => each({ ...decl, group }),
    block: <const A extends readonly ArgDecl[]>(decl: GroupSpec<A, Scalar[][]>): BlockDecl => block({ ...decl, group }),
  };
}
