/**
 * Round trip of a workbook with everything users keep beside their cells — a chart, a picture, a
 * comment (and its VML shape), data validation, conditional formatting, a table, defined names, an
 * unknown extension, shared formulas and a second sheet that reads the XFMR results
 * (fixtures/everything.ts, written by hand from ECMA-376): every part is there afterwards, every
 * part the results did not touch is byte for byte the same, and in the sheets that were touched
 * only `<c>` elements differ.
 */
import JSZip from 'jszip';
import { beforeAll, describe, expect, it } from 'vitest';
import { calculateWorkbook, type Calculated } from '../../src/engine/xlsx';
import { everythingParts, everythingXlsx, UNITS } from './fixtures/everything';

async function unpacked(bytes: Buffer): Promise<Map<string, Buffer>> {
  const zip = await JSZip.loadAsync(bytes);
  const out = new Map<string, Buffer>();
  for (const f of Object.values(zip.files)) if (!f.dir) out.set(f.name, await f.async('nodebuffer'));
  return out;
}

/** The text with every cell element taken out: what must stay the same when only cells change. */
const withoutCells = (xml: string): string => xml.replace(/<c\b[^>]*\/>|<c\b[^>]*>[\s\S]*?<\/c>/g, '');

// Efficiency = output / (output + losses), losses = P0 + x²·Pk at unity power factor (common practice).
const efficiency = (kva: number, p0: number, pk: number, x: number) => (x * kva * 1000) / (x * kva * 1000 + p0 + x * x * pk);

let input: Buffer;
let result: Calculated;
let before: Map<string, Buffer>;
let after: Map<string, Buffer>;

beforeAll(async () => {
  input = await everythingXlsx();
  result = await calculateWorkbook(input);
  before = await unpacked(input);
  after = await unpacked(result.bytes);
});

describe('a workbook with charts, pictures, comments, validation, formats, a table and names', () => {
  it('has every part afterwards, and no other', () => {
    expect([...after.keys()].sort()).toEqual(Object.keys(everythingParts()).sort());
  });

  it('copies every part but the two worksheets byte for byte', () => {
    expect(result.changedParts.sort()).toEqual(['xl/worksheets/sheet1.xml', 'xl/worksheets/sheet2.xml']);
    for (const [name, bytes] of before) {
      if (result.changedParts.includes(name)) continue;
      expect(after.get(name)!.equals(bytes), name).toBe(true);
    }
  });

  it('changes only <c> elements in the worksheets it rewrote, and only formula cells among them', () => {
    for (const name of result.changedParts) {
      const old = before.get(name)!.toString('utf8');
      const now = after.get(name)!.toString('utf8');
      expect(withoutCells(now)).toBe(withoutCells(old));
      const cells = (xml: string) => [...xml.matchAll(/<c\b[^>]*\/>|<c\b[^>]*>[\s\S]*?<\/c>/g)].map((m) => m[0]);
      const a = cells(old);
      const b = cells(now);
      expect(b).toHaveLength(a.length);
      a.forEach((c, i) => {
        if (!c.includes('<f')) expect(b[i]).toBe(c); // values, labels, styles: untouched
      });
    }
    const sheet1 = after.get('xl/worksheets/sheet1.xml')!.toString('utf8');
    expect(sheet1).toContain('<c r="E3" s="1"><f t="shared" si="0"/><v>'); // the shared formula stays shared, the style stays
    expect(sheet1).toContain('<extLst><ext uri="{00000000-0000-0000-0000-F1E1D0000001}">');
  });

  it('computes the right values, through shared formulas, a defined constant and the second sheet', () => {
    const byCell = Object.fromEntries(result.results.map((r) => [`${r.sheet}!${r.cell}`, r.value]));
    UNITS.forEach(([kva, p0, pk, load], i) => {
      expect(byCell[`Fleet!E${i + 2}`]).toBeCloseTo(efficiency(kva, p0, pk, load), 14);
      expect(byCell[`Fleet!F${i + 2}`]).toBeCloseTo(efficiency(kva, p0, pk, 0.5), 14); // HalfLoad = 0.5
    });
    const e = UNITS.map(([kva, p0, pk, load]) => efficiency(kva, p0, pk, load));
    expect(byCell['Summary!A1']).toBeCloseTo(100 * e[0]!, 12);
    expect(byCell['Summary!B1']).toBeCloseTo((e[0]! + e[1]! + e[2]!) / 3, 12);
    expect(byCell['Summary!C1']).toBe(Math.min(...e) > 0.99 ? 'all above 99 %' : 'check');
    expect(result.errors).toBe(0);
    const summary = after.get('xl/worksheets/sheet2.xml')!.toString('utf8');
    expect(summary).toMatch(/<c r="C1" t="str"><f>[^<]*<\/f><v>(all above 99 %|check)<\/v><\/c>/);
  });
});
