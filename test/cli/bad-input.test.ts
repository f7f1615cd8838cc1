/**
 * `fluxbook calc` under bad input: a package cut in half, ZIP bombs (a directory that declares
 * gigabytes, a part that unpacks far past what it declares, a sheet of hundreds of MB of rows), a
 * million-row sheet, circular references and unknown XFMR names. Each run ends with exit code 0 or
 * 2 and at most one line on stderr, leaves the input as it was, and leaves in the output folder
 * either the whole output or nothing — no temp file.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_PART_BYTES, MAX_UNPACKED_BYTES } from '../../src/engine/package';
import { fml, handMadeXlsx, num, row } from '../engine/ooxml';
import { loadColumnWorkbook, part, repeatedDeflate, SHEET_HEAD, SHEET_PART, SHEET_TAIL, workbookParts, zipOf, type RawPart } from './fixtures/zips';
import { fluxbookWith } from './run';

let root: string;

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'fluxbook-bad-'));
});

afterAll(() => {
  execFileSync('rm', ['-rf', root]);
});

/** Each case in a folder of its own, so "nothing else in the folder" can be checked. */
function caseFolder(name: string, bytes: Buffer): { input: string; out: string; folder: string } {
  const folder = join(root, name);
  mkdirSync(folder);
  const input = join(folder, 'in.xlsx');
  writeFileSync(input, bytes);
  return { input, out: join(folder, 'out.xlsx'), folder };
}

/** Runs calc on a case; checks the input is untouched and the folder holds IN (and OUT on success) only. */
function calc(name: string, bytes: Buffer, options: { heapMb?: number; json?: boolean } = {}) {
  const c = caseFolder(name, bytes);
  const env: Record<string, string> = options.heapMb ? { NODE_OPTIONS: `--max-old-space-size=${options.heapMb}` } : {};
  const r = fluxbookWith(env, 'calc', c.input, '--out', c.out, ...(options.json ? ['--json'] : []));
  expect(readFileSync(c.input).equals(bytes)).toBe(true);
  expect(readdirSync(c.folder).sort()).toEqual(r.status === 0 ? ['in.xlsx', 'out.xlsx'] : ['in.xlsx']);
  expect(r.stderr.trim().split('\n').filter(Boolean).length).toBeLessThanOrEqual(1);
  return { ...r, out: c.out };
}

const refused = (r: { status: number | null; stderr: string }, message: RegExp) => {
  expect(r.status).toBe(2);
  expect(r.stderr).toMatch(/^fluxbook: /);
  expect(r.stderr).toMatch(message);
};

/** A sheet part that unpacks to about `mib` MiB of `chunk` repeated: a few hundred kB packed. */
function bigSheet(chunk: string, mib: number, declared?: number): RawPart {
  const oneMib = chunk.repeat(Math.ceil((1024 * 1024) / chunk.length));
  const { deflated, size } = repeatedDeflate(SHEET_HEAD, oneMib, mib, SHEET_TAIL);
  return { name: SHEET_PART, deflated, declaredSize: declared ?? size, crc: 0 };
}

describe('a damaged package', () => {
  it('a valid .xlsx cut in half: refused as incomplete', async () => {
    const whole = await handMadeXlsx([{ name: 'Fleet', rows: row(1, num('A1', 1000), fml('B1', '_xldudf_XFMR_IRATED(A1,400)')) }]);
    const r = calc('half', whole.subarray(0, Math.floor(whole.length / 2)));
    refused(r, /cannot be read: it is incomplete .*cut short/);
  });
});

describe('ZIP bombs are refused before they are unpacked', () => {
  it(`a directory that declares more than ${MAX_UNPACKED_BYTES / 2 ** 30} GiB in all (three parts of 400 MiB)`, () => {
    const claim = (p: RawPart, i: number): RawPart => ({ ...p, name: `xl/media/image${i}.bin`, declaredSize: 400 * 2 ** 20 });
    const tiny = part('x', 'x');
    const bytes = zipOf([...workbookParts(), part(SHEET_PART, `${SHEET_HEAD}${SHEET_TAIL}`), claim(tiny, 1), claim(tiny, 2), claim(tiny, 3)]);
    const r = calc('declares-1.2GiB', bytes, { heapMb: 384 });
    refused(r, /would unpack to 1\.2 GiB, more than the 1\.0 GiB Fluxbook reads/);
    expect(r.seconds).toBeLessThan(20);
  });

  it(`one part that declares more than ${MAX_PART_BYTES / 2 ** 20} MiB (a 4 GiB sheet)`, () => {
    const bytes = zipOf([...workbookParts(), { ...part(SHEET_PART, `${SHEET_HEAD}${SHEET_TAIL}`), declaredSize: 0xffff_fff0 }]);
    refused(calc('declares-4GiB', bytes, { heapMb: 384 }), /part xl\/worksheets\/sheet1\.xml would unpack to 4\.0 GiB, more than the 500 MiB one part may have/);
  });

  it('a part that declares 2 kB but unpacks to 300 MiB: stopped at the 2 kB, within a 384 MB heap', () => {
    const sheet = bigSheet('<!-- padding -->', 300, 2000);
    expect(sheet.deflated.length).toBeLessThan(2 * 2 ** 20);
    const r = calc('lies-300MiB', zipOf([...workbookParts(), sheet]), { heapMb: 384 });
    refused(r, /part xl\/worksheets\/sheet1\.xml unpacks to more than the 2,000 bytes its ZIP directory entry declares/);
  });

  it('an honest sheet of 400 MiB of rows (a few MB packed): refused as too large for the memory, within a 384 MB heap', () => {
    const sheet = bigSheet('<row><c><v>1</v></c></row>', 400);
    expect(sheet.declaredSize).toBeGreaterThan(400 * 2 ** 20);
    const r = calc('rows-400MiB', zipOf([...workbookParts(), sheet]), { heapMb: 384 });
    refused(r, /too large to recalculate here: its worksheets unpack to 400 MiB of XML, which needs about .* of memory, more than the \d+ MiB Node\.js may use; .*NODE_OPTIONS=--max-old-space-size/);
    expect(r.seconds).toBeLessThan(20);
  });
});

