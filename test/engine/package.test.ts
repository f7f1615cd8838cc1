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

describe('unpacking a part', () => {
  /** The package with a field of the sheet's central directory entry (APPNOTE.TXT 4.3.12: name at 46, its length at 28) changed. */
  function withDirectoryField(bytes: Buffer, offset: number, write: (b: Buffer, at: number) => void): Buffer {
    const out = Buffer.from(bytes);
    for (let i = out.indexOf('PK\u0001\u0002'); i >= 0; i = out.indexOf('PK\u0001\u0002', i + 4)) {
      if (out.toString('latin1', i + 46, i + 46 + out.readUInt16LE(i + 28)) === 'xl/worksheets/sheet1.xml') write(out, i + offset);
    }
    return out;
  }

  it('gives back the bytes the directory declares, checked by size and CRC-32', async () => {
    const zip = await openZip(await handMadeXlsx([{ name: 'A', rows: row(1, num('A1', 1)) }]));
    const sheet = zip.entries.find((e) => e.name.endsWith('sheet1.xml'))!;
    expect((await zip.unpack(sheet)).toString('utf8')).toMatch(/<c r="A1"><v>1<\/v><\/c>/);
  });

  it('refuses a part whose CRC-32 is not the one its directory entry declares', async () => {
    const bad = withDirectoryField(await handMadeXlsx([{ name: 'A', rows: row(1, num('A1', 1)) }]), 16, (b, at) => b.writeUInt32LE((b.readUInt32LE(at) ^ 1) >>> 0, at));
    const zip = await openZip(bad);
    const sheet = zip.entries.find((e) => e.name.endsWith('sheet1.xml'))!;
    await expect(zip.unpack(sheet)).rejects.toThrow(/part xl\/worksheets\/sheet1\.xml: its CRC-32 does not match/);
  });

  it('refuses a part that unpacks to more or fewer bytes than declared', async () => {
    const bytes = await handMadeXlsx([{ name: 'A', rows: row(1, num('A1', 1)) }]);
    const by = (delta: number) => withDirectoryField(bytes, 24, (b, at) => b.writeUInt32LE(b.readUInt32LE(at) + delta, at));
    const part = async (b: Buffer) => {
      const zip = await openZip(b);
      return zip.unpack(zip.entries.find((e) => e.name.endsWith('sheet1.xml'))!);
    };
    await expect(part(by(-1))).rejects.toThrow(/unpacks to more than the \d+ bytes its ZIP directory entry declares/);
    await expect(part(by(1))).rejects.toThrow(/unpacks to \d+ bytes, not the \d+ its ZIP directory entry declares/);
  });
});
