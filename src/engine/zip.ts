/**
 * The ZIP container of an .xlsx package (ECMA-376 Part 2, Open Packaging Conventions, which uses
 * the PKWARE .ZIP format): read with yauzl, written with fflate.
 *
 *  - yauzl reads the central directory and each entry's raw (still compressed) bytes; zlib unpacks
 *    an entry into at most the size its directory entry declares and the size and CRC-32 are
 *    checked, so a part that lies about its size never fills memory.
 *  - fflate writes the new package. A part that is not changed goes in as the very bytes it had,
 *    still compressed, with the CRC-32 and sizes from the old directory (fflate's ZipInputFile
 *    takes already compressed data); a changed part is deflated with Node's zlib.
 */
import { once } from 'node:events';
import { crc32, createDeflateRaw, deflateRawSync, inflateRawSync } from 'node:zlib';
import { Zip, type ZipInputFile } from 'fflate';
import yauzl from 'yauzl';
import { zipError } from './package';

/** One entry of a ZIP package as read. */
export interface ZipEntry {
  readonly name: string;
  /** 0 stored, 8 deflated (APPNOTE.TXT 4.4.5). */
  readonly method: number;
  readonly crc: number;
  readonly compressedSize: number;
  /** As the central directory declares it. */
  readonly size: number;
  readonly isFolder: boolean;
  readonly entry: yauzl.Entry;
}

export interface ZipReader {
  readonly entries: readonly ZipEntry[];
  /** The raw bytes of an entry, as stored in the package (compressed). */
  raw(entry: ZipEntry): Promise<Buffer>;
  /**
   * Unpacks an entry at once, into no more than the size its directory entry declares, and checks
   * its size and CRC-32: in one call zlib unpacks a large sheet in about a third of the time the
   * stream takes.
   */
  unpack(entry: ZipEntry): Promise<Buffer>;
  close(): void;
}

const collect = (stream: NodeJS.ReadableStream, onChunk: (chunk: Buffer) => void): Promise<void> =>
  new Promise((resolve, reject) => {
    stream.on('data', (chunk: Buffer) => {
      try {
        onChunk(chunk);
      } catch (error) {
        (stream as unknown as { destroy(e?: unknown): void }).destroy();
        reject(error);
      }
    });
    stream.on('error', reject);
    stream.on('end', () => resolve());
  });

/** Opens a package held in memory and reads its central directory. */
export async function openZip(bytes: Buffer): Promise<ZipReader> {
  let zip: yauzl.ZipFile;
  try {
    zip = await yauzl.fromBufferPromise(bytes, { lazyEntries: true, validateEntrySizes: true, strictFileNames: false, decodeStrings: true });
  } catch (error) {
    throw zipError(error);
  }
  const entries: ZipEntry[] = [];
  await new Promise<void>((resolve, reject) => {
    zip.on('entry', (entry: yauzl.Entry) => {
      entries.push({
        name: entry.fileName,
        method: entry.compressionMethod,
        crc: entry.crc32,
        compressedSize: entry.compressedSize,
        size: entry.uncompressedSize,
        isFolder: entry.fileName.endsWith('/'),
        entry,
      });
      zip.readEntry();
    });
    zip.on('end', () => resolve());
    zip.on('error', (error) => reject(zipError(error)));
    zip.readEntry();
  });
  const open = (entry: ZipEntry) => zip.openReadStreamPromise(entry.entry, entry.method === 0 ? {} : { decompress: false }) as Promise<NodeJS.ReadableStream>;
  const raw = async (entry: ZipEntry): Promise<Buffer> => {
    const chunks: Buffer[] = [];
    try {
      await collect(await open(entry), (c) => chunks.push(c));
    } catch (error) {
      throw zipError(error, entry.name);
    }
    return Buffer.concat(chunks);
  };
  return {
    entries,
    raw,
    async unpack(entry) {
      const stored = await raw(entry);
      let data: Buffer;
      if (entry.method === 0) data = stored;
      else if (entry.method === 8) {
        try {
          data = inflateRawSync(stored, { maxOutputLength: Math.max(1, entry.size) });
        } catch (error) {
          const tooLarge = (error as { code?: string }).code === 'ERR_BUFFER_TOO_LARGE';
          throw zipError(tooLarge ? new Error(`too many bytes in the stream. expected ${entry.size}`) : error, entry.name);
        }
      } else throw zipError(new Error(`compression method ${entry.method} is not supported`), entry.name);
      if (data.length !== entry.size) throw zipError(new Error(`it unpacks to ${data.length} bytes, not the ${entry.size} its ZIP directory entry declares`), entry.name);
      if (crc32(data) >>> 0 !== entry.crc >>> 0) throw zipError(new Error('its CRC-32 does not match its ZIP directory entry (a damaged file)'), entry.name);
      return data;
    },
    close: () => zip.close(),
  };
}

