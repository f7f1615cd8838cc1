/**
 * Draws Fluxbook's icon — two winding rings linked by a core bar, our own design — at the sizes
 * the manifest names, as PNG files written with Node's zlib only. Run: npx tsx scripts/make-icons.ts
 */
import { writeFileSync } from 'node:fs';
import { deflateSync } from 'node:zlib';

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
function crc32(bytes: Buffer): number {
  let c = 0xffffffff;
  for (const b of bytes) c = CRC_TABLE[(c ^ b) & 0xff]! ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

type Rgba = [number, number, number, number];
const PLUM: Rgba = [74, 38, 107, 255];
const AMBER: Rgba = [232, 163, 23, 255];

function pixel(x: number, y: number): Rgba {
  // Unit square coordinates; two rings left and right, a bar through both.
  const ring = (cx: number) => {
    const r = Math.hypot(x - cx, y - 0.5);
    return r > 0.17 && r < 0.27;
  };
  if (Math.abs(y - 0.5) < 0.055 && x > 0.08 && x < 0.92) return AMBER;
  if (ring(0.33) || ring(0.67)) return PLUM;
  return [0, 0, 0, 0];
}

function png(size: number): Buffer {
  const sub = 4; // supersampling for smooth edges
  const raw = Buffer.alloc(size * (size * 4 + 1));
  for (let py = 0; py < size; py++) {
    raw[py * (size * 4 + 1)] = 0;
    for (let px = 0; px < size; px++) {
      const acc = [0, 0, 0, 0];
      for (let sy = 0; sy < sub; sy++) {
        for (let sx = 0; sx < sub; sx++) {
          const c = pixel((px + (sx + 0.5) / sub) / size, (py + (sy + 0.5) / sub) / size);
          for (let k = 0; k < 3; k++) acc[k]! += c[k]! * c[3];
          acc[3]! += c[3];
        }
      }
      const o = py * (size * 4 + 1) + 1 + px * 4;
      const a = acc[3]!;
      for (let k = 0; k < 3; k++) raw[o + k] = a ? Math.round(acc[k]! / a) : 0;
      raw[o + 3] = Math.round(a / (sub * sub));
    }
  }
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header[8] = 8;
  header[9] = 6; // RGBA
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(raw)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

for (const size of [16, 32, 64, 80]) writeFileSync(`assets/icon-${size}.png`, png(size));
console.log('assets/icon-{16,32,64,80}.png written');
