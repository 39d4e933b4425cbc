import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { inflateSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
// @ts-expect-error a plain .mjs tool without types
import { ICONS, drawIcon, encodePng } from './make-icons.mjs';

type Icon = { file: string; size: number; bleed: boolean };
const icons = ICONS as Icon[];
const read = (file: string) => readFileSync(fileURLToPath(new URL(`../../public/icons/${file}`, import.meta.url)));

/** Width, height, bit depth, color type and the unfiltered pixels of an 8-bit RGBA PNG (PNG specification, sections 5 and 11.2.2). */
function decode(png: Buffer) {
  expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature
  expect(png.toString('ascii', 12, 16)).toBe('IHDR');
  const w = png.readUInt32BE(16);
  const h = png.readUInt32BE(20);
  const idat: Buffer[] = [];
  for (let o = 8; o < png.length; ) {
    const len = png.readUInt32BE(o);
    if (png.toString('ascii', o + 4, o + 8) === 'IDAT') idat.push(png.subarray(o + 8, o + 8 + len));
    o += 12 + len;
  }
  const raw = inflateSync(Buffer.concat(idat));
  expect(raw.length).toBe(h * (w * 4 + 1));
  const filters = new Set<number>();
  for (let y = 0; y < h; y++) filters.add(raw[y * (w * 4 + 1)]);
  expect([...filters].filter((f) => f !== 0)).toEqual([]); // filter type none on every row
  const px = (x: number, y: number) => {
    const o = y * (w * 4 + 1) + 1 + x * 4;
    return [...raw.subarray(o, o + 4)];
  };
  /** How many pixels are not fully opaque. */
  const translucent = () => {
    let n = 0;
    for (let y = 0; y < h; y++) for (let x = 0; x < w; x++) if (raw[y * (w * 4 + 1) + 1 + x * 4 + 3] !== 255) n++;
    return n;
  };
  return { w, h, depth: png[24], colorType: png[25], px, translucent };
}

// Redrawing five icons takes about a second on an idle machine; the limit leaves room for a busy one.
describe('app icons', { timeout: 30_000 }, () => {
  for (const icon of icons) {
    it(`${icon.file} is the drawing at ${icon.size} px, as committed`, () => {
      const committed = read(icon.file);
      expect(committed.equals(encodePng(icon.size, drawIcon(icon.size, icon.bleed)))).toBe(true);
      const d = decode(committed);
      expect([d.w, d.h, d.depth, d.colorType]).toEqual([icon.size, icon.size, 8, 6]);
      // Navy #1d3a5f background; the center of the top-left square is #f7f8fa (public/icon.svg).
      expect(d.px(Math.floor(icon.size / 2), Math.floor(icon.size * 0.05))).toEqual([0x1d, 0x3a, 0x5f, 255]);
      expect(d.px(Math.floor((icon.size * 176) / 512), Math.floor((icon.size * 176) / 512))).toEqual([0xf7, 0xf8, 0xfa, 255]);
      // A maskable or iPhone icon fills its square (the platform cuts the shape); the plain one has rounded, transparent corners.
      expect(d.px(0, 0)[3]).toBe(icon.bleed ? 255 : 0);
    });
  }

  it('the grid stays inside the maskable safe zone (a centered circle of radius 40% of the size: W3C Web App Manifest, "icon masks"; from memory)', () => {
    const d = decode(read('maskable-512.png'));
    // Outside the circle of radius 0.4 x 512 = 204.8 px only the navy background shows.
    const off: string[] = [];
    for (let y = 0; y < 512; y++) {
      for (let x = 0; x < 512; x++) {
        if ((x + 0.5 - 256) ** 2 + (y + 0.5 - 256) ** 2 > 205 ** 2 && d.px(x, y).join() !== '29,58,95,255') off.push(`${x},${y}`);
      }
    }
    expect(off).toEqual([]);
  });

  it('the maskable and iPhone icons are opaque in every pixel (the iPhone shows transparency as black; from memory)', () => {
    for (const icon of icons.filter((i) => i.bleed)) {
      const d = decode(read(icon.file));
      expect(d.translucent(), icon.file).toBe(0);
    }
  });

  it('a size of zero draws no pixels', () => {
    expect(drawIcon(0, true).length).toBe(0);
  });
});