/** An entry of the new package: copied as it was, or new content. */
export type OutEntry =
  | { readonly name: string; readonly copy: ZipEntry; readonly raw: Buffer }
  | { readonly name: string; readonly content: Uint8Array }
  /**
   * Text in pieces, UTF-8 encoded and deflated as they come: a patched sheet is never joined
   * whole. `original.changed` is asked once the pieces are used up: false means the text came out
   * as the part already was, and the part is copied as it was stored instead.
   */
  | {
      readonly name: string;
      readonly pieces: Iterable<string>;
      readonly original?: { readonly entry: ZipEntry; readonly raw: () => Promise<Buffer>; readonly changed: () => boolean };
    };

/** A part that goes in already compressed, exactly as it was stored, or compressed here. */
function compressedFile(name: string, method: number, crc: number, size: number, data: readonly Uint8Array[]): ZipInputFile & { start(): void } {
  const file: ZipInputFile = {
    filename: name,
    size,
    crc,
    compression: method,
    // The DOS time is not carried over: the parts' bytes are what the package holds.
    mtime: new Date(1980, 0, 1),
    ondata: undefined,
  };
  // fflate sets ondata when the file is added; the data is then handed over as it is.
  const start = () => {
    if (data.length === 0) file.ondata?.(null, new Uint8Array(0), true);
    data.forEach((d, i) => file.ondata?.(null, new Uint8Array(d.buffer as ArrayBuffer, d.byteOffset, d.length), i === data.length - 1));
  };
  return Object.assign(file, { start });
}

/** Text pieces deflated on zlib's thread pool while the next ones are encoded: the chunks, CRC-32 and size. */
async function deflatePieces(pieces: Iterable<string>): Promise<{ chunks: Buffer[]; crc: number; size: number }> {
  // Level 1: a sheet of 100 MB deflates in a third of the time of level 6, a few per cent larger.
  const deflate = createDeflateRaw({ level: 1 });
  const chunks: Buffer[] = [];
  deflate.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<void>((resolve, reject) => {
    deflate.on('end', () => resolve());
    deflate.on('error', reject);
  });
  let crc = 0;
  let size = 0;
  // About a megabyte of text is encoded at a time: few enough calls, little held at once.
  const BATCH = 1 << 20;
  let batch = '';
  const flush = async () => {
    const bytes = Buffer.from(batch, 'utf8');
    batch = '';
    crc = crc32(bytes, crc);
    size += bytes.length;
    if (!deflate.write(bytes)) await once(deflate, 'drain');
  };
  for (const piece of pieces) {
    batch += piece;
    if (batch.length >= BATCH) await flush();
  }
  if (batch.length > 0) await flush();
  deflate.end();
  await done;
  return { chunks, crc: crc >>> 0, size };
}

/** Writes a ZIP package of `entries` in the order given. */
export async function writeZip(entries: readonly OutEntry[]): Promise<Buffer> {
  const files: (ZipInputFile & { start(): void })[] = [];
  for (const e of entries) {
    if ('copy' in e) files.push(compressedFile(e.name, e.copy.method, e.copy.crc, e.copy.size, [e.raw]));
    else if ('pieces' in e) {
      const d = await deflatePieces(e.pieces);
      if (e.original?.changed() === false) {
        const { entry, raw } = e.original;
        files.push(compressedFile(e.name, entry.method, entry.crc, entry.size, [await raw()]));
      } else files.push(compressedFile(e.name, 8, d.crc, d.size, d.chunks));
    } else {
      files.push(compressedFile(e.name, 8, crc32(e.content) >>> 0, e.content.length, [deflateRawSync(e.content, { level: 6 })]));
    }
  }
  return new Promise((resolve, reject) => {
    const chunks: Uint8Array[] = [];
    const zip = new Zip((error, chunk, final) => {
      if (error) return reject(error);
      chunks.push(chunk);
      if (final) resolve(Buffer.concat(chunks));
    });
    try {
      for (const file of files) {
        zip.add(file);
        file.start();
      }
      zip.end();
    } catch (error) {
      reject(error);
    }
  });
}
