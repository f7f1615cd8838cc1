/**
 * Round trip of workbooks written by hand from ECMA-376 (see ooxml.ts): read, recalculate, write
 * formulas with their values, read again.
 */
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { loadWorkbook, recalculate, WorkbookError } from '../../src/engine/xlsx';
import { xfmr, xfmrRange } from '../support/cells';
import { fml, handMadeXlsx, num, partText, row, str } from './ooxml';

const eff = (...args: unknown[]) => xfmr('EFF', ...args) as number;
const curve = (...args: unknown[]) => xfmrRange('EFFCURVE', ...args) as number[][];

async function save(wb: ExcelJS.Workbook): Promise<Buffer> {
  return Buffer.from(await wb.xlsx.writeBuffer());
}

function fleetWorkbook(points: number): Promise<Buffer> {
  return handMadeXlsx([
    {
      name: 'Fleet',
      rows: [
        row(1, str('A1', 'kVA'), str('B1', 'p0_w'), str('C1', 'pk_w'), str('D1', 'points'), str('E1', 'efficiency')),
        row(2, num('A2', 1000), num('B2', 1400), num('C2', 10500), num('D2', points), fml('E2', '_xldudf_XFMR_EFF(A2,B2,C2,0.5)'), fml('F2', '_xldudf_XFMR_EFFCURVE(A2,B2,C2,1,D2)')),
        row(3, str('A3', '123'), fml('E3', 'XFMR.EFF(A2,B2,C2,1)')),
        row(4, fml('E4', 'SUM(A2:C2)')),
        row(5, fml('E5', '_xldudf_XFMR_EFF(A2,B2,C2,A3)')),
      ].join(''),
    },
    { name: 'Summary Sheet', rows: row(1, fml('A1', 'Fleet!E2*100'), fml('B1', 'IF(_xldudf_XFMR_RATIOOK(27,13200,480),"ok","check")')) },
  ]);
}

