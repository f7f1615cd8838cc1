/** The package check before exceljs: what it counts, and the limits it applies (test/cli/bad-input.test.ts runs them through the command). */
import { describe, expect, it } from 'vitest';
import { checkPackage, defaultLimits, estimatedMemory, WORKBOOK_MEMORY, WorkbookError } from '../../src/engine/package';
import { part, SHEET_HEAD, SHEET_PART, SHEET_TAIL, workbookParts, zipOf } from '../cli/fixtures/zips';
import { fml, handMadeXlsx, num, row, str } from './ooxml';

describe('checkPackage', () => {
  it('counts the rows, cells and formula cells of every sheet', async () => {
    const bytes = await handMadeXlsx([
      { name: 'A', rows: row(1, num('A1', 1), str('B1', 'a <c> in text is escaped'), fml('C1', 'A1*2')) + row(2, num('A2', 2)) },
      { name: 'B', rows: row(1, fml('A1', '_xldudf_XFMR_IRATED(1000,400)')) },
    ]);
    const c = await checkPackage(bytes);
    expect(c).toMatchObject({ rows: 3, cells: 5, formulas: 2 });
    expect(c.unpackedBytes).toBeGreaterThan(1000);
  });

  it('counts tags with a namespace prefix and not the look-alikes (<col>, <cfRule>, end tags)', async () => {
    const sheet = `${SHEET_HEAD}<x:row><x:c><x:f>1+1</x:f></x:c><x:c/></x:row><cols><col min="1"/></cols><cfRule/>${SHEET_TAIL}`;
    const c = await checkPackage(zipOf([...workbookParts(), part(SHEET_PART, sheet)]));
    expect(c).toMatchObject({ rows: 1, cells: 2, formulas: 1 });
  });

  it('refuses a workbook whose estimated memory exceeds the limit, and names the counts', async () => {
    const bytes = await handMadeXlsx([{ name: 'A', rows: row(1, num('A1', 1)) }]);
    const need = estimatedMemory({ rows: 1, cells: 1, formulas: 0 });
    expect(need).toBe(WORKBOOK_MEMORY.base + WORKBOOK_MEMORY.perRow + WORKBOOK_MEMORY.perCell);
    await expect(checkPackage(bytes, { ...defaultLimits(), memoryBytes: need })).resolves.toMatchObject({ rows: 1 });
    await expect(checkPackage(bytes, { ...defaultLimits(), memoryBytes: need - 1 })).rejects.toThrow(/too large to recalculate here: 1 row, 1 cell and 0 formulas/);
    await expect(checkPackage(bytes, { ...defaultLimits(), memoryBytes: need - 1 })).rejects.toBeInstanceOf(WorkbookError);
  });

  it('refuses by the sizes the directory declares, before unpacking anything', async () => {
    const bytes = await handMadeXlsx([{ name: 'A', rows: row(1, num('A1', 1)) }]);
    await expect(checkPackage(bytes, { ...defaultLimits(), maxUnpackedBytes: 100 })).rejects.toThrow(/would unpack to \d+ bytes, more than the 100 bytes Fluxbook reads/);
    await expect(checkPackage(bytes, { ...defaultLimits(), maxPartBytes: 100 })).rejects.toThrow(/part .* would unpack to \d+ bytes, more than the 100 bytes one part may have/);
  });
});
