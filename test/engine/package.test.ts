/** The package check in front of the reader: the limits it applies to what the ZIP directory declares (test/cli/bad-input.test.ts runs them through the command). */
import { describe, expect, it } from 'vitest';
import { checkPackage, defaultLimits, estimatedMemory, WORKBOOK_MEMORY, WorkbookError } from '../../src/engine/package';
import { openZip } from '../../src/engine/zip';
import { fml, handMadeXlsx, num, row, str } from './ooxml';

const entries = async (bytes: Buffer) => (await openZip(bytes)).entries;

describe('checkPackage', () => {
  it('adds up the unpacked sizes the directory declares, worksheets apart', async () => {
    const bytes = await handMadeXlsx([
      { name: 'A', rows: row(1, num('A1', 1), str('B1', 'a <c> in text is escaped'), fml('C1', 'A1*2')) + row(2, num('A2', 2)) },
      { name: 'B', rows: row(1, fml('A1', '_xldudf_XFMR_IRATED(1000,400)')) },
    ]);
    const c = checkPackage(await entries(bytes));
    expect(c.sheetBytes).toBeGreaterThan(300);
    expect(c.unpackedBytes).toBeGreaterThan(c.sheetBytes + 500);
  });

  it('refuses a workbook whose estimated memory exceeds the limit, and names the size', async () => {
    const e = await entries(await handMadeXlsx([{ name: 'A', rows: row(1, num('A1', 1)) }]));
    const { sheetBytes } = checkPackage(e);
    const need = estimatedMemory(sheetBytes);
    expect(need).toBe(WORKBOOK_MEMORY.base + WORKBOOK_MEMORY.perSheetByte * sheetBytes);
    expect(checkPackage(e, { ...defaultLimits(), memoryBytes: need }).sheetBytes).toBe(sheetBytes);
    expect(() => checkPackage(e, { ...defaultLimits(), memoryBytes: need - 1 })).toThrow(new RegExp(`too large to recalculate here: its worksheets unpack to ${sheetBytes} bytes of XML`));
    expect(() => checkPackage(e, { ...defaultLimits(), memoryBytes: need - 1 })).toThrow(WorkbookError);
  });

  it('refuses by the sizes the directory declares, before unpacking anything', async () => {
    const e = await entries(await handMadeXlsx([{ name: 'A', rows: row(1, num('A1', 1)) }]));
    expect(() => checkPackage(e, { ...defaultLimits(), maxUnpackedBytes: 100 })).toThrow(/would unpack to \d+ bytes, more than the 100 bytes Fluxbook reads/);
    expect(() => checkPackage(e, { ...defaultLimits(), maxPartBytes: 100 })).toThrow(/part .* would unpack to \d+ bytes, more than the 100 bytes one part may have/);
  });
});
