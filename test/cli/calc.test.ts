/**
 * Every way `fluxbook calc` can end: done (0), refused with one line (2), and that an output is
 * whole or absent — never half a file — even when the process is killed while writing.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, linkSync, mkdtempSync, readdirSync, readFileSync, statSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEMP_PREFIX, writeAtomically } from '../../src/cli/files';
import { fleetPackage } from '../../scripts/make-fleet';
import { fml, handMadeXlsx, num, row } from '../engine/ooxml';
import { fluxbook, fluxbookAsync, ROOT, tsxScript } from './run';

let dir: string;
let input: string;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'fluxbook-cli-'));
  input = join(dir, 'fleet.xlsx');
  writeFileSync(
    input,
    await handMadeXlsx([{ name: 'Fleet', rows: row(1, num('A1', 1000), num('B1', 1400), num('C1', 10500), fml('D1', '_xldudf_XFMR_EFF(A1,B1,C1,0.5)'), fml('E1', 'XFMR.EFFCURVE(A1,B1,C1,1,3)')) }]),
  );
});

afterAll(() => {
  execFileSync('rm', ['-rf', dir]);
});

const oneLine = (s: string) => expect(s.trim().split('\n')).toHaveLength(1);
const temps = () => readdirSync(dir).filter((f) => f.startsWith(TEMP_PREFIX));

describe('fluxbook calc refuses, with exit code 2 and one line', () => {
  it('a missing input', () => {
    const r = fluxbook('calc', join(dir, 'nowhere.xlsx'), '--out', join(dir, 'o1.xlsx'));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/nowhere\.xlsx: no such file/);
    oneLine(r.stderr);
    expect(existsSync(join(dir, 'o1.xlsx'))).toBe(false);
  });

  it('garbage bytes', () => {
    const garbage = join(dir, 'garbage.xlsx');
    writeFileSync(garbage, Buffer.from(Array.from({ length: 4096 }, (_, i) => (i * 7919 + 13) % 256)));
    const r = fluxbook('calc', garbage, '--out', join(dir, 'o2.xlsx'));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not an \.xlsx workbook/);
    oneLine(r.stderr);
  });

  it('a CSV file renamed .xlsx', () => {
    const csv = join(dir, 'fleet-export.xlsx');
    writeFileSync(csv, 'unit,kva,p0_w,pk_w\nFH-01,1000,1400,10500\n');
    const r = fluxbook('calc', csv, '--out', join(dir, 'o3.xlsx'));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/CSV or text file renamed \.xlsx/);
    oneLine(r.stderr);
  });

  it('a ZIP package cut short', () => {
    const cut = join(dir, 'cut.xlsx');
    const whole = readFileSync(input);
    writeFileSync(cut, whole.subarray(0, whole.length - 40));
    const r = fluxbook('calc', cut, '--out', join(dir, 'o4.xlsx'));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/cannot be read/);
    oneLine(r.stderr);
  });

  it('OUT = IN, by the same name, another spelling, a symbolic link or a hard link — even with --overwrite', () => {
    const before = readFileSync(input);
    const symlink = join(dir, 'alias.xlsx');
    symlinkSync(input, symlink);
    const hardlink = join(dir, 'hard.xlsx');
    linkSync(input, hardlink);
    for (const out of [input, join(dir, '.', 'fleet.xlsx'), symlink, hardlink]) {
      const r = fluxbook('calc', input, '--out', out, '--overwrite');
      expect(r.status).toBe(2);
      expect(r.stderr).toMatch(/is the input workbook/);
      oneLine(r.stderr);
    }
    expect(readFileSync(input).equals(before)).toBe(true);
  });

  it('an existing output without --overwrite, which stays as it was', () => {
    const out = join(dir, 'taken.xlsx');
    writeFileSync(out, 'mine');
    const r = fluxbook('calc', input, '--out', out);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/exists already; give --overwrite/);
    expect(readFileSync(out, 'utf8')).toBe('mine');
  });

  it('an output that is not .xlsx, and a missing --out', () => {
    expect(fluxbook('calc', input, '--out', join(dir, 'o.csv')).status).toBe(2);
    const r = fluxbook('calc', input);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--out/);
  });
});

describe('fluxbook calc does the work', () => {
  it('writes the recalculated workbook and prints every formula cell with --json', async () => {
    const out = join(dir, 'done.xlsx');
    const r = fluxbook('calc', input, '--out', out, '--json');
    expect(r.status).toBe(0);
    const cells = JSON.parse(r.stdout) as { sheet: string; cell: string; formula: string; value: unknown; spill?: { ref: string } }[];
    expect(cells.map((c) => [c.sheet, c.cell, c.formula])).toEqual([
      ['Fleet', 'D1', '=XFMR.EFF(A1,B1,C1,0.5)'],
      ['Fleet', 'E1', '=XFMR.EFFCURVE(A1,B1,C1,1,3)'],
    ]);
    expect(cells[0]!.value).toBeCloseTo(500_000 / (500_000 + 1400 + 10500 / 4), 14);
    expect(cells[1]!.spill!.ref).toBe('E1:G3');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(out);
    expect(wb.getWorksheet('Fleet')!.getCell('D1').formula).toBe('_xldudf_XFMR_EFF(A1,B1,C1,0.5)');
    expect(temps()).toEqual([]);
  });

  it('replaces an existing output with --overwrite', () => {
    const out = join(dir, 'again.xlsx');
    writeFileSync(out, 'old');
    const r = fluxbook('calc', input, '--out', out, '--overwrite');
    expect(r.status).toBe(0);
    expect(r.stderr).toMatch(/2 formulas recalculated \(2 with XFMR functions\), no error values/);
    expect(readFileSync(out).subarray(0, 2).toString()).toBe('PK');
  });

  it('explains itself with --help, exit code 0', () => {
    for (const args of [['--help'], ['calc', '--help'], ['demo', '--help']]) {
      const r = fluxbook(...args);
      expect(r.status).toBe(0);
      expect(r.stdout).toMatch(/Usage: fluxbook/);
    }
    expect(fluxbook('calc', '--help').stdout).toMatch(/_xldudf_XFMR_EFF/);
  });
});

describe('an output is whole or absent', () => {
  it('a failing write leaves neither the output nor a temp file', async () => {
    const out = join(dir, 'failed.xlsx');
    await expect(
      writeAtomically(
        out,
        async (tmp) => {
          writeFileSync(tmp, 'half');
          throw new Error('disk full');
        },
        { overwrite: false },
      ),
    ).rejects.toThrow('disk full');
    expect(existsSync(out)).toBe(false);
    expect(temps()).toEqual([]);
  });

  async function killedHalfway(signal: NodeJS.Signals): Promise<{ out: string; tmp: string }> {
    const out = join(dir, `killed-${signal}.xlsx`);
    const child = tsxScript('test/cli/fixtures/half-write.ts', out);
    const tmp = await new Promise<string>((ok, fail) => {
      let text = '';
      child.stdout.on('data', (d: Buffer) => {
        text += d.toString();
        const m = /half (.+)\n/.exec(text);
        if (m) ok(m[1]!);
      });
      child.on('exit', () => fail(new Error(`helper ended early: ${text}`)));
    });
    expect(existsSync(tmp)).toBe(true);
    await new Promise<void>((ok) => {
      child.on('exit', () => ok());
      child.kill(signal);
    });
    return { out, tmp };
  }

  it('SIGKILL while writing: no output at all (the temp file is all that remains)', async () => {
    const { out, tmp } = await killedHalfway('SIGKILL');
    expect(existsSync(out)).toBe(false);
    expect(tmp.startsWith(join(dir, TEMP_PREFIX))).toBe(true);
  });

  it('SIGTERM while writing: no output, and the temp file is removed', async () => {
    const { out, tmp } = await killedHalfway('SIGTERM');
    expect(existsSync(out)).toBe(false);
    expect(existsSync(tmp)).toBe(false);
  });

  it('the real command killed at any moment leaves OUT absent or a complete workbook', async () => {
    const big = join(dir, 'big.xlsx');
    writeFileSync(big, fleetPackage(3000));
    for (const delay of [300, 900, 1500, 2100]) {
      const out = join(dir, `big-out-${delay}.xlsx`);
      const child = fluxbookAsync('calc', big, '--out', out);
      await new Promise((ok) => setTimeout(ok, delay));
      await new Promise<void>((ok) => {
        if (child.exitCode !== null) return ok();
        child.on('exit', () => ok());
        child.kill('SIGKILL');
      });
      if (existsSync(out)) {
        const wb = new ExcelJS.Workbook();
        await wb.xlsx.readFile(out); // a whole workbook, or this throws
        expect(wb.getWorksheet('Fleet')!.rowCount).toBe(3001);
        expect(statSync(out).size).toBeGreaterThan(0);
      }
    }
  });
});

describe('the built command', () => {
  it('dist/cli/fluxbook.js runs under node with a #! line', () => {
    const bin = join(ROOT, 'dist/cli/fluxbook.js');
    if (!existsSync(bin)) execFileSync('npx', ['webpack', '--mode', 'production', '--config', 'webpack.cli.config.js'], { cwd: ROOT });
    expect(readFileSync(bin, 'utf8').startsWith('#!/usr/bin/env node\n')).toBe(true);
    const help = execFileSync(process.execPath, [bin, 'calc', '--help'], { encoding: 'utf8' });
    expect(help).toMatch(/Usage: fluxbook calc/);
  });
});
