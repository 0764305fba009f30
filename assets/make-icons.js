#!/usr/bin/env node
/**
 * Draws Driftcell's icons and writes them as PNG files beside this script:
 * icon-16.png, icon-32.png, icon-64.png, icon-80.png, icon-128.png.
 *
 * The design (our own): a teal rounded square with two parallel white bands
 * tilted as band edges are under an applied field, and an amber arrow between
 * them for carrier drift. Shapes are signed-distance functions in a unit
 * square, sampled 4×4 per pixel for smooth edges. Only Node's zlib is used.
 *
 * Run: node assets/make-icons.js   (the PNGs are committed; rerun after a change here)
 */
'use strict';
const fs = require('fs');
const path = require('path');
const zlib = require('zlib');

const SIZES = [16, 32, 64, 80, 128];
const SUPERSAMPLE = 4;

/** Colours as [r, g, b]. */
const TEAL = [11, 93, 107];
const WHITE = [247, 249, 250];
const AMBER = [242, 163, 58];

/** Geometry in unit coordinates (x right, y down). */
const BACKGROUND = { half: 0.5, radius: 0.2 };
const BAND_HALF_WIDTH = 0.055;
const UPPER_BAND = [
  [0.14, 0.38],
  [0.86, 0.17],
];
const LOWER_BAND = [
  [0.14, 0.83],
  [0.86, 0.62],
];
const ARROW = { from: [0.2, 0.62], to: [0.66, 0.485], shaftHalfWidth: 0.04, headLength: 0.2, headHalfWidth: 0.11 };

function roundedSquareDistance(x, y) {
  const qx = Math.abs(x - 0.5) - (BACKGROUND.half - BACKGROUND.radius);
  const qy = Math.abs(y - 0.5) - (BACKGROUND.half - BACKGROUND.radius);
  const outside = Math.hypot(Math.max(qx, 0), Math.max(qy, 0));
  return outside + Math.min(Math.max(qx, qy), 0) - BACKGROUND.radius;
}

function segmentDistance(x, y, [[ax, ay], [bx, by]]) {
  const dx = bx - ax;
  const dy = by - ay;
  const t = Math.max(0, Math.min(1, ((x - ax) * dx + (y - ay) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(x - (ax + t * dx), y - (ay + t * dy));
}

function insideTriangle(x, y, a, b, c) {
  const side = (p, q) => (q[0] - p[0]) * (y - p[1]) - (q[1] - p[1]) * (x - p[0]);
  const s1 = side(a, b);
  const s2 = side(b, c);
  const s3 = side(c, a);
  return (s1 >= 0 && s2 >= 0 && s3 >= 0) || (s1 <= 0 && s2 <= 0 && s3 <= 0);
}

/** The arrow: a shaft ending where the head begins, and a triangular head. */
const arrowShape = (() => {
  const [fx, fy] = ARROW.from;
  const [tx, ty] = ARROW.to;
  const length = Math.hypot(tx - fx, ty - fy);
  const ux = (tx - fx) / length;
  const uy = (ty - fy) / length;
  // The head's base sits at `to`; its tip lies headLength further along the shaft.
  const baseX = tx;
  const baseY = ty;
  const tip = [baseX + ux * ARROW.headLength, baseY + uy * ARROW.headLength];
  const left = [baseX - uy * ARROW.headHalfWidth, baseY + ux * ARROW.headHalfWidth];
  const right = [baseX + uy * ARROW.headHalfWidth, baseY - ux * ARROW.headHalfWidth];
  return (x, y) => segmentDistance(x, y, [ARROW.from, [baseX, baseY]]) <= ARROW.shaftHalfWidth || insideTriangle(x, y, tip, left, right);
})();

/** Colour at one sample point, or null for transparent. */
function sample(x, y) {
  if (roundedSquareDistance(x, y) > 0) return null;
  if (arrowShape(x, y)) return AMBER;
  if (segmentDistance(x, y, UPPER_BAND) <= BAND_HALF_WIDTH || segmentDistance(x, y, LOWER_BAND) <= BAND_HALF_WIDTH) return WHITE;
  return TEAL;
}

/** RGBA pixels of one icon size, premultiplied averaging over the samples. */
function render(size) {
  const pixels = Buffer.alloc(size * size * 4);
  const n = SUPERSAMPLE * SUPERSAMPLE;
  for (let py = 0; py < size; py++) {
    for (let px = 0; px < size; px++) {
      let r = 0,
        g = 0,
        b = 0,
        a = 0;
      for (let sy = 0; sy < SUPERSAMPLE; sy++) {
        for (let sx = 0; sx < SUPERSAMPLE; sx++) {
          const colour = sample((px + (sx + 0.5) / SUPERSAMPLE) / size, (py + (sy + 0.5) / SUPERSAMPLE) / size);
          if (colour === null) continue;
          r += colour[0];
          g += colour[1];
          b += colour[2];
          a += 1;
        }
      }
      const offset = (py * size + px) * 4;
      if (a > 0) {
        pixels[offset] = Math.round(r / a);
        pixels[offset + 1] = Math.round(g / a);
        pixels[offset + 2] = Math.round(b / a);
      }
      pixels[offset + 3] = Math.round((255 * a) / n);
    }
  }
  return pixels;
}

const CRC_TABLE = (() => {
  const table = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c >>> 0;
  }
  return table;
})();

function crc32(buffer) {
  let c = 0xffffffff;
  for (const byte of buffer) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type, data) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const typed = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typed));
  return Buffer.concat([length, typed, crc]);
}

/** Encodes RGBA pixels as a PNG (8-bit RGBA, no interlace, filter 0 on every row). */
function encodePng(size, pixels) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // colour type RGBA
  const rows = [];
  for (let y = 0; y < size; y++) rows.push(Buffer.from([0]), pixels.subarray(y * size * 4, (y + 1) * size * 4));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', zlib.deflateSync(Buffer.concat(rows), { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

function main() {
  for (const size of SIZES) {
    const file = path.join(__dirname, `icon-${size}.png`);
    fs.writeFileSync(file, encodePng(size, render(size)));
    console.log(`wrote ${path.relative(process.cwd(), file)}`);
  }
}

if (require.main === module) main();

module.exports = { SIZES, render, encodePng, crc32 };
