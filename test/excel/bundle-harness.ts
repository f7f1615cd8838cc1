/**
 * Shared by the bundle tests (node:vm and Chromium): the CustomFunctions stand-in, the calls built
 * from each declaration's samples, what the adapter gives for them in Node, and the checks every
 * runtime passes (answersAsTheAdapter).
 */
import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { isDeepStrictEqual } from 'node:util';
import { expect, it } from 'vitest';
import { adapt, CellError, plainErrors } from '../../src/cells/adapter';
import { catalog } from '../../src/cells/catalog';
import type { ArgDecl, CellFunctionDecl } from '../../src/cells/declaration';

export const distDir = join(resolve(__dirname, '../..'), 'dist');

/** The built file's text; fails with the way out when the build has not run. */
export function readDist(file: 'functions.js' | 'functions.json'): string {
  const path = join(distDir, file);
  if (!existsSync(path)) throw new Error(`dist/${file} is missing: run \`npm run build\` first (npm test builds before it runs vitest)`);
  return readFileSync(path, 'utf8');
}

export function builtFunctionIds(): string[] {
  return (JSON.parse(readDist('functions.json')) as { functions: { id: string }[] }).functions.map((f) => f.id);
}

/**
 * The part of Office's custom-functions runtime the bundle touches — associate, Error, ErrorCode
 * (values as @types/custom-functions-runtime gives them) — plus a test hook that runs a batch of
 * calls and returns them as JSON: errors become {error, message} so both contexts answer alike.
 * Plain ES2015 so it runs unchanged in a bare vm context and in a page.
 */
export const STAND_IN = String.raw`
(function (g) {
  'use strict';
  var registry = Object.create(null);
  function StandInError(code, message) {
    this.code = code;
    if (message !== undefined) this.message = message;
  }
  g.CustomFunctions = {
    ErrorCode: {
      invalidValue: '#VALUE!', notAvailable: '#N/A', divisionByZero: '#DIV/0!', invalidNumber: '#NUM!',
      nullReference: '#NULL!', invalidName: '#NAME?', invalidReference: '#REF!'
    },
    Error: StandInError,
    associate: function (id, fn) {
      if (typeof id === 'object') { for (var k in id) g.CustomFunctions.associate(k, id[k]); return; }
      if (typeof id !== 'string' || typeof fn !== 'function') throw new TypeError('associate(id, function) expected');
      var key = id.toUpperCase();
      if (key in registry) throw new Error('associated twice: ' + key);
      registry[key] = fn;
    }
  };
  function cell(v) {
    if (v instanceof StandInError) return v.message === undefined ? { error: v.code } : { error: v.code, message: v.message };
    if (v !== null && typeof v === 'object') return { notACellValue: String(v) };
    return v;
  }
  g.__fluxbook = {
    ids: function () { return Object.keys(registry).sort(); },
    callAll: function (json) {
      var calls = JSON.parse(json);
      return JSON.stringify(calls.map(function (c) {
        var fn = registry[c.id];
        if (!fn) return { notRegistered: c.id };
        try {
          var out = fn.apply(null, c.args);
          if (!Array.isArray(out) || !out.every(Array.isArray)) return { notAMatrix: String(out) };
          return out.map(function (row) { return row.map(cell); });
        } catch (e) {
          return { thrown: String(e) };
        }
      }));
    }
  };
})(globalThis);
`;

export interface Call {
  readonly label: string;
  readonly id: string;
  readonly args: unknown[];
}

/** Excel hands every matrix argument over as rows of cells: a scalar is [[v]], a series a column. */
function asCells(arg: ArgDecl, value: unknown): unknown[][] {
  if (Array.isArray(value)) return value.map((v) => [v]);
  return [[value]];
}

const sampleArgs = (decl: CellFunctionDecl) => decl.args.map((a) => asCells(a, a.sample));

/** A value of the wrong kind for an argument: text for a number, a number for text, text for a logical. */
function wrongKind(arg: ArgDecl): unknown {
  if (arg.type === 'number') return 'twelve';
  if (arg.type === 'text') return 42;
  return 'perhaps';
}

/** Every function with its samples. */
export function sampleCalls(decls: readonly CellFunctionDecl[] = catalog): Call[] {
  return decls.map((d) => ({ label: `${d.name} with samples`, id: d.name, args: sampleArgs(d) }));
}

/** Functions with optional arguments, those left out as Excel does (null), to exercise the defaults. */
export function omittedOptionalCalls(decls: readonly CellFunctionDecl[] = catalog): Call[] {
  return decls
    .filter((d) => d.args.some((a) => a.optional))
    .map((d) => ({ label: `${d.name} with optionals omitted`, id: d.name, args: d.args.map((a) => (a.optional ? null : asCells(a, a.sample))) }));
}

/** Each function with its first argument of the wrong kind: a #VALUE! naming that argument. */
export function wrongKindCalls(decls: readonly CellFunctionDecl[] = catalog): (Call & { argument: string })[] {
  return decls.map((d) => {
    const first = d.args[0]!;
    const args = sampleArgs(d);
    args[0] = [[wrongKind(first)]];
    return { label: `${d.name} with ${first.name} of the wrong kind`, id: d.name, args, argument: first.name };
  });
}

/** The runtime may append an invocation object after the declared arguments. */
export function invocationCalls(decls: readonly CellFunctionDecl[] = catalog): Call[] {
  return decls.map((d) => ({ label: `${d.name} with an invocation object`, id: d.name, args: [...sampleArgs(d), { address: 'Fleet!C7' }] }));
}

