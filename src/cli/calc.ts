/**
 * `fluxbook calc IN.xlsx --out OUT.xlsx [--json] [--values] [--strict]`: recalculates a workbook
 * into a new file. Files, options and the progress bar live here; the work is the engine's one
 * call (calculateWorkbook), run in a worker thread so that the main thread answers Ctrl-C at once
 * even while HyperFormula computes.
 */
import { promises as fs } from 'node:fs';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import { calculateWorkbook, WorkbookError, type Calculated, type FormulaResult, type Stage } from '../engine/xlsx';
import { checkOutput, readInput, UsageError, writeAtomically } from './files';
import { progress, wantsBar } from './progress';

export interface CalcOptions {
  readonly out: string;
  readonly json?: boolean;
  readonly overwrite?: boolean;
  /** Write plain values, formulas removed. */
  readonly values?: boolean;
}

export type CalcSummary = Omit<Calculated, 'bytes' | 'results'> & {
  /** The results, when asked for with `json`: as JSON text, ready to print. */
  readonly json?: string;
  readonly results?: FormulaResult[];
};

function checkXlsxName(path: string, what: string): void {
  if (!/\.xlsx$/i.test(path)) throw new UsageError(`${path}: the ${what} must be an .xlsx file`);
}

interface Job {
  readonly bytes: Uint8Array;
  readonly values: boolean;
  readonly json: boolean;
}

type Reply =
  | { readonly type: 'progress'; readonly stage: Stage; readonly done: number; readonly total: number }
  | { readonly type: 'done'; readonly bytes: Uint8Array; readonly summary: CalcSummary }
  | { readonly type: 'error'; readonly workbook: boolean; readonly message: string };

/** The engine call and what the command needs of its answer. */
async function work(job: Job, onProgress: (stage: Stage, done: number, total: number) => void): Promise<{ bytes: Uint8Array; summary: CalcSummary }> {
  const r = await calculateWorkbook(Buffer.from(job.bytes.buffer, job.bytes.byteOffset, job.bytes.length), { values: job.values, onProgress });
  // `results` is built when read: only for --json.
  const summary: CalcSummary = { formulas: r.formulas, ours: r.ours, errors: r.errors, oursErrors: r.oursErrors, errorCodes: r.errorCodes, changedParts: r.changedParts };
  return { bytes: r.bytes, summary: job.json ? { ...summary, json: JSON.stringify(r.results, null, 1) } : summary };
}

/** The script a worker starts from: this very program (the built bundle, or the sources under tsx). */
function workerScript(): string | undefined {
  const entry = process.argv[1];
  if (!entry || !/fluxbook\.(js|ts)$/.test(entry)) return undefined;
  return entry;
}

function startWorker(entry: string, job: Job): Worker {
  const data = { fluxbookEngine: true };
  const w = entry.endsWith('.ts')
    ? new Worker(`require('tsx/cjs'); require(${JSON.stringify(entry)});`, { eval: true, workerData: data })
    : new Worker(entry, { workerData: data, resourceLimits: { maxYoungGenerationSizeMb: 32 } });
  w.postMessage(job, [job.bytes.buffer as ArrayBuffer]);
  return w;
}

/** Runs in the worker: waits for the job, answers with progress, then the result or the error. */
export function isEngineWorker(): boolean {
  return !isMainThread && (workerData as { fluxbookEngine?: boolean } | undefined)?.fluxbookEngine === true;
}

export function runEngineWorker(): void {
  const port = parentPort!;
  port.once('message', (job: Job) => {
    let last = '';
    const onProgress = (stage: Stage, done: number, total: number) => {
      const key = `${stage}:${Math.floor((done / Math.max(1, total)) * 200)}`;
      if (key === last) return;
      last = key;
      port.postMessage({ type: 'progress', stage, done, total } satisfies Reply);
    };
    work(job, onProgress).then(
      ({ bytes, summary }) => port.postMessage({ type: 'done', bytes, summary } satisfies Reply, [bytes.buffer as ArrayBuffer]),
      (error: unknown) =>
        port.postMessage({ type: 'error', workbook: error instanceof WorkbookError, message: error instanceof Error ? error.message : String(error) } satisfies Reply),
    );
  });
}

async function viaWorker(entry: string, job: Job, onProgress: (stage: Stage, done: number, total: number) => void) {
  const w = startWorker(entry, job);
  try {
    return await new Promise<{ bytes: Uint8Array; summary: CalcSummary }>((resolve, reject) => {
      w.on('message', (m: Reply) => {
        if (m.type === 'progress') onProgress(m.stage, m.done, m.total);
        else if (m.type === 'done') resolve({ bytes: m.bytes, summary: m.summary });
        else reject(m.workbook ? new WorkbookError(m.message) : new Error(m.message));
      });
      w.on('error', reject);
      w.on('exit', (code) => reject(new Error(`the engine stopped (exit code ${code})`)));
    });
  } finally {
    void w.terminate();
  }
}

/** Recalculates `bytes` with a progress bar (for big inputs on a terminal), in a worker where one can be started. */
export async function recalculate(bytes: Buffer, options: { values?: boolean; json?: boolean; inProcess?: boolean } = {}) {
  const bar = progress(wantsBar(bytes.length));
  const job: Job = { bytes: new Uint8Array(bytes), values: Boolean(options.values), json: Boolean(options.json) };
  const entry = options.inProcess || process.env.FLUXBOOK_IN_PROCESS ? undefined : workerScript();
  try {
    const onProgress = (stage: Stage, done: number, total: number) => bar.update(stage, done, total);
    return entry ? await viaWorker(entry, job, onProgress) : await work(job, onProgress);
  } finally {
    bar.stop();
  }
}

export async function calc(input: string, options: CalcOptions): Promise<CalcSummary> {
  checkXlsxName(options.out, 'output');
  const bytes = await readInput(input);
  await checkOutput(options.out, { overwrite: Boolean(options.overwrite), notSameAs: input });
  let result: { bytes: Uint8Array; summary: CalcSummary };
  try {
    result = await recalculate(bytes, { values: options.values, json: options.json });
  } catch (error) {
    if (error instanceof WorkbookError) throw new UsageError(`${input}: ${error.message}`);
    throw error;
  }
  await writeAtomically(options.out, (tmp) => fs.writeFile(tmp, result.bytes), { overwrite: Boolean(options.overwrite) });
  return result.summary;
}
