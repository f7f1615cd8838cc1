/**
 * The add-in's adapter row in headless Chromium (Debian's), the kind of runtime Excel on the web
 * runs custom functions in: dist/functions.js registers its functions in a blank page, every
 * function is called as in the Node rows, then XFMR.EFF over a column is timed against the same
 * floor loops (bench/floor.ts, bundled for the page, the faster of its two ways to make a row) in
 * the same page. Each of three rounds times each loop after a collection, 0.5 s of warm-up and
 * 1.5 s of calls; a loop's time is the mean of the rounds.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { buildSync } from 'esbuild';
import { chromium } from 'playwright-core';
import { CHROMIUM, CHROMIUM_ARGS, haveChromium } from '../scripts/chromium';
import { type BenchRow, ms } from './harness';

/** Office's CustomFunctions, as little of it as the bundle touches, filling a registry of ids. */
const STAND_IN = `
globalThis.__registered = {};
globalThis.CustomFunctions = {
  associate: function (id, fn) { globalThis.__registered[id] = fn; },
  Error: function (code, message) { this.code = code; this.message = message; },
  ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A', invalidNumber: '#NUM!' }
};`;

interface PageTimes {
  readonly addIn: number;
  readonly filledRows: number;
  readonly literalRows: number;
}

export async function addInInChromium(warmUp: readonly { name: string; args: unknown[] }[], n: number): Promise<BenchRow> {
  const measure = `adapter, add-in in headless Chromium (Excel on the web's kind of runtime): EFF over ${n.toLocaleString('en')} cells vs the same raw loop in the same page (the faster way to make a row there)`;
  if (!haveChromium()) {
    console.log(`${CHROMIUM} is missing (apt-get install chromium): the Chromium row is skipped.`);
    return { measure, ours: 'Chromium missing', reference: '—', ratio: '—', goal: 'report', met: true };
  }
  const floorScript = buildSync({ entryPoints: [resolve('bench/floor.ts')], bundle: true, format: 'iife', globalName: '__floor', platform: 'browser', target: 'es2020', write: false });
  const browser = await chromium.launch({ executablePath: CHROMIUM, args: [...CHROMIUM_ARGS, '--js-flags=--expose-gc'] });
  try {
    const page = await browser.newPage();
    await page.addScriptTag({ content: STAND_IN });
    await page.addScriptTag({ content: readFileSync(resolve('dist/functions.js'), 'utf8') });
    await page.addScriptTag({ content: floorScript.outputFiles[0]!.text });
    const t = await page.evaluate(
      ({ calls, n, rounds }) => {
        const g = globalThis as unknown as {
          __registered: Record<string, (...args: unknown[]) => unknown[][]>;
          __floor: Record<'floorLoop' | 'literalRowsLoop', (a: number[][], b: number[][]) => number[][]> & {
            unitColumns: (n: number) => { kvaCells: number[][]; loadCells: number[][] };
          };
          gc?: () => void;
        };
        for (const c of calls) for (let k = 0; k < 20; k++) g.__registered[c.name]!.apply(null, c.args);
        const { kvaCells, loadCells } = g.__floor.unitColumns(n);
        const eff = g.__registered.EFF!;
        const { floorLoop, literalRowsLoop } = g.__floor;
        let sink = 0;
        const tasks: [keyof PageTimes, () => void][] = [
          ['addIn', () => { sink += eff(kvaCells, 1400, 10500, loadCells, null).length; }],
          ['filledRows', () => { sink += floorLoop(kvaCells, loadCells).length; }],
          ['literalRows', () => { sink += literalRowsLoop(kvaCells, loadCells).length; }],
        ];
        const mean = { addIn: 0, filledRows: 0, literalRows: 0, sink: 0 };
        for (let r = 0; r < rounds; r++) {
          for (const [name, task] of tasks) {
            g.gc?.();
            const warm = performance.now();
            while (performance.now() - warm < 500) task();
            let count = 0;
            const start = performance.now();
            while (performance.now() - start < 1500) {
              task();
              count++;
            }
            mean[name] += (performance.now() - start) / count / rounds;
          }
        }
        mean.sink = sink;
        return mean;
      },
      { calls: warmUp, n, rounds: 3 },
    );
    const version = browser.version();
    const floor = Math.min(t.filledRows, t.literalRows);
    return {
      measure: measure.replace('headless Chromium', `headless Chromium ${version}`),
      ours: ms(t.addIn),
      reference: ms(floor),
      ratio: `${(t.addIn / floor).toFixed(2)}×`,
      goal: 'report',
      met: true,
    };
  } finally {
    await browser.close();
  }
}
