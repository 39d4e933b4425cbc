// Draws Trialbook's own app icons (the 2 x 2 grid of public/icon.svg: a two-level design's four
// corners) as PNG files, with no image library: each pixel is the share of 4 x 4 sample points
// inside each shape, and the PNG is written by hand (PNG specification, ISO/IEC 15948:2004:
// signature, IHDR, one zlib IDAT of unfiltered RGBA rows, IEND, CRC-32 per chunk).
//   node test/tools/make-icons.mjs   writes public/icons/*.png (a unit test checks they match)
import { deflateSync } from 'node:zlib';
import { mkdirSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const NAVY = [0x1d, 0x3a, 0x5f];
const PAPER = [0xf7, 0xf8, 0xfa];
const SKY = [0x8f, 0xb3, 0xd9];

/** The icon in the 512-unit square of icon.svg; `bleed` fills the whole square (maskable, iPhone). */
function shapes(bleed) {
  return [
    { x: 0, y: 0, w: 512, h: 512, r: bleed ? 0 : 96, c: NAVY },
    { x: 120, y: 120, w: 112, h: 112, r: 16, c: PAPER },
    { x: 280, y: 120, w: 112, h: 112, r: 16, c: SKY },
    { x: 120, y: 280, w: 112, h: 112, r: 16, c: SKY },
    { x: 280, y: 280, w: 112, h: 112, r: 16, c: PAPER },
  ];
}

function inside(s, x, y) {
  if (x < s.x || y < s.y || x > s.x + s.w || y > s.y + s.h) return false;
  const cx = Math.min(Math.max(x, s.x + s.r), s.x + s.w - s.r);
  const cy = Math.min(Math.max(y, s.y + s.r), s.y + s.h - s.r);
  return (x - cx) ** 2 + (y - cy) ** 2 <= s.r * s.r;
}

/** RGBA pixels of the icon at size x size; later shapes are painted over earlier ones. */
export function drawIcon(size, bleed) {
  const px = new Uint8Array(size * size * 4);
  const list = shapes(bleed);
  const k = 512 / size;
  const S = 4;
  for (let j = 0; j < size; j++) {
    for (let i = 0; i < size; i++) {
      let r = 0, g = 0, b = 0, a = 0;
      for (let sj = 0; sj < S; sj++) {
        for (let si = 0; si < S; si++) {
          const x = (i + (si + 0.5) / S) * k;
          const y = (j + (sj + 0.5) / S) * k;
          let hit = null;
          for (const s of list) if (inside(s, x, y)) hit = s.c;
          if (hit) (r += hit[0]), (g += hit[1]), (b += hit[2]), (a += 1);
        }
      }
      const o = (j * size + i) * 4;
      // Color averaged over covered samples (no dark fringe at transparent edges), alpha = coverage.
      px[o] = a ? Math.round(r / a) : 0;
      px[o + 1] = a ? Math.round(g / a) : 0;
      px[o + 2] = a ? Math.round(b / a) : 0;
      px[o + 3] = Math.round((255 * a) / (S * S));
    }
  }
  return px;
}

const CRC = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function crc32(bytes) {
  let c = 0xffffffff;
  for (const x of bytes) c = CRC[(c ^ x) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type, data) {
  const out = Buffer.alloc(12 + data.length);
  out.writeUInt32BE(data.length, 0);
  out.write(type, 4, 'ascii');
  Buffer.from(data).copy(out, 8);
  out.writeUInt32BE(crc32(out.subarray(4, 8 + data.length)), 8 + data.length);
  return out;
}

/** A PNG file (8-bit RGBA, no interlace) of size x size pixels. */
export function encodePng(size, rgba) {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0);
  ihdr.writeUInt32BE(size, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 6; // color type: RGBA
  const raw = Buffer.alloc(size * (size * 4 + 1));
  for (let j = 0; j < size; j++) {
    raw[j * (size * 4 + 1)] = 0; // filter: none
    Buffer.from(rgba.buffer, j * size * 4, size * 4).copy(raw, j * (size * 4 + 1) + 1);
  }
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk('IHDR', ihdr), chunk('IDAT', deflateSync(raw, { level: 9 })), chunk('IEND', new Uint8Array(0))]);
}

/** Every icon file: name under public/icons/, pixel size, and whether it fills the square. */
export const ICONS = [
  { file: 'icon-192.png', size: 192, bleed: false },
  { file: 'icon-512.png', size: 512, bleed: false },
  { file: 'maskable-192.png', size: 192, bleed: true },
  { file: 'maskable-512.png', size: 512, bleed: true },
  { file: 'apple-touch-icon-180.png', size: 180, bleed: true },
];

if (import.meta.url === `file://${process.argv[1]}`) {
  const dir = fileURLToPath(new URL('../../public/icons/', import.meta.url));
  mkdirSync(dir, { recursive: true });
  for (const icon of ICONS) {
    const png = encodePng(icon.size, drawIcon(icon.size, icon.bleed));
    writeFileSync(dir + icon.file, png);
    console.log(`public/icons/${icon.file}: ${icon.size} x ${icon.size}, ${png.length} bytes`);
  }
}
