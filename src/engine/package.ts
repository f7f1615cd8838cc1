/**
 * Checks an .xlsx package (a ZIP file, ECMA-376 Part 2) before the workbook reader unpacks it, so
 * that a damaged, crafted or oversized file is refused with one line instead of exhausting memory:
 *
 *  - the ZIP central directory (read with jszip, which exceljs itself uses) must be whole — a file
 *    cut short has none at its end;
 *  - the uncompressed sizes it declares must add up to at most MAX_UNPACKED_BYTES (1 GiB), and no
 *    part may declare more than MAX_PART_BYTES (500 MiB): exceljs reads every part whole into one
 *    string, and V8 strings stop at about 512 Mi characters;
 *  - every part is then unpacked as a stream, chunk by chunk, nothing kept, and refused the moment
 *    it yields more bytes than its directory entry declares (a "ZIP bomb" that lies about its size);
 *  - while the worksheet parts stream past, their rows, cells and formulas are counted, and the
 *    memory that reading, recalculating and writing them takes is estimated (figures measured with
 *    exceljs 4.4 and HyperFormula 3.5, see WORKBOOK_MEMORY); a workbook that would need more than
 *    Node.js may use is refused before it is parsed.
 * The first pass costs about one unpacking of the package (a 1,000,000-row sheet: about a second).
 */
import { getHeapStatistics } from 'node:v8';
import JSZip from 'jszip';

/** A workbook that cannot be read: the message is one line a person can act on. */
export class WorkbookError extends Error {
  override name = 'WorkbookError';
}

const MiB = 1024 * 1024;
export const MAX_UNPACKED_BYTES = 1024 * MiB;
export const MAX_PART_BYTES = 500 * MiB;

/**
 * Peak resident memory of `fluxbook calc` per row, per cell and per formula cell, bytes, measured
 * on the development machine (Node 20, exceljs 4.4.0, HyperFormula 3.5.0): 1,000,000 rows of one
 * value → 3.3 GB; of two values → 3.9 GB; 100,000 rows of 9 values and 4 XFMR formulas → 2.6 GB
 * (checked on 150,000 such rows: 3.84 GB estimated, 3.81 GB measured).
 * Resident memory is more than the heap that Node's limit counts, so the estimate errs on the safe
 * side.
 */
export const WORKBOOK_MEMORY = { base: 100 * MiB, perRow: 2700, perCell: 600, perFormula: 3600 } as const;

export interface PackageCounts {
  /** Sum of the uncompressed sizes the ZIP directory declares, bytes. */
  readonly unpackedBytes: number;
  /** Rows, cells (values and formulas) and formula cells of all worksheet parts. */
  readonly rows: number;
  readonly cells: number;
  readonly formulas: number;
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

/** Estimated peak memory of reading, recalculating and writing a workbook of these counts, bytes. */
export function estimatedMemory(c: Pick<PackageCounts, 'rows' | 'cells' | 'formulas'>): number {
  const m = WORKBOOK_MEMORY;
  return m.base + m.perRow * c.rows + m.perCell * c.cells + m.perFormula * c.formulas;
}

const size = (bytes: number): string =>
  bytes >= 1000 * MiB ? `${(bytes / (1024 * MiB)).toFixed(1)} GiB` : bytes >= MiB ? `${(bytes / MiB).toFixed(0)} MiB` : `${bytes} bytes`;
const count = (n: number): string => n.toLocaleString('en-US');

/**
 * The uncompressed size the central directory declares for a part. jszip keeps it on the part's
 * (unexported) compressed object, read as a signed 32-bit number: sizes from 2 GiB come out
 * negative, and a ZIP64 size past 4 GiB keeps only its low 32 bits. Whatever the reading, the
 * stream check below never lets a part yield more than the size taken here.
 */
function declaredSize(file: JSZip.JSZipObject): number | undefined {
  const n = (file as unknown as { _data?: { uncompressedSize?: unknown } })._data?.uncompressedSize;
  if (typeof n !== 'number') return undefined;
  return n < 0 ? n + 2 ** 32 : n;
}

/**
 * jszip's pausable stream of a part (`ZipObject#internalStream`, a StreamHelper — documented in
 * jszip's API pages, absent from its typings).
 */
interface PartStream {
  on(event: 'data', listener: (chunk: Uint8Array) => void): PartStream;
  on(event: 'error', listener: (error: unknown) => void): PartStream;
  on(event: 'end', listener: () => void): PartStream;
  resume(): PartStream;
  pause(): PartStream;
}

const partStream = (file: JSZip.JSZipObject): PartStream =>
  (file as unknown as { internalStream(type: 'uint8array'): PartStream }).internalStream('uint8array');

const WORKSHEET_PART = /^\/?xl\/worksheets\/[^/]+\.xml$/i;

/**
 * Counts <row>, <c> and <f> start tags (any namespace prefix) in XML arriving in chunks. Text in
 * XML cannot hold a raw "<", so every "<" opens markup; end tags, comments and declarations start
 * with a character that is not a name character and are not counted.
 */
class TagCounter {
  rows = 0;
  cells = 0;
  formulas = 0;
  private inName = false;
  private name = '';

