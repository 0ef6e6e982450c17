import { deflateSync } from "node:zlib";

/**
 * A plain PNG (white, with a grey frame) of the given size: the fallback that
 * DOCX requires beside an SVG image, for readers that cannot draw SVG. We draw
 * no diagram in it, rather than add a rasterizer that ships a native binary;
 * current Word and LibreOffice show the SVG itself.
 */
export function placeholderPng(width: number, height: number): Buffer {
  const w = Math.max(2, Math.round(width));
  const h = Math.max(2, Math.round(height));
  const raw = Buffer.alloc((w + 1) * h, 0xff);
  for (let y = 0; y < h; y++) {
    const row = y * (w + 1);
    raw[row] = 0; // filter type: none
    const edgeRow = y === 0 || y === h - 1;
    for (let x = 0; x < w; x++) if (edgeRow || x === 0 || x === w - 1) raw[row + 1 + x] = 0xb0;
  }
  const header = Buffer.alloc(13);
  header.writeUInt32BE(w, 0);
  header.writeUInt32BE(h, 4);
  header[8] = 8; // bit depth
  header[9] = 0; // greyscale
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", header),
    chunk("IDAT", deflateSync(raw)),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

function chunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length, 0);
  const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body), 0);
  return Buffer.concat([length, body, crc]);
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function crc32(bytes: Buffer): number {
  let c = 0xffffffff;
  for (const byte of bytes) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
