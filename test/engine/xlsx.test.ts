/**
 * Round trip of workbooks written by hand from ECMA-376 (see ooxml.ts) through the engine's one
 * call: read, recalculate, write formulas with their values, read again.
 */
import { describe, expect, it } from 'vitest';
import { withDynamicArrayBlock } from '../../src/engine/patch';
import { findDynamicArrayCm } from '../../src/engine/read';
import { calculateWorkbook, WorkbookError } from '../../src/engine/xlsx';
import { xfmr, xfmrRange } from '../support/cells';
import { fml, handMadeXlsx, num, partText, replacePart, row, str } from './ooxml';

const eff = (...args: unknown[]) => xfmr('EFF', ...args) as number;
const curve = (...args: unknown[]) => xfmrRange('EFFCURVE', ...args) as number[][];

const recalc = (bytes: Buffer) => calculateWorkbook(bytes);
const sheetXml = async (bytes: Buffer, n = 1) => partText(bytes, `xl/worksheets/sheet${n}.xml`);

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
    const { results } = await recalc(await fleetWorkbook(4));
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

  it('writes Excel’s _xldudf_ form with the computed value, the error code of a refusal, and text as a formula string', async () => {
    const { bytes } = await recalc(await fleetWorkbook(4));
    const xml = await sheetXml(bytes);
    const e2 = /<c r="E2"[^>]*><f>([^<]*)<\/f><v>([^<]*)<\/v><\/c>/.exec(xml)!;
    expect(e2[1]).toBe('_xldudf_XFMR_EFF(A2,B2,C2,0.5)');
    expect(Number(e2[2])).toBeCloseTo(eff(1000, 1400, 10500, 0.5), 14);
    expect(xml).toMatch(/<c r="E3"[^>]*><f>_xldudf_XFMR_EFF\(A2,B2,C2,1\)<\/f><v>/);
    expect(xml).toMatch(/<c r="E5"[^>]*t="e"[^>]*><f>_xldudf_XFMR_EFF\(A2,B2,C2,A3\)<\/f><v>#VALUE!<\/v>/);
    expect(xml).not.toContain('XFMR.');
    expect(await sheetXml(bytes, 2)).toMatch(/<c r="B1" t="str"><f>IF\(_xldudf_XFMR_RATIOOK\(27,13200,480\),&quot;ok&quot;,&quot;check&quot;\)<\/f><v>check<\/v><\/c>/);
  });

  it('writes a spilled block as a dynamic array: an array formula over its range, cm on the anchor, every value in place', async () => {
    const { results, bytes, changedParts } = await recalc(await fleetWorkbook(4));
    const f2 = results.find((r) => r.cell === 'F2')!;
    const expected = curve(1000, 1400, 10500, 1, 4);
    expect(f2.spill!.ref).toBe('F2:H5');
    expect(f2.spill!.values.length).toBe(4);
    f2.spill!.values.forEach((r, i) => r.forEach((v, j) => expect(Math.abs((v as number) - expected[i]![j]!)).toBeLessThanOrEqual(1e-14 * Math.abs(expected[i]![j]!))));
    const xml = await sheetXml(bytes);
    expect(xml).toMatch(/<c r="F2" cm="1"><f t="array" ref="F2:H5">_xldudf_XFMR_EFFCURVE\(A2,B2,C2,1,D2\)<\/f><v>0<\/v><\/c>/);
    const h5 = /<c r="H5"[^>]*><v>([^<]*)<\/v><\/c>/.exec(xml)!;
    expect(Number(h5[1])).toBeCloseTo(expected[3]![2]!, 9);
    // [MS-XLSX]: the dynamic-array cell metadata, its content type and its workbook relationship.
    const metadata = await partText(bytes, 'xl/metadata.xml');
    expect(metadata).toMatch(/<metadataType name="XLDAPR"[^>]*cellMeta="1"/);
    expect(metadata).toMatch(/<xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"\/>/);
    expect(metadata).toMatch(/<cellMetadata count="1"><bk><rc t="1" v="0"\/><\/bk><\/cellMetadata>/);
    expect(await partText(bytes, '[Content_Types].xml')).toContain('<Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/>');
    expect(await partText(bytes, 'xl/_rels/workbook.xml.rels')).toMatch(/Type="http:\/\/schemas.openxmlformats.org\/officeDocument\/2006\/relationships\/sheetMetadata" Target="metadata.xml"/);
    expect(changedParts.sort()).toEqual(['[Content_Types].xml', 'xl/_rels/workbook.xml.rels', 'xl/metadata.xml', 'xl/worksheets/sheet1.xml', 'xl/worksheets/sheet2.xml']);
  });

  it('reads its own output again to the same results, keeps the metadata it has, and changes nothing the second time', async () => {
    const first = await recalc(await fleetWorkbook(4));
    const second = await recalc(first.bytes);
    expect(second.results).toEqual(first.results);
    expect(second.changedParts).toEqual([]);
    for (const part of ['xl/metadata.xml', 'xl/worksheets/sheet1.xml', '[Content_Types].xml']) expect(await partText(second.bytes, part)).toBe(await partText(first.bytes, part));
  });

  it('adds the dynamic-array block to a metadata part the workbook has for rich values, keeping every byte of what it held', async () => {
    // A workbook with a picture in a cell keeps its rich-value metadata in xl/metadata.xml
    // ([MS-XLSX] 2.3.x richdata: metadata type XLRICHVALUE, futureMetadata with xlrd:rvb, and
    // valueMetadata that cells point to with vm). Written by hand from that structure.
    const richType = '<metadataType name="XLRICHVALUE" minSupportedVersion="120000" copy="1" pasteAll="1" pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" coerce="1"/>';
    const richFuture = '<futureMetadata name="XLRICHVALUE" count="1"><bk><extLst><ext uri="{3e2802c4-a4d2-4d8b-9148-e3be6c30e623}"><xlrd:rvb i="0"/></ext></extLst></bk></futureMetadata>';
    const richValues = '<valueMetadata count="1"><bk><rc t="1" v="0"/></bk></valueMetadata>';
    const metadata = `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<metadata xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:xlrd="http://schemas.microsoft.com/office/spreadsheetml/2017/richdata"><metadataTypes count="1">${richType}</metadataTypes>${richFuture}${richValues}</metadata>`;
    let bytes = await handMadeXlsx([{ name: 'S', rows: row(1, fml('A1', '_xldudf_XFMR_EFFCURVE(1000,1400,10500,1,3)')) }]);
    bytes = await replacePart(bytes, 'xl/metadata.xml', metadata);
    bytes = await replacePart(bytes, 'xl/_rels/workbook.xml.rels', (await partText(bytes, 'xl/_rels/workbook.xml.rels')).replace('</Relationships>', '<Relationship Id="rId9" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata" Target="metadata.xml"/></Relationships>'));
    bytes = await replacePart(bytes, '[Content_Types].xml', (await partText(bytes, '[Content_Types].xml')).replace('</Types>', '<Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/></Types>'));

    const { bytes: out, changedParts } = await recalc(bytes);
    expect(changedParts.sort()).toEqual(['xl/metadata.xml', 'xl/worksheets/sheet1.xml']);
    const grown = await partText(out, 'xl/metadata.xml');
    // The XLDAPR type is the second type, its block the first of its own futureMetadata, and the
    // cell block the first of a new cellMetadata, placed before valueMetadata as CT_Metadata orders them.
    expect(grown).toContain(`<metadataTypes count="2">${richType}<metadataType name="XLDAPR"`);
    expect(grown).toContain(`</metadataTypes>${richFuture}<futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}"><xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata><cellMetadata count="1"><bk><rc t="2" v="0"/></bk></cellMetadata>${richValues}</metadata>`);
    expect(grown).toContain('xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray"');
    expect(await sheetXml(out)).toMatch(/<c r="A1" cm="1"><f t="array" ref="A1:C3">/);
    // Read again, the file has a dynamic-array block: nothing changes the second time.
    expect((await recalc(out)).changedParts).toEqual([]);
  });

  it('adds its block after the ones a metadata part already has, with a prefix if the part uses one', () => {
    const main = 'http://schemas.openxmlformats.org/spreadsheetml/2006/main';
    const withOther = `<x:metadata xmlns:x="${main}"><x:metadataTypes count="1"><x:metadataType name="OTHER"/></x:metadataTypes><x:futureMetadata name="OTHER" count="1"><x:bk/></x:futureMetadata><x:cellMetadata count="1"><x:bk><x:rc t="1" v="0"/></x:bk></x:cellMetadata></x:metadata>`;
    const grown = withDynamicArrayBlock(withOther, 'xl/metadata.xml')!;
    expect(grown.cm).toBe(2);
    expect(grown.text).toContain('<x:cellMetadata count="2"><x:bk><x:rc t="1" v="0"/></x:bk><x:bk><x:rc t="2" v="0"/></x:bk></x:cellMetadata>');
    expect(findDynamicArrayCm(grown.text, 'xl/metadata.xml')).toBe(2);
    // An XLDAPR future block without a cell block pointing at it: the new block comes after it.
    const halfway = `<metadata xmlns="${main}"><metadataTypes count="1"><metadataType name="XLDAPR"/></metadataTypes><futureMetadata name="XLDAPR" count="1"><bk/></futureMetadata></metadata>`;
    const completed = withDynamicArrayBlock(halfway, 'xl/metadata.xml')!;
    expect(completed.cm).toBe(1);
    expect(completed.text).toContain('<cellMetadata count="1"><bk><rc t="1" v="1"/></bk></cellMetadata></metadata>');
    // Forms it does not extend are left to legacy array formulas.
    expect(withDynamicArrayBlock(`<metadata xmlns="${main}"/>`, 'xl/metadata.xml')).toBeUndefined();
    expect(withDynamicArrayBlock(`<metadata xmlns="${main}" xmlns:xda="urn:something-else"><metadataTypes count="0"></metadataTypes></metadata>`, 'xl/metadata.xml')).toBeUndefined();
  });

  it('clears the cells of an old, larger block when the block shrinks', async () => {
    const first = await recalc(await fleetWorkbook(5));
    const xml = (await sheetXml(first.bytes)).replace('<c r="D2"><v>5</v></c>', '<c r="D2"><v>3</v></c>');
    const again = await recalc(await replacePart(first.bytes, 'xl/worksheets/sheet1.xml', xml));
    expect(again.results.find((r) => r.cell === 'F2')!.spill!.ref).toBe('F2:H4');
    const out = await sheetXml(again.bytes);
    expect(out).toContain('<c r="F5"/>');
    expect(out).toContain('<c r="H6"/>');
    expect(Number(/<c r="H4"><v>([^<]*)<\/v>/.exec(out)![1])).toBeCloseTo(curve(1000, 1400, 10500, 1, 3)[2]![2]!, 9);
  });

  it('refuses to spill over a value the user typed: #SPILL! in the anchor, the value kept', async () => {
    const bytes = await handMadeXlsx([{ name: 'S', rows: row(1, fml('A1', '_xldudf_XFMR_EFFCURVE(1000,1400,10500)')) + row(3, num('B3', 42)) }]);
    const { results, bytes: out } = await recalc(bytes);
    expect(results[0]!.value).toMatchObject({ error: '#SPILL!' });
    const xml = await sheetXml(out);
    expect(xml).toContain('<c r="B3"><v>42</v></c>');
    expect(xml).toMatch(/<c r="A1"[^>]*t="e"[^>]*><f>[^<]*<\/f><v>#VALUE!<\/v>/); // a code the file format has
  });

  it('expands shared formulas for the engine and keeps them shared in the file', async () => {
    const bytes = await handMadeXlsx([
      {
        name: 'S',
        rows: [
          row(1, num('A1', 0.25), fml('B1', '_xldudf_XFMR_EFF(1000,1400,10500,A1)', ' t="shared" ref="B1:B3" si="0"'), fml('C1', '$A$1+A1*2', ' t="shared" ref="C1:C3" si="1"')),
          row(2, num('A2', 0.5), '<c r="B2"><f t="shared" si="0"/></c>', '<c r="C2"><f t="shared" si="1"/></c>'),
          row(3, num('A3', 0.75), '<c r="B3"><f t="shared" si="0"/></c>', '<c r="C3"><f t="shared" si="1"/></c>'),
        ].join(''),
      },
    ]);
    const { results, bytes: out } = await recalc(bytes);
    expect(results.map((r) => r.formula)).toEqual([
      '=XFMR.EFF(1000,1400,10500,A1)',
      '=$A$1+A1*2',
      '=XFMR.EFF(1000,1400,10500,A2)',
      '=$A$1+A2*2',
      '=XFMR.EFF(1000,1400,10500,A3)',
      '=$A$1+A3*2',
    ]);
    [0.25, 0.5, 0.75].forEach((x, i) => {
      expect(results[2 * i]!.value).toBeCloseTo(eff(1000, 1400, 10500, x), 14);
      expect(results[2 * i + 1]!.value).toBeCloseTo(0.25 + 2 * x, 14);
    });
    const xml = await sheetXml(out);
    expect(xml).toMatch(/<c r="B3"><f t="shared" si="0"\/><v>0\.99\d+<\/v><\/c>/);
  });

  it('recalculates an array formula from the file with array arithmetic', async () => {
    const bytes = await handMadeXlsx([
      { name: 'S', rows: row(1, num('A1', 2), num('B1', 3), fml('C1', 'SUM(A1:A2*B1:B2)', ' t="array" ref="C1"')) + row(2, num('A2', 4), num('B2', 5)) },
    ]);
    const { results, bytes: out } = await recalc(bytes);
    expect(results[0]!.value).toBe(26);
    expect(await sheetXml(out)).toMatch(/<f t="array" ref="C1">SUM\(A1:A2\*B1:B2\)<\/f><v>26<\/v>/);
  });

  it('reads defined names that are ranges, formulas and constants, on the workbook and on a sheet', async () => {
    const bytes = await handMadeXlsx(
      [
        { name: 'Inputs', rows: row(1, num('A1', 1000), num('B1', 1400), num('C1', 10500)) },
        { name: 'Calc', rows: row(1, fml('A1', '_xldudf_XFMR_EFF(Rating,Inputs!B1,Inputs!C1,HalfLoad)'), fml('B1', 'TwiceRating'), fml('C1', 'Local')) },
      ],
      '<definedNames><definedName name="Rating">Inputs!$A$1</definedName><definedName name="HalfLoad">0.5</definedName><definedName name="TwiceRating">Inputs!$A$1*2</definedName><definedName name="Local" localSheetId="1">7</definedName><definedName name="_xlnm.Print_Area" localSheetId="0">Inputs!$A$1:$C$1</definedName></definedNames>',
    );
    const { results } = await recalc(bytes);
    expect(results[0]!.value).toBeCloseTo(eff(1000, 1400, 10500, 0.5), 14);
    expect(results[1]!.value).toBe(2000);
    expect(results[2]!.value).toBe(7);
  });
});

describe('values of every kind a cell holds', () => {
  it('a date is its serial number, shared strings and rich text are text, TRUE is a boolean', async () => {
    const bytes = await handMadeXlsx([
      {
        name: 'S',
        rows: row(
          1,
          '<c r="A1" t="d"><v>2025-01-01T00:00:00</v></c>',
          fml('B1', 'A1+1'),
          '<c r="C1" t="inlineStr"><is><r><t>Dyn</t></r><r><t>11</t></r></is></c>',
          fml('D1', 'XFMR.SHIFT(C1)'),
          '<c r="E1" t="b"><v>1</v></c>',
          fml('F1', 'NOT(E1)'),
        ),
      },
    ]);
    const { results, bytes: out } = await recalc(bytes);
    // Day 0 of the 1900 date system is 30 December 1899 (from memory); 2025-01-01 is 45,658 days later.
    expect(results[0]!.value).toBe(45659);
    expect(results[1]!.value).toBe(330);
    expect(results[2]!.value).toBe(false);
    expect(await sheetXml(out)).toMatch(/<c r="F1" t="b"><f>NOT\(E1\)<\/f><v>0<\/v><\/c>/);
  });
});

describe('what is not an .xlsx workbook', () => {
  it('garbage, text and an empty file are refused with a reason', async () => {
    await expect(recalc(Buffer.from('kva,p0_w\n1000,1400\n'))).rejects.toThrow(/not an \.xlsx workbook/);
    await expect(recalc(Buffer.from([1, 2, 3, 4, 5, 6]))).rejects.toBeInstanceOf(WorkbookError);
    await expect(recalc(Buffer.alloc(0))).rejects.toThrow(/empty/);
    await expect(recalc(Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]))).rejects.toThrow(/\.xls/);
  });

  it('a ZIP that is not a workbook, and a cut-off workbook, are refused', async () => {
    const JSZip = (await import('jszip')).default;
    const zip = new JSZip();
    zip.file('notes.txt', 'hello');
    await expect(recalc(await zip.generateAsync({ type: 'nodebuffer' }))).rejects.toBeInstanceOf(WorkbookError);
    const whole = await fleetWorkbook(4);
    await expect(recalc(whole.subarray(0, Math.floor(whole.length / 2)))).rejects.toBeInstanceOf(WorkbookError);
  });
});
