// Draws the home-screen icons (public/icons/*.png) from Chordline's mark: the arc of a curved deck
// edge over its chord, as in app/icon.svg and components/Wordmark.tsx. Pure JS (jimp), no browser.
// Run again after changing the mark: npx tsx lib/cli/make-icons.ts
import fs from 'node:fs';
import path from 'node:path';
import { Jimp } from 'jimp';

type Rgb = [number, number, number];
const hex = (h: string): Rgb => [1, 3, 5].map((i) => parseInt(h.slice(i, i + 2), 16)) as Rgb;

// tailwind.config.ts tokens: brand-700 ground, brand-100 arc, white chord (as app/icon.svg).
const GROUND = hex('#12544b');
const ARC = hex('#cce8e3');
const CHORD = hex('#ffffff');

/** The mark in app/icon.svg's 32-unit box: quadratic arc (5,21)-(16,6)-(27,21) and its chord. */
function arcPolyline(steps = 240): [number, number][] {
  const pts: [number, number][] = [];
  for (let i = 0; i <= steps; i++) {
    const t = i / steps;
    const x = (1 - t) ** 2 * 5 + 2 * (1 - t) * t * 16 + t ** 2 * 27;
    const y = (1 - t) ** 2 * 21 + 2 * (1 - t) * t * 6 + t ** 2 * 21;
    pts.push([x, y]);
  }
  return pts;
}

function segmentDistance(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax;
  const dy = by - ay;
  const t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(px - ax - t * dx, py - ay - t * dy);
}

function polylineDistance(px: number, py: number, pts: [number, number][]): number {
  let d = Infinity;
  for (let i = 1; i < pts.length; i++) d = Math.min(d, segmentDistance(px, py, pts[i - 1][0], pts[i - 1][1], pts[i][0], pts[i][1]));
  return d;
}

/** Signed distance to a rounded square of half-size h and corner radius r centred at c (negative inside). */
function roundedSquareDistance(px: number, py: number, c: number, h: number, r: number): number {
  const qx = Math.abs(px - c) - (h - r);
  const qy = Math.abs(py - c) - (h - r);
  return Math.hypot(Math.max(qx, 0), Math.max(qy, 0)) + Math.min(Math.max(qx, qy), 0) - r;
}

/**
 * One icon of `size` px. `maskable`: the ground fills the square and the mark shrinks into the safe
 * zone (the central circle of 80 % diameter that every launcher shape keeps).
 */
async function drawIcon(size: number, maskable: boolean): Promise<Buffer> {
  const image = new Jimp({ width: size, height: size, color: 0x00000000 });
  const arc = arcPolyline();
  const unit = size / 32;
  // The mark spans x 5..27 (22 units) around its centre (16, 13.5); maskable icons draw it at 62 %.
  const scale = maskable ? 0.62 : 1;
  const toMark = (x: number, y: number): [number, number] => [16 + (x / unit - 16) / scale, 13.5 + (y / unit - 16 + 2.5 * scale) / scale];
  const halfStroke = 1.25;
  const data = image.bitmap.data;
  for (let y = 0; y < size; y++) {
    for (let x = 0; x < size; x++) {
      const cx = x + 0.5;
      const cy = y + 0.5;
      const ground = maskable ? 1 : Math.max(0, Math.min(1, 0.5 - roundedSquareDistance(cx, cy, size / 2, size / 2, 6 * unit)));
      if (ground === 0) continue;
      const [mx, my] = toMark(cx, cy);
      const pxPerMark = unit * scale;
      const arcCover = Math.max(0, Math.min(1, (halfStroke - polylineDistance(mx, my, arc)) * pxPerMark + 0.5));
      const chordCover = Math.max(0, Math.min(1, (halfStroke - segmentDistance(mx, my, 5, 21, 27, 21)) * pxPerMark + 0.5));
      let rgb: Rgb = GROUND;
      rgb = rgb.map((v, i) => v + (ARC[i] - v) * arcCover) as Rgb;
      rgb = rgb.map((v, i) => v + (CHORD[i] - v) * chordCover) as Rgb;
      const o = (y * size + x) * 4;
      data[o] = Math.round(rgb[0]);
      data[o + 1] = Math.round(rgb[1]);
      data[o + 2] = Math.round(rgb[2]);
      data[o + 3] = Math.round(255 * ground);
    }
  }
  return image.getBuffer('image/png');
}

async function main() {
  const dir = path.join(process.cwd(), 'public', 'icons');
  fs.mkdirSync(dir, { recursive: true });
  const icons: [string, number, boolean][] = [
    ['icon-192.png', 192, false],
    ['icon-512.png', 512, false],
    ['maskable-192.png', 192, true],
    ['maskable-512.png', 512, true],
    ['apple-touch-icon.png', 180, true],
  ];
  for (const [name, size, maskable] of icons) {
    fs.writeFileSync(path.join(dir, name), await drawIcon(size, maskable));
    console.log(`public/icons/${name} (${size} px${maskable ? ', maskable' : ''})`);
  }
}

void main();
