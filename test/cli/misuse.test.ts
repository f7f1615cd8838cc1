/**
 * `fluxbook calc` used the ways people get it wrong: an output where nothing may be written, an
 * output named like a folder or reached through a file, the output given as a second argument,
 * Ctrl-C in the middle, the JSON piped into `head`, and --strict, --values and the summary.
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fleetPackage } from '../../scripts/make-fleet';
import { TEMP_PREFIX } from '../../src/cli/files';
import { RESTORE_TERMINAL } from '../../src/cli/progress';
import { fml, handMadeXlsx, num, partText, row } from '../engine/ooxml';
import { fluxbook, ROOT } from './run';

let dir: string;
let input: string;
let big: string;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'fluxbook-misuse-'));
  input = join(dir, 'in.xlsx');
  writeFileSync(input, await handMadeXlsx([{ name: 'Fleet', rows: row(1, num('A1', 1000), num('B1', 1400), num('C1', 10500), fml('D1', '_xldudf_XFMR_EFF(A1,B1,C1,0.5)')) }]));
  big = join(dir, 'big.xlsx');
  writeFileSync(big, fleetPackage(100_000));
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

const oneLine = (s: string) => expect(s.trim().split('\n')).toHaveLength(1);

describe('an output that cannot be written: a plain sentence and exit code 2', () => {
  it('a place where nothing may be written (EACCES)', () => {
    // /sys refuses new files even to root, so this holds however the tests are run.
    const r = fluxbook('calc', input, '--out', '/sys/fluxbook-test-out.xlsx');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^fluxbook: \/sys\/fluxbook-test-out\.xlsx: cannot be written here \(permission denied\); choose a folder you may write to\n$/);
    expect(r.stderr).not.toMatch(/internal error|EACCES/);
  });

  it('an output named like a folder that exists (EISDIR)', () => {
    const folder = join(dir, 'looks-like.xlsx');
    mkdirSync(folder);
    const r = fluxbook('calc', input, '--out', folder);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/looks-like\.xlsx: is a folder; give a file name for the output/);
    expect(r.stderr).not.toMatch(/internal error|EISDIR/);
    oneLine(r.stderr);
  });

  it('a path through a file is named as such, not as a missing folder', () => {
    const r = fluxbook('calc', input, '--out', join(input, 'o.xlsx'));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/in\.xlsx is a file, not a folder, so nothing can be written inside it/);
    oneLine(r.stderr);
  });
});

describe('the output as a second argument', () => {
  it('calc IN OUT writes OUT', () => {
    const out = join(dir, 'second.xlsx');
    const r = fluxbook('calc', input, out);
    expect(r.status).toBe(0);
    expect(existsSync(out)).toBe(true);
  });

  it('calc IN OTHER --out OUT names the stray argument', () => {
    const r = fluxbook('calc', input, 'stray.xlsx', '--out', join(dir, 'x.xlsx'));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/unexpected argument "stray\.xlsx": the output is given with --out/);
    oneLine(r.stderr);
  });

  it('no output at all says how to give one', () => {
    const r = fluxbook('calc', input);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/no output given: add --out OUT\.xlsx/);
  });
});

describe('Ctrl-C and closed pipes', () => {
  it('Ctrl-C while working: "interrupted; nothing written", exit 130, no output and no temp file', async () => {
    const out = join(dir, 'interrupted.xlsx');
    const child = spawn(process.execPath, ['--import', 'tsx', join(ROOT, 'src/cli/fluxbook.ts'), 'calc', big, '--out', out], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    await new Promise((ok) => setTimeout(ok, 2500));
    const code = await new Promise<number | null>((ok) => {
      child.on('exit', (c) => ok(c));
      child.kill('SIGINT');
    });
    expect(code).toBe(130);
    expect(stderr).toBe('fluxbook: interrupted; nothing written\n');
    expect(existsSync(out)).toBe(false);
    expect(readdirSync(dir).filter((f) => f.startsWith(TEMP_PREFIX))).toEqual([]);
  });

  it('Ctrl-C on a terminal while the bar is drawn gives the cursor and line wrapping back', async () => {
    const out = join(dir, 'interrupted-tty.xlsx');
    const command = `${process.execPath} --import tsx src/cli/fluxbook.ts calc ${big} --out ${out}`;
    // util-linux script(1) runs the command on a pseudo-terminal; once the bar is drawn, Ctrl-C is typed into it.
    const child = spawn('script', ['-qefc', command, '/dev/null'], { cwd: ROOT, stdio: ['pipe', 'pipe', 'pipe'] });
    let screen = '';
    let typed = false;
    child.stdout.on('data', (d: Buffer) => {
      screen += d.toString();
      if (!typed && /\u001b\[\?25l[\s\S]*\[/.test(screen)) {
        typed = true;
        child.stdin.write('\u0003');
      }
    });
    const code = await new Promise<number | null>((ok) => child.on('exit', (c) => ok(c)));
    expect(typed).toBe(true);
    expect(code).toBe(130);
    const after = screen.slice(screen.lastIndexOf('\u001b[?25l'));
    expect(after).toContain(RESTORE_TERMINAL); // the bar hid the cursor, and it was shown again
    expect(after).toMatch(/fluxbook: interrupted; nothing written/);
    expect(existsSync(out)).toBe(false);
  }, 60_000);

  it('--json into a reader that stops early (| head) ends quietly', () => {
    const mid = join(dir, 'mid.xlsx');
    writeFileSync(mid, fleetPackage(3000));
    const r = spawnSync('bash', ['-c', `node --import tsx src/cli/fluxbook.ts calc ${mid} --out ${join(dir, 'mid-out.xlsx')} --json | head -c 100 >/dev/null; echo "status \${PIPESTATUS[0]}"`], {
      cwd: ROOT,
      encoding: 'utf8',
      timeout: 120_000,
    });
    expect(r.stdout).toMatch(/status 0/);
    expect(r.stderr).not.toMatch(/EPIPE|Error|internal/);
  });
});

describe('errors counted, --strict and --values', () => {
  let withErrors: string;
  beforeAll(async () => {
    withErrors = join(dir, 'errors.xlsx');
    writeFileSync(
      withErrors,
      await handMadeXlsx([
        {
          name: 'S',
          rows: row(1, num('A1', 1000), fml('B1', '_xldudf_XFMR_EFF(A1,1400,10500,-1)'), fml('C1', '_xldudf_XFMR_EFFCURVE(-1000,1400,10500)'), fml('D1', '1/0'), fml('E1', '_xldudf_XFMR_EFF(A1,1400,10500,0.5)')),
        },
      ]),
    );
  });

  it('the summary on stderr counts every error value, with --json too, by code', () => {
    const r = fluxbook('calc', withErrors, '--out', join(dir, 'e1.xlsx'), '--json');
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout)).toHaveLength(4);
    expect(r.stderr).toMatch(/e1\.xlsx: 4 formulas recalculated \(3 with XFMR functions\), 3 error values: 2 #VALUE!, 1 #DIV\/0!; 2 of them from XFMR formulas; --json shows each\n$/);
  });

  it('--strict: exit 3 when an XFMR result is an error value, the workbook still written; 0 when none is', async () => {
    const out = join(dir, 'strict.xlsx');
    const r = fluxbook('calc', withErrors, '--out', out, '--strict');
    expect(r.status).toBe(3);
    expect(existsSync(out)).toBe(true);
    expect(fluxbook('calc', input, '--out', join(dir, 'strict-ok.xlsx'), '--strict').status).toBe(0);
    // A native formula's error alone does not fail the run.
    const native = join(dir, 'native-error.xlsx');
    writeFileSync(native, await handMadeXlsx([{ name: 'S', rows: row(1, fml('A1', '1/0'), fml('B1', '_xldudf_XFMR_EFF(1000,1400,10500,0.5)')) }]));
    expect(fluxbook('calc', native, '--out', join(dir, 'native-out.xlsx'), '--strict').status).toBe(0);
  });

  it('--values: no formula left, the values in place', async () => {
    const out = join(dir, 'values.xlsx');
    const r = fluxbook('calc', input, '--out', out, '--values');
    expect(r.status).toBe(0);
    const { readFileSync } = await import('node:fs');
    const xml = await partText(readFileSync(out), 'xl/worksheets/sheet1.xml');
    expect(xml).not.toMatch(/<f[ >]/);
    expect(xml).toMatch(/<c r="D1"><v>0\.99\d+<\/v><\/c>/);
  });
});