  feed(chunk: Uint8Array): void {
    for (let i = 0; i < chunk.length; i++) {
      const b = chunk[i]!;
      if (this.inName) {
        // letters, digits, ':', '_', '-', '.'
        if ((b >= 97 && b <= 122) || (b >= 65 && b <= 90) || (b >= 48 && b <= 58) || b === 95 || b === 45 || b === 46) {
          if (this.name.length < 12) this.name += String.fromCharCode(b);
          continue;
        }
        this.inName = false;
        this.tag(this.name);
      }
      if (b === 60) {
        this.inName = true;
        this.name = '';
      }
    }
  }

  private tag(name: string): void {
    const local = name.slice(name.lastIndexOf(':') + 1);
    if (local === 'c') this.cells++;
    else if (local === 'row') this.rows++;
    else if (local === 'f') this.formulas++;
  }
}

/**
 * Streams one part through `onChunk`, refusing once it yields more than `declared` bytes; an error
 * `onChunk` throws ends the stream and is passed on as it is.
 */
function streamPart(file: JSZip.JSZipObject, declared: number, onChunk?: (chunk: Uint8Array) => void): Promise<number> {
  return new Promise((resolve, reject) => {
    let seen = 0;
    let done = false;
    const helper = partStream(file);
    const fail = (error: Error) => {
      if (done) return;
      done = true;
      helper.pause();
      reject(error);
    };
    helper
      .on('data', (bytes) => {
        if (done) return;
        seen += bytes.length;
        if (seen > declared) {
          fail(new WorkbookError(`this .xlsx package cannot be read: part ${file.name} unpacks to more than the ${count(declared)} bytes its ZIP directory entry declares (a damaged or crafted file)`));
          return;
        }
        try {
          onChunk?.(bytes);
        } catch (error) {
          fail(error instanceof Error ? error : new Error(String(error)));
        }
      })
      .on('error', (error) => fail(new WorkbookError(`this .xlsx package cannot be read (part ${file.name}: ${(error instanceof Error ? error.message : String(error)).split('\n')[0]})`)))
      .on('end', () => {
        if (done) return;
        done = true;
        resolve(seen);
      })
      .resume();
  });
}

function directoryError(error: unknown): WorkbookError {
  const reason = error instanceof Error ? error.message.split('\n')[0]! : String(error);
  if (/end of central directory|end of data reached|corrupted zip/i.test(reason)) {
    return new WorkbookError(
      'this .xlsx package cannot be read: it is incomplete (its ZIP directory is missing or points past the end of the file); was it cut short while copying or downloading?',
    );
  }
  return new WorkbookError(`this .xlsx package cannot be read (${reason})`);
}

/** Checks the package as described above; returns what it counted, or throws WorkbookError. */
export async function checkPackage(bytes: Buffer, limits: PackageLimits = defaultLimits()): Promise<PackageCounts> {
  let zip: JSZip;
  try {
    zip = await JSZip.loadAsync(bytes);
  } catch (error) {
    throw directoryError(error);
  }
  const parts = Object.values(zip.files).filter((f) => !f.dir);
  let unpackedBytes = 0;
  const sizes = new Map<JSZip.JSZipObject, number>();
  for (const part of parts) {
    const declared = declaredSize(part);
    if (declared === undefined) continue; // not read from a file (never so here); the stream check still holds
    if (declared > limits.maxPartBytes) {
      throw new WorkbookError(
        `this .xlsx package is refused: part ${part.name} would unpack to ${size(declared)}, more than the ${size(limits.maxPartBytes)} one part may have (a crafted file, or a sheet too large to read whole)`,
      );
    }
    sizes.set(part, declared);
    unpackedBytes += declared;
  }
  if (unpackedBytes > limits.maxUnpackedBytes) {
    throw new WorkbookError(
      `this .xlsx package is refused: its parts would unpack to ${size(unpackedBytes)}, more than the ${size(limits.maxUnpackedBytes)} Fluxbook reads (a ZIP bomb, or a workbook too large to recalculate here)`,
    );
  }
  const counter = new TagCounter();
  for (const part of parts) {
    const sheet = WORKSHEET_PART.test(part.name);
    await streamPart(
      part,
      sizes.get(part) ?? limits.maxPartBytes,
      sheet ? (chunk) => counter.feed(chunk) : undefined,
    );
    // Counted to the end of the part (streaming keeps nothing), so the message gives whole figures.
    if (sheet) checkMemory(counter, limits.memoryBytes);
  }
  return { unpackedBytes, rows: counter.rows, cells: counter.cells, formulas: counter.formulas };
}

function checkMemory(c: TagCounter, memoryBytes: number): void {
  const need = estimatedMemory(c);
  if (need <= memoryBytes) return;
  const some = (n: number, what: string) => `${count(n)} ${what}${n === 1 ? '' : 's'}`;
  throw new WorkbookError(
    `this workbook is too large to recalculate here: ${some(c.rows, 'row')}, ${some(c.cells, 'cell')} and ${some(c.formulas, 'formula')} need about ${size(need)} of memory, more than the ${size(memoryBytes)} Node.js may use; split the workbook, or allow more with NODE_OPTIONS=--max-old-space-size=MB`,
  );
}
