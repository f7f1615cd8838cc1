/**
 * Checks an .xlsx package (a ZIP file, ECMA-376 Part 2) before anything in it is unpacked, so that
 * a damaged, crafted or oversized file is refused with one line instead of exhausting memory:
 *
 *  - the ZIP central directory (read with yauzl, see zip.ts) must be whole — a file cut short has
 *    none at its end;
 *  - the uncompressed sizes it declares must add up to at most MAX_UNPACKED_BYTES (1 GiB), and no
 *    part may declare more than MAX_PART_BYTES (500 MiB): a worksheet is held whole as text while
 *    it is patched, and V8 strings stop at about 512 Mi characters;
 *  - the memory that reading, recalculating and writing the worksheets takes is estimated from
 *    their declared sizes (WORKBOOK_MEMORY); a workbook that would need more than Node.js may use
 *    is refused before it is parsed.
 * While a part is unpacked later, zlib stops at the size its directory entry declares (a "ZIP
 * bomb" that lies about its size), and a part shorter than declared or with another CRC-32 is
 * refused as damaged; zipError turns each into our message.
 */
import { getHeapStatistics } from 'node:v8';
import type { ZipEntry } from './zip';

/** A workbook that cannot be read: the message is one line a person can act on. */
export class WorkbookError extends Error {
  override name = 'WorkbookError';
}

const MiB = 1024 * 1024;
export const MAX_UNPACKED_BYTES = 1024 * MiB;
export const MAX_PART_BYTES = 500 * MiB;

/**
 * Memory of `fluxbook calc` per byte of worksheet XML, measured on the development machine
 * (Node 20, HyperFormula 3.5.0, peak resident memory with GNU time): a 100,000-unit fleet of 9
 * values and 4 filled-down XFMR formulas a row (60 MB of sheet XML) peaks at 0.5 to 0.6 GB, about
 * 9 bytes a byte; a 1,000,000-row load column with one XFMR formula a row and one over the whole
 * column (55 MB), which goes through HyperFormula, at 2.9 GB, about 50 a byte, of which the heap
 * Node's limit counts is a part. 24 a byte lets both run with the default heap and refuses what
 * would exhaust a small one.
 */
export const WORKBOOK_MEMORY = { base: 100 * MiB, perSheetByte: 24 } as const;

export interface PackageCounts {
  /** Sum of the uncompressed sizes the ZIP directory declares, bytes. */
  readonly unpackedBytes: number;
  /** Of which worksheet parts. */
  readonly sheetBytes: number;
}

export interface PackageLimits {
  readonly maxUnpackedBytes: number;
  readonly maxPartBytes: number;
  /** The memory a workbook may need, bytes; by default the heap Node.js may use. */
  readonly memoryBytes: number;
}

export function defaultLimits(): PackageLimits {
  return { maxUnpackedBytes: MAX_UNPACKED_BYTES, maxPartBytes: MAX_PART_BYTES, memoryBytes: getHeapStatistics().heap_size_limit };
}

/** Estimated peak memory of recalculating worksheets of this many bytes of XML. */
export function estimatedMemory(sheetBytes: number): number {
  return WORKBOOK_MEMORY.base + WORKBOOK_MEMORY.perSheetByte * sheetBytes;
}

export const size = (bytes: number): string =>
  bytes >= 1000 * MiB ? `${(bytes / (1024 * MiB)).toFixed(1)} GiB` : bytes >= MiB ? `${(bytes / MiB).toFixed(0)} MiB` : `${bytes} bytes`;
export const count = (n: number): string => n.toLocaleString('en-US');

const WORKSHEET_PART = /^\/?xl\/worksheets\/[^/]+\.xml$/i;

/** Checks the directory's sizes as described above; returns them, or throws WorkbookError. */
export function checkPackage(entries: readonly ZipEntry[], limits: PackageLimits = defaultLimits()): PackageCounts {
  let unpackedBytes = 0;
  let sheetBytes = 0;
  for (const e of entries) {
    if (e.isFolder) continue;
    if (e.size > limits.maxPartBytes) {
      throw new WorkbookError(
        `this .xlsx package is refused: part ${e.name} would unpack to ${size(e.size)}, more than the ${size(limits.maxPartBytes)} one part may have (a crafted file, or a sheet too large to read whole)`,
      );
    }
    unpackedBytes += e.size;
    if (WORKSHEET_PART.test(e.name)) sheetBytes += e.size;
  }
  if (unpackedBytes > limits.maxUnpackedBytes) {
    throw new WorkbookError(
      `this .xlsx package is refused: its parts would unpack to ${size(unpackedBytes)}, more than the ${size(limits.maxUnpackedBytes)} Fluxbook reads (a ZIP bomb, or a workbook too large to recalculate here)`,
    );
  }
  const need = estimatedMemory(sheetBytes);
  if (need > limits.memoryBytes) {
    throw new WorkbookError(
      `this workbook is too large to recalculate here: its worksheets unpack to ${size(sheetBytes)} of XML, which needs about ${size(need)} of memory, more than the ${size(limits.memoryBytes)} Node.js may use; split the workbook, or allow more with NODE_OPTIONS=--max-old-space-size=MB`,
    );
  }
  return { unpackedBytes, sheetBytes };
}

/** yauzl's and zlib's errors while a package is read, as one line. */
export function zipError(error: unknown, part?: string): WorkbookError {
  if (error instanceof WorkbookError) return error;
  const reason = error instanceof Error ? error.message.split('\n')[0]! : String(error);
  if (/end of central directory record signature not found|unexpected EOF|invalid central directory file header signature|truncated/i.test(reason)) {
    return new WorkbookError(
      'this .xlsx package cannot be read: it is incomplete (its ZIP directory is missing or points past the end of the file); was it cut short while copying or downloading?',
    );
  }
  const m = /too many bytes in the stream\. expected (\d+)/i.exec(reason);
  if (m) {
    return new WorkbookError(
      `this .xlsx package cannot be read: part ${part ?? '?'} unpacks to more than the ${count(Number(m[1]))} bytes its ZIP directory entry declares (a damaged or crafted file)`,
    );
  }
  return new WorkbookError(`this .xlsx package cannot be read (${part ? `part ${part}: ` : ''}${reason})`);
}
