/**
 * The committed icons: valid PNGs of the sizes their names say, and exactly
 * what assets/make-icons.js draws now (so the script and the files agree).
 */
import { readFileSync } from 'fs';
import path from 'path';
import { inflateSync } from 'zlib';
import { PROJECT_ROOT } from './support/build';

// eslint-disable-next-line @typescript-eslint/no-require-imports -- make-icons.js is a CommonJS script outside the TypeScript build
const icons = require(path.join(PROJECT_ROOT, 'assets', 'make-icons.js')) as {
  SIZES: number[];
  render(size: number): Buffer;
  encodePng(size: number, pixels: Buffer): Buffer;
  crc32(data: Buffer): number;
};

interface Chunk {
  type: string;
  data: Buffer;
}

function chunks(png: Buffer): Chunk[] {
  expect(png.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
  const found: Chunk[] = [];
  let at = 8;
  while (at < png.length) {
    const length = png.readUInt32BE(at);
    const type = png.toString('ascii', at + 4, at + 8);
    const data = png.subarray(at + 8, at + 8 + length);
    expect(png.readUInt32BE(at + 8 + length)).toBe(icons.crc32(png.subarray(at + 4, at + 8 + length)));
    found.push({ type, data });
    at += 12 + length;
  }
  return found;
}

describe.each(icons.SIZES)('assets/icon-%i.png', (size) => {
  const file = path.join(PROJECT_ROOT, 'assets', `icon-${size}.png`);
  const png = readFileSync(file);

  it('is a well-formed RGBA PNG of that size', () => {
    const list = chunks(png);
    expect(list.map((c) => c.type)).toEqual(['IHDR', 'IDAT', 'IEND']);
    const header = list[0].data;
    expect([header.readUInt32BE(0), header.readUInt32BE(4), header[8], header[9]]).toEqual([size, size, 8, 6]);
    expect(inflateSync(list[1].data).length).toBe(size * (1 + size * 4));
  });

  it('matches what make-icons.js draws', () => {
    expect(icons.encodePng(size, icons.render(size)).equals(png)).toBe(true);
  });

  it('is opaque in the middle and transparent in the corners (a rounded square)', () => {
    const pixels = icons.render(size);
    const alpha = (x: number, y: number) => pixels[(y * size + x) * 4 + 3];
    expect(alpha(Math.floor(size / 2), Math.floor(size / 2))).toBe(255);
    expect(alpha(0, 0)).toBe(0);
  });
});
