/**
 * `fluxbook calc` as a user runs it, against LibreOffice headless on the same sums, in one run:
 *  - a 100,000-unit fleet, 400,000 XFMR formulas one per cell (as users fill them down), through
 *    the built command, against `soffice --headless --convert-to xlsx` recalculating the same four
 *    results written as native formulas (scripts/make-fleet.ts --native) and saving .xlsx;
 *  - the same fleet with Excel's shared formulas;
 *  - a sheet of 1,000,000 rows (a filled-down XFMR.LOSSES and an XFMR.ELOSS over the column), with
 *    Node's default heap.
 * Wall time and peak resident memory of each process come from GNU time (/usr/bin/time); LibreOffice
 * runs with a profile of its own set to recalculate every formula on load, warmed up first.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fleetPackage } from '../scripts/make-fleet';
import { readPackage } from '../src/engine/read';
import { openZip } from '../src/engine/zip';
import { type BenchRow, ms } from './harness';

const TIME = '/usr/bin/time';
const CLI = resolve('dist/cli/fluxbook.js');

interface Run {
  readonly ms: number;
  /** Peak resident set size, MB; undefined when GNU time is missing. */
  readonly peakMb?: number;
  readonly status: number | null;
  readonly stderr: string;
}

function timed(command: string, args: string[], env: NodeJS.ProcessEnv = process.env): Run {
  const useTime = existsSync(TIME);
  const start = performance.now();
  const r = useTime
    ? spawnSync(TIME, ['-f', 'FLUXBOOK-BENCH %M', command, ...args], { encoding: 'utf8', env, timeout: 900_000 })
    : spawnSync(command, args, { encoding: 'utf8', env, timeout: 900_000 });
  const elapsed = performance.now() - start;
  const m = /FLUXBOOK-BENCH (\d+)/.exec(r.stderr ?? '');
  return { ms: elapsed, peakMb: m ? Number(m[1]) / 1024 : undefined, status: r.status, stderr: r.stderr ?? '' };
}

function soffice(): string | undefined {
  try {
    return execFileSync('sh', ['-c', 'command -v soffice'], { encoding: 'utf8' }).trim() || undefined;
  } catch {
    return undefined;
  }
}

/** A LibreOffice profile that recalculates every formula of an .xlsx on load (OOXMLRecalcMode 0: always). */
function recalcProfile(dir: string): string {
  const user = join(dir, 'user');
  mkdirSync(user, { recursive: true });
  writeFileSync(
    join(user, 'registrymodifications.xcu'),
    '<?xml version="1.0" encoding="UTF-8"?>\n<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">\n' +
      '<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>\n</oor:items>\n',
  );
  return `file://${dir}`;
}

/** Numbers of one row's result columns (J..M) in a package, read with our own reader. */
async function resultsAt(bytes: Buffer, rows: number[]): Promise<number[][]> {
  const read = await readPackage(await openZip(bytes), undefined, true);
  const sheet = read.sheets[0]!;
  return rows.map((r) => [9, 10, 11, 12].map((c) => sheet.rows[r - 1]?.[c] as number));
}

const mb = (v: number | undefined) => (v === undefined ? 'not measured' : `${v.toFixed(0)} MB`);