describe('reading, recalculating and writing .xlsx', () => {
  it('computes our calls in both stored forms beside native formulas, across sheets', async () => {
    const wb = await loadWorkbook(await fleetWorkbook(4));
    const results = recalculate(wb);
    const byCell = Object.fromEntries(results.map((r) => [`${r.sheet}!${r.cell}`, r]));
    expect(byCell['Fleet!E2']!.value).toBeCloseTo(eff(1000, 1400, 10500, 0.5), 14);
    expect(byCell['Fleet!E2']!.formula).toBe('=XFMR.EFF(A2,B2,C2,0.5)');
    expect(byCell['Fleet!E3']!.value).toBeCloseTo(eff(1000, 1400, 10500, 1), 14);
    expect(byCell['Fleet!E4']!.value).toBe(12900);
    expect(byCell['Summary Sheet!A1']!.value).toBeCloseTo(100 * eff(1000, 1400, 10500, 0.5), 12);
    expect(byCell['Summary Sheet!B1']!.value).toBe('check');
    // 27 is 1.8 % off the nameplate 27.5: outside ±0.5 %.
    // "123" typed as text stays text: our function refuses it with its message.
    expect(byCell['Fleet!E5']!.value).toEqual({ error: '#VALUE!', message: 'argument load: "123" is text; a number is needed (per unit)' });
  });

  it('writes Excel’s _xldudf_ form with the computed value, and the error code of a refusal', async () => {
    const wb = await loadWorkbook(await fleetWorkbook(4));
    recalculate(wb);
    const xml = await partText(await save(wb), 'xl/worksheets/sheet1.xml');
    const e2 = /<c r="E2"[^>]*><f>([^<]*)<\/f><v>([^<]*)<\/v><\/c>/.exec(xml)!;
    expect(e2[1]).toBe('_xldudf_XFMR_EFF(A2,B2,C2,0.5)');
    expect(Number(e2[2])).toBeCloseTo(eff(1000, 1400, 10500, 0.5), 14);
    expect(xml).toMatch(/<c r="E3"[^>]*><f>_xldudf_XFMR_EFF\(A2,B2,C2,1\)<\/f><v>/);
    expect(xml).toMatch(/<c r="E5"[^>]*t="e"[^>]*><f>_xldudf_XFMR_EFF\(A2,B2,C2,A3\)<\/f><v>#VALUE!<\/v>/);
    expect(xml).not.toContain('XFMR.');
  });

  it('writes a spilled block as an array formula over its range with every value in place', async () => {
    const wb = await loadWorkbook(await fleetWorkbook(4));
    const results = recalculate(wb);
    const f2 = results.find((r) => r.cell === 'F2')!;
    const expected = curve(1000, 1400, 10500, 1, 4);
    expect(f2.spill!.ref).toBe('F2:H5');
    expect(f2.spill!.values.length).toBe(4);
    f2.spill!.values.forEach((r, i) => r.forEach((v, j) => expect(Math.abs((v as number) - expected[i]![j]!)).toBeLessThanOrEqual(1e-14 * Math.abs(expected[i]![j]!))));
    const xml = await partText(await save(wb), 'xl/worksheets/sheet1.xml');
    expect(xml).toMatch(/<c r="F2"[^>]*><f t="array" ref="F2:H5">_xldudf_XFMR_EFFCURVE\(A2,B2,C2,1,D2\)<\/f><v>0<\/v><\/c>/);
    const h5 = /<c r="H5"[^>]*><v>([^<]*)<\/v><\/c>/.exec(xml)!;
    expect(Number(h5[1])).toBeCloseTo(expected[3]![2]!, 9);
  });

  it('reads its own output again to the same results: the spill range is not taken as input', async () => {
    const first = await loadWorkbook(await fleetWorkbook(4));
    const a = recalculate(first);
    const second = await loadWorkbook(await save(first));
    const b = recalculate(second);
    expect(b).toEqual(a);
  });

  it('clears the cells of an old, larger block when the block shrinks', async () => {
    const first = await loadWorkbook(await fleetWorkbook(5));
    recalculate(first);
    const again = await loadWorkbook(await save(first));
    again.getWorksheet('Fleet')!.getCell('D2').value = 3;
    const results = recalculate(again);
    expect(results.find((r) => r.cell === 'F2')!.spill!.ref).toBe('F2:H4');
    const ws = again.getWorksheet('Fleet')!;
    expect(ws.getCell('F5').value).toBeNull();
    expect(ws.getCell('H6').value).toBeNull();
    expect(ws.getCell('H4').value).toBeCloseTo(curve(1000, 1400, 10500, 1, 3)[2]![2]!, 9);
  });

  it('refuses to spill over a value the user typed: #SPILL! in the anchor, the value kept', async () => {
    const bytes = await handMadeXlsx([{ name: 'S', rows: row(1, fml('A1', '_xldudf_XFMR_EFFCURVE(1000,1400,10500)')) + row(3, num('B3', 42)) }]);
    const wb = await loadWorkbook(bytes);
    const [r] = recalculate(wb);
    expect(r!.value).toMatchObject({ error: '#SPILL!' });
    expect(wb.getWorksheet('S')!.getCell('B3').value).toBe(42);
    const xml = await partText(await save(wb), 'xl/worksheets/sheet1.xml');
    expect(xml).toMatch(/<c r="A1"[^>]*t="e"[^>]*><f>[^<]*<\/f><v>#VALUE!<\/v>/); // a code the file format has
  });

  it('expands shared formulas into one formula per cell', async () => {
    const bytes = await handMadeXlsx([
      {
        name: 'S',
        rows: [
          row(1, num('A1', 0.25), fml('B1', '_xldudf_XFMR_EFF(1000,1400,10500,A1)', ' t="shared" ref="B1:B3" si="0"')),
          row(2, num('A2', 0.5), '<c r="B2"><f t="shared" si="0"/></c>'),
          row(3, num('A3', 0.75), '<c r="B3"><f t="shared" si="0"/></c>'),
        ].join(''),
      },
    ]);
    const wb = await loadWorkbook(bytes);
    const results = recalculate(wb);
    expect(results.map((r) => r.formula)).toEqual(['=XFMR.EFF(1000,1400,10500,A1)', '=XFMR.EFF(1000,1400,10500,A2)', '=XFMR.EFF(1000,1400,10500,A3)']);
    results.forEach((r, i) => expect(r.value).toBeCloseTo(eff(1000, 1400, 10500, [0.25, 0.5, 0.75][i]), 14));
    const xml = await partText(await save(wb), 'xl/worksheets/sheet1.xml');
    expect(xml).toContain('<f>_xldudf_XFMR_EFF(1000,1400,10500,A3)</f>');
  });

  it('recalculates an array formula from the file with array arithmetic', async () => {
    const bytes = await handMadeXlsx([
      { name: 'S', rows: row(1, num('A1', 2), num('B1', 3), fml('C1', 'SUM(A1:A2*B1:B2)', ' t="array" ref="C1"')) + row(2, num('A2', 4), num('B2', 5)) },
    ]);
    const wb = await loadWorkbook(bytes);
    expect(recalculate(wb)[0]!.value).toBe(26);
    expect(await partText(await save(wb), 'xl/worksheets/sheet1.xml')).toMatch(/<f t="array" ref="C1">SUM\(A1:A2\*B1:B2\)<\/f><v>26<\/v>/);
  });
});

describe('values as exceljs gives them', () => {
  it('a date is its Excel serial number (1 January 2025 is day 45658)', () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('S');
    ws.getCell('A1').value = new Date(Date.UTC(2025, 0, 1));
    ws.getCell('A1').numFmt = 'yyyy-mm-dd';
    ws.getCell('B1').value = { formula: 'A1+1' };
    ws.getCell('C1').value = { richText: [{ text: 'Dyn' }, { text: '11' }] };
    ws.getCell('D1').value = { formula: 'XFMR.SHIFT(C1)' };
    const results = recalculate(wb);
    // Day 0 of the 1900 date system is 30 December 1899 (from memory); 2025-01-01 is 45,658 days later.
    expect(results[0]!.value).toBe(45659);
    expect(results[1]!.value).toBe(330);
  });
});

describe('what is not an .xlsx workbook', () => {
  it('garbage, text and an empty file are refused with a reason', async () => {
    await expect(loadWorkbook(Buffer.from('kva,p0_w\n1000,1400\n'))).rejects.toThrow(/not an \.xlsx workbook/);
    await expect(loadWorkbook(Buffer.from([1, 2, 3, 4, 5, 6]))).rejects.toBeInstanceOf(WorkbookError);
    await expect(loadWorkbook(Buffer.alloc(0))).rejects.toThrow(/empty/);
    await expect(loadWorkbook(Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]))).rejects.toThrow(/\.xls/);
  });

  it('a ZIP that is not a workbook, and a cut-off workbook, are refused', async () => {
    const JSZip = (await import('jszip')).default;
    const zip = new JSZip();
    zip.file('notes.txt', 'hello');
    await expect(loadWorkbook(await zip.generateAsync({ type: 'nodebuffer' }))).rejects.toBeInstanceOf(WorkbookError);
    const whole = await fleetWorkbook(4);
    await expect(loadWorkbook(whole.subarray(0, Math.floor(whole.length / 2)))).rejects.toBeInstanceOf(WorkbookError);
  });
});