describe('a sheet of a million rows', () => {
  it('1,000,000 rows with a heap of 256 MiB: refused in seconds, before the sheet is parsed', () => {
    const r = calc('million-256MiB', loadColumnWorkbook(1_000_000), { heapMb: 256 });
    refused(r, /too large to recalculate here: its worksheets unpack to \d+ MiB of XML, which needs about .* of memory, more than the 2\d\d MiB/);
    expect(r.seconds).toBeLessThan(20);
  });

  it('1,000,000 rows with the default heap: recalculated, one formula over the whole column', () => {
    const rows = 1_000_000;
    const r = calc('million', loadColumnWorkbook(rows), { json: true });
    expect(r.status).toBe(0);
    const [cell] = JSON.parse(r.stdout) as { cell: string; value: number }[];
    let kwh = 0;
    kwh += 1000 + 10_000 * 0.5 ** 2; // row 1
    for (let i = 2; i <= rows; i++) kwh += 1000 + 10_000 * (((i * 37) % 90) / 100 + 0.1) ** 2;
    expect(cell!.value).toBeCloseTo(kwh / 1000, 4); // energy lost, Σ (P0 + Pk·x²)·1 h
    console.log(`1,000,000 rows: ${r.seconds.toFixed(1)} s`);
  });
});

describe('formulas that have no value', () => {
  it('a circular reference: each formula in or after the cycle gets #CYCLE! with a message, the others a value, and the run ends', async () => {
    const bytes = await handMadeXlsx([
      {
        name: 'Loop',
        rows: row(1, fml('A1', 'B1+1'), fml('B1', 'A1+1'), fml('C1', '_xldudf_XFMR_EFF(1000,1400,10500,A1)'), fml('D1', '_xldudf_XFMR_LOSSES(1000,10000,D1)'), fml('E1', '_xldudf_XFMR_EFF(1000,1400,10500,0.5)')),
      },
    ]);
    const r = calc('cycle', bytes, { json: true });
    expect(r.status).toBe(0);
    const cells = JSON.parse(r.stdout) as { cell: string; value: unknown }[];
    const byCell = Object.fromEntries(cells.map((c) => [c.cell, c.value]));
    for (const c of ['A1', 'B1', 'C1', 'D1']) expect(byCell[c]).toMatchObject({ error: '#CYCLE!', message: expect.stringMatching(/^circular reference through Loop!/) });
    expect(byCell.E1).toBeCloseTo(500_000 / (500_000 + 1400 + 10500 / 4), 14);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(r.out);
    expect(wb.getWorksheet('Loop')!.getCell('D1').result).toEqual({ error: '#VALUE!' }); // a file has no #CYCLE!
    const plain = fluxbookWith({}, 'calc', join(root, 'cycle', 'in.xlsx'), '--out', join(root, 'cycle', 'again.xlsx'));
    expect(plain.stderr).toMatch(/5 formulas recalculated \(3 with XFMR functions\), 4 error values: 4 #CYCLE! \(a circular reference, stored as #VALUE!\); 2 of them from XFMR formulas/);
  });

  it('an unknown XFMR name: #NAME? there, the rest of the workbook recalculated, the formula kept as written', async () => {
    const bytes = await handMadeXlsx([
      { name: 'Fleet', rows: row(1, num('A1', 1000), fml('B1', '_xldudf_XFMR_NOSUCH(A1)'), fml('C1', '_xldudf_XFMR_IRATED(A1,400)'), fml('D1', 'XFMR.NOSUCH(A1)+1')) },
    ]);
    const r = calc('nosuch', bytes, { json: true });
    expect(r.status).toBe(0);
    const byCell = Object.fromEntries((JSON.parse(r.stdout) as { cell: string; value: unknown }[]).map((c) => [c.cell, c.value]));
    expect(byCell.B1).toMatchObject({ error: '#NAME?', message: 'Function name XFMR.NOSUCH not recognized.' });
    expect(byCell.D1).toMatchObject({ error: '#NAME?' });
    expect(byCell.C1).toBeCloseTo(1_000_000 / (Math.sqrt(3) * 400), 9); // I = S / (√3·V), common practice
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(r.out);
    const ws = wb.getWorksheet('Fleet')!;
    expect(ws.getCell('B1').formula).toBe('_xldudf_XFMR_NOSUCH(A1)');
    expect(ws.getCell('B1').result).toEqual({ error: '#NAME?' });
    expect(ws.getCell('D1').formula).toBe('XFMR.NOSUCH(A1)+1');
  });
});