export async function calcBenchmark(units = 100_000): Promise<BenchRow[]> {
  const dir = mkdtempSync(join(tmpdir(), 'fluxbook-bench-'));
  try {
    const ours = join(dir, 'fleet.xlsx');
    const shared = join(dir, 'fleet-shared.xlsx');
    const native = join(dir, 'fleet-native.xlsx');
    writeFileSync(ours, fleetPackage(units, 'xfmr'));
    writeFileSync(shared, fleetPackage(units, 'shared'));
    writeFileSync(native, fleetPackage(units, 'native'));
    const n = units.toLocaleString('en-US');
    const rows: BenchRow[] = [];

    const run = timed(process.execPath, [CLI, 'calc', ours, '--out', join(dir, 'out.xlsx')]);
    if (run.status !== 0) throw new Error(`fluxbook calc failed: ${run.stderr}`);
    const runShared = timed(process.execPath, [CLI, 'calc', shared, '--out', join(dir, 'out-shared.xlsx')]);
    if (runShared.status !== 0) throw new Error(`fluxbook calc failed: ${runShared.stderr}`);

    const lo = soffice();
    if (lo === undefined) {
      console.log('LibreOffice (soffice) is not installed: the rows against LibreOffice are skipped.');
      rows.push({ measure: `calc: ${n}-unit fleet, ${(4 * units).toLocaleString('en-US')} XFMR formulas one per cell`, ours: ms(run.ms), reference: 'soffice missing', ratio: '—', goal: '≤ ⅓ of LibreOffice', met: false });
    } else {
      const profile = recalcProfile(join(dir, 'lo-profile'));
      const loArgs = (file: string, out: string) => [`-env:UserInstallation=${profile}`, '--headless', '--convert-to', 'xlsx', '--outdir', out, file];
      const warm = join(dir, 'warm.xlsx');
      writeFileSync(warm, fleetPackage(10, 'native'));
      timed(lo, loArgs(warm, join(dir, 'lo-warm'))); // the first start of a new profile sets it up
      const office = timed(lo, loArgs(native, join(dir, 'lo')));
      const loOut = join(dir, 'lo', 'fleet-native.xlsx');
      if (office.status !== 0 || !existsSync(loOut)) throw new Error(`soffice failed: ${office.stderr}`);
      // Like with like: LibreOffice's results equal ours (rows from the start, middle and end).
      const sample = [2, Math.floor(units / 2) + 1, units + 1];
      const a = await resultsAt(readFileSync(join(dir, 'out.xlsx')), sample);
      const b = await resultsAt(readFileSync(loOut), sample);
      a.forEach((row, i) =>
        row.forEach((v, j) => {
          const w = b[i]![j]!;
          if (!(Math.abs(v - w) <= 1e-9 * Math.max(1, Math.abs(w)))) throw new Error(`fleet results differ at row ${sample[i]}, column ${j}: ${v} vs LibreOffice ${w}`);
        }),
      );
      const ratio = run.ms / office.ms;
      rows.push({
        measure: `calc: ${n}-unit fleet, ${(4 * units).toLocaleString('en-US')} XFMR formulas one per cell — fluxbook calc vs soffice --convert-to xlsx on the same sums as native formulas`,
        ours: ms(run.ms),
        reference: ms(office.ms),
        ratio: `${ratio.toFixed(2)} of LibreOffice's time`,
        goal: '≤ ⅓ of LibreOffice',
        met: ratio <= 1 / 3,
      });
      rows.push({
        measure: 'calc: peak memory of the same two runs (resident set, whole process)',
        ours: mb(run.peakMb),
        reference: mb(office.peakMb),
        ratio: run.peakMb && office.peakMb ? `${(run.peakMb / office.peakMb).toFixed(2)} of LibreOffice's` : '—',
        goal: '≤ LibreOffice',
        met: run.peakMb !== undefined && office.peakMb !== undefined && run.peakMb <= office.peakMb,
      });
      rows.push({
        measure: `calc: the same fleet stored as Excel stores a filled-down column (shared formulas)`,
        ours: `${ms(runShared.ms)}, ${mb(runShared.peakMb)}`,
        reference: `${ms(office.ms)}, ${mb(office.peakMb)}`,
        ratio: `${(runShared.ms / office.ms).toFixed(2)} of LibreOffice's time`,
        goal: 'report',
        met: true,
      });
    }

    const million = join(dir, 'million.xlsx');
    writeFileSync(million, fleetPackage(1_000_000, 'loads'));
    const env = { ...process.env, NODE_OPTIONS: (process.env.NODE_OPTIONS ?? '').replace(/--max-old-space-size=\d+/g, '') };
    const big = timed(process.execPath, [CLI, 'calc', million, '--out', join(dir, 'million-out.xlsx')], env);
    rows.push({
      measure: 'calc: 1,000,000-row sheet (a filled-down XFMR.LOSSES, XFMR.ELOSS over the column), default Node heap',
      ours: big.status === 0 ? `${ms(big.ms)}, ${mb(big.peakMb)}` : `refused or failed (exit ${big.status})`,
      reference: '—',
      ratio: '—',
      goal: 'processed, not refused',
      met: big.status === 0,
    });
    return rows;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
