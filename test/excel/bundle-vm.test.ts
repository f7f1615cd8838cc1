/**
 * dist/functions.js in a bare JavaScript context, as Excel on Windows runs it in its
 * JavaScript-only runtime: no DOM, no window, no require — only a CustomFunctions stand-in.
 * Every function in functions.json must be registered and answer as the adapter does in Node.
 */
import vm from 'node:vm';
import { beforeAll, describe, expect, it } from 'vitest';
import { catalog } from '../../src/cells/catalog';
import {
  bigColumnCall,
  BIG_ROWS,
  builtFunctionIds,
  expectedResult,
  invocationCalls,
  omittedOptionalCalls,
  outOfDomainCall,
  readDist,
  sampleCalls,
  STAND_IN,
  wrongKindCalls,
  type Call,
} from './bundle-harness';

let bundle: string;
let context: vm.Context;

function run(calls: readonly Call[]): unknown[] {
  context.__calls = JSON.stringify(calls.map(({ id, args }) => ({ id, args })));
  return JSON.parse(vm.runInContext('__fluxbook.callAll(__calls)', context, { timeout: 10_000 }) as string) as unknown[];
}

function expectAsInNode(calls: readonly Call[]): void {
  const got = run(calls);
  calls.forEach((c, i) => expect(got[i], c.label).toEqual(expectedResult(c)));
}

beforeAll(() => {
  bundle = readDist('functions.js');
  context = vm.createContext({}, { codeGeneration: { strings: false, wasm: false } });
  vm.runInContext(STAND_IN, context, { filename: 'custom-functions-stand-in.js' });
  vm.runInContext(bundle, context, { filename: 'dist/functions.js', timeout: 10_000 });
});

describe('dist/functions.js in a bare JS context (node:vm)', () => {
  it('has no DOM, window, require or process to lean on', () => {
    const globals = vm.runInContext(
      "[typeof window, typeof document, typeof self, typeof require, typeof process, typeof module, typeof fetch, typeof XMLHttpRequest].join(',')",
      context,
    );
    expect(globals).toBe(Array(8).fill('undefined').join(','));
  });

  it('registers exactly the functions in functions.json', () => {
    const registered = vm.runInContext('__fluxbook.ids()', context) as string[];
    expect([...registered]).toEqual([...builtFunctionIds()].sort());
    expect([...registered]).toEqual(catalog.map((d) => d.name).sort());
  });

  it('answers every function called with its samples as the adapter does', () => {
    const calls = sampleCalls();
    expectAsInNode(calls);
    // A sample is a valid value: none of them may come back as an error.
    run(calls).forEach((r, i) => expect(JSON.stringify(r), calls[i]!.label).not.toMatch(/"error"/));
  });

  it('applies the defaults of omitted optional arguments as the adapter does', () => {
    expectAsInNode(omittedOptionalCalls());
  });

  it('gives #VALUE! naming the argument for a value of the wrong kind', () => {
    const calls = wrongKindCalls();
    expectAsInNode(calls);
    run(calls).forEach((r, i) => {
      expect(r, calls[i]!.label).toEqual([[{ error: '#VALUE!', message: expect.stringContaining(`argument ${calls[i]!.argument}:`) }]]);
    });
    // The worked case: text where EFF wants a kVA rating.
    const eff = calls.find((c) => c.id === 'EFF')!;
    expect(run([eff])[0]).toEqual([[{ error: '#VALUE!', message: 'argument kva: "twelve" is text; a number is needed (kVA)' }]]);
  });

  it('gives #VALUE! naming the argument for a value the core refuses', () => {
    const call = outOfDomainCall();
    const [got] = run([call]);
    expect(got).toEqual(expectedResult(call));
    expect(got).toEqual([[{ error: '#VALUE!', message: expect.stringMatching(/^argument kva: /) }]]);
  });

  it('ignores an invocation object appended after the declared arguments', () => {
    expectAsInNode(invocationCalls());
  });

  it(`returns ${BIG_ROWS} results for a ${BIG_ROWS}-row range in one call`, () => {
    const call = bigColumnCall();
    const [got] = run([call]) as unknown[][][];
    expect(got).toHaveLength(BIG_ROWS);
    expect(got!.every((row) => row.length === 1 && typeof row[0] === 'number')).toBe(true);
    expect(got).toEqual(expectedResult(call));
  });
});

describe('dist/functions.js as text', () => {
  it('builds no code at run time: no eval( and no new Function', () => {
    const text = readDist('functions.js');
    expect(text).not.toMatch(/\beval\s*\(/);
    expect(text).not.toMatch(/\bnew\s+Function\b/);
  });
});