/** A refusal from the core rather than the adapter: a negative rating (InputError → #VALUE!). */
export function outOfDomainCall(): Call {
  const eff = catalog.find((d) => d.name === 'EFF')!;
  const args = sampleArgs(eff);
  args[0] = [[-1000]];
  return { label: 'EFF with a negative kva', id: 'EFF', args };
}

export const BIG_ROWS = 10_000;

/**
 * EFF over a 10,000-row column of loads, the other arguments single cells; a few loads are text
 * or blank, which the column loop leaves to the general element step.
 */
export function bigColumnCall(): Call {
  const eff = catalog.find((d) => d.name === 'EFF')!;
  const args = sampleArgs(eff);
  const load = eff.args.findIndex((a) => a.name === 'load');
  args[load] = Array.from({ length: BIG_ROWS }, (_, i) => [i % 997 === 5 ? 'half' : i % 1009 === 7 ? null : (i + 1) / BIG_ROWS]);
  return { label: `EFF over ${BIG_ROWS} loads, a few of them text or blank`, id: 'EFF', args };
}

/**
 * What the same call gives through the adapter in Node, in the stand-in's JSON form. Excel
 * carries a message only with #VALUE! and #N/A (src/excel/functions.ts drops it for #NUM!).
 */
export function expectedResult(call: Call): unknown {
  const decl = catalog.find((d) => d.name === call.id)!;
  const out = adapt(decl, plainErrors)(...call.args.slice(0, decl.args.length));
  const cells = out.map((row) =>
    row.map((v) => (v instanceof CellError ? (v.kind === 'NUM' ? { error: v.code } : { error: v.code, message: v.message }) : v)),
  );
  return JSON.parse(JSON.stringify(cells));
}

/** How a bundle test reaches its runtime, once its beforeAll has loaded the bundle there. */
export interface Runtime {
  /** Runs a batch of calls in the bundle; one answer per call, in the stand-in's JSON form. */
  run(calls: readonly Call[]): unknown[] | Promise<unknown[]>;
  /** The ids the bundle registered, as the stand-in lists them (sorted). */
  ids(): string[] | Promise<string[]>;
  /** Whether an answer counts as the adapter's; equality unless the runtime's arithmetic differs. */
  same?(got: unknown, want: unknown): boolean;
}

/**
 * The checks every runtime passes, declared inside the test's describe: the registered functions
 * are the built ones, and each batch of calls is answered as the adapter answers it in Node.
 */
export function answersAsTheAdapter(runtime: Runtime): void {
  const same = runtime.same ?? isDeepStrictEqual;
  async function expectAsInNode(calls: readonly Call[]): Promise<unknown[]> {
    const got = await runtime.run(calls);
    calls.forEach((c, i) => {
      const want = expectedResult(c);
      if (!same(got[i], want)) expect(got[i], c.label).toEqual(want);
    });
    return got;
  }

  it('registers exactly the functions in functions.json', async () => {
    const registered = [...(await runtime.ids())];
    expect(registered).toEqual([...builtFunctionIds()].sort());
    expect(registered).toEqual(catalog.map((d) => d.name).sort());
  });

  it('answers every function called with its samples as the adapter does', async () => {
    const calls = sampleCalls();
    const got = await expectAsInNode(calls);
    // A sample is a valid value: none of them may come back as an error.
    got.forEach((r, i) => expect(JSON.stringify(r), calls[i]!.label).not.toMatch(/"error"/));
  });

  it('applies the defaults of omitted optional arguments as the adapter does', async () => {
    await expectAsInNode(omittedOptionalCalls());
  });

  it('ignores an invocation object appended after the declared arguments', async () => {
    await expectAsInNode(invocationCalls());
  });

  it('gives #VALUE! naming the argument for a value of the wrong kind', async () => {
    const calls = wrongKindCalls();
    const got = await expectAsInNode(calls);
    got.forEach((r, i) => {
      expect(r, calls[i]!.label).toEqual([[{ error: '#VALUE!', message: expect.stringContaining(`argument ${calls[i]!.argument}:`) }]]);
    });
    // The worked case: text where EFF wants a kVA rating.
    const eff = calls.findIndex((c) => c.id === 'EFF');
    expect(got[eff]).toEqual([[{ error: '#VALUE!', message: 'argument kva: "twelve" is text; a number is needed (kVA)' }]]);
  });

  it('gives #VALUE! naming the argument for a value the core refuses', async () => {
    const [got] = await expectAsInNode([outOfDomainCall()]);
    expect(got).toEqual([[{ error: '#VALUE!', message: expect.stringMatching(/^argument kva: /) }]]);
  });

  it(`returns ${BIG_ROWS} results for a ${BIG_ROWS}-row range in one call, a message where a load is text or blank`, async () => {
    const call = bigColumnCall();
    const [got] = (await runtime.run([call])) as unknown[][][];
    expect(got).toHaveLength(BIG_ROWS);
    expect(got!.every((row) => row.length === 1)).toBe(true);
    expect(got!.filter((row) => typeof row[0] === 'number')).toHaveLength(BIG_ROWS - 21);
    expect(got![5]![0]).toEqual({ error: '#VALUE!', message: expect.stringMatching(/^argument load: "half" is text/) });
    expect(got).toEqual(expectedResult(call));
  });
}
