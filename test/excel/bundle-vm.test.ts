/**
 * dist/functions.js in a bare JavaScript context, as Excel on Windows runs it in its
 * JavaScript-only runtime: no DOM, no window, no require — only a CustomFunctions stand-in.
 * Every function in functions.json must be registered and answer as the adapter does in Node.
 */
import vm from 'node:vm';
import { beforeAll, describe, expect, it } from 'vitest';
import { catalog } from '../../src/cells/catalog';
import { answersAsTheAdapter, readDist, STAND_IN, type Call } from './bundle-harness';

let bundle: string;
let context: vm.Context;

function run(calls: readonly Call[]): unknown[] {
  context.__calls = JSON.stringify(calls.map(({ id, args }) => ({ id, args })));
  return JSON.parse(vm.runInContext('__fluxbook.callAll(__calls)', context, { timeout: 10_000 }) as string) as unknown[];
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

  answersAsTheAdapter({ run, ids: () => vm.runInContext('__fluxbook.ids()', context) as string[] });
});

describe('dist/functions.js as text', () => {
  it('builds no code at run time: no eval( and no new Function', () => {
    const text = readDist('functions.js');
    expect(text).not.toMatch(/\beval\s*\(/);
    expect(text).not.toMatch(/\bnew\s+Function\b/);
  });

  it('carries no help or source text, which Excel reads from functions.json instead', () => {
    const text = readDist('functions.js');
    const json = readDist('functions.json');
    const long = (s: string) => s.length >= 40;
    const helps = catalog.flatMap((d) => [d.help, d.source, ...d.args.map((a) => a.help)]).filter(long);
    expect(helps.length).toBeGreaterThan(100);
    for (const help of helps) expect(text).not.toContain(help.slice(0, 40));
    for (const d of catalog.filter((d) => long(d.help))) expect(json).toContain(JSON.stringify(d.help.slice(0, 40)).slice(1, -1));
  });
});
