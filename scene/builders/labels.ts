/**
 * Label placement on the screen: labels anchored at scene points are laid out nearest first; a
 * label whose box would overlap one already placed, or the box kept clear around the picked point,
 * tries the spot above its anchor and then below it, and otherwise hides. Labels stay inside the
 * picture (moved in from the edges when their anchor is in view). Pure and allocation-free per
 * call once the buffers exist, so it can run inside the render loop.
 */

/** Screen box in CSS pixels, top-left origin. */
export interface ScreenBox {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** Buffers for `placeLabels`, sized for `count` labels; reuse them from frame to frame. */
export interface LabelBuffers {
  count: number;
  /** Per label: anchor x, anchor y (px), depth (distance from the camera), in front (1) or not (0). */
  anchors: Float64Array;
  /** Per label: width, height (px) of its box. */
  sizes: Float64Array;
  /** Per label: lower ranks are placed first (bents before stations), then nearer first. */
  ranks: Int32Array;
  /** Output per label: x, y, w, h of the placed box (px). */
  boxes: Float64Array;
  /** Output per label: 1 when shown. */
  shown: Uint8Array;
  order: number[];
}

/** Makes the buffers for `count` labels. */
export function labelBuffers(count: number): LabelBuffers {
  return {
    count,
    anchors: new Float64Array(count * 4),
    sizes: new Float64Array(count * 2),
    ranks: new Int32Array(count),
    boxes: new Float64Array(count * 4),
    shown: new Uint8Array(count),
    order: Array.from({ length: count }, (_, i) => i),
  };
}

/** True when two boxes overlap by more than `gap` px of clearance (touching edges do not count). */
export function boxesIntersect(a: ScreenBox, b: ScreenBox, gap = 0): boolean {
  return a.x < b.x + b.w + gap && b.x < a.x + a.w + gap && a.y < b.y + b.h + gap && b.y < a.y + a.h + gap;
}

function hitsPlaced(buf: LabelBuffers, placed: number, x: number, y: number, w: number, h: number, gap: number): boolean {
  for (let k = 0; k < placed; k++) {
    const j = buf.order[k];
    if (!buf.shown[j]) continue;
    const o = j * 4;
    if (x < buf.boxes[o] + buf.boxes[o + 2] + gap && buf.boxes[o] < x + w + gap && y < buf.boxes[o + 1] + buf.boxes[o + 3] + gap && buf.boxes[o + 1] < y + h + gap) return true;
  }
  return false;
}

/**
 * Places the labels of `buf` in a `width` × `height` picture, keeping clear of `avoid` (the picked
 * point's box; null for none) and `gap` px apart. Writes `buf.boxes` and `buf.shown`.
 * @returns how many labels are shown.
 */
export function placeLabels(buf: LabelBuffers, width: number, height: number, avoid: ScreenBox | null, gap = 2): number {
  const { anchors, ranks } = buf;
  buf.order.sort((a, b) => ranks[a] - ranks[b] || anchors[a * 4 + 2] - anchors[b * 4 + 2]);
  let shownCount = 0;
  for (let k = 0; k < buf.count; k++) {
    const i = buf.order[k];
    buf.shown[i] = 0;
    const ax = anchors[i * 4];
    const ay = anchors[i * 4 + 1];
    const inFront = anchors[i * 4 + 3] > 0;
    const w = buf.sizes[i * 2];
    const h = buf.sizes[i * 2 + 1];
    if (!inFront || w <= 0 || w > width || h > height || ax < 0 || ax > width || ay < 0 || ay > height) continue;
    // Centred on the anchor, then folded above it, then below it.
    for (let tryIndex = 0; tryIndex < 3; tryIndex++) {
      const dy = tryIndex === 0 ? -h / 2 : tryIndex === 1 ? -h * 1.6 : h * 0.6;
      const x = Math.min(Math.max(ax - w / 2, 0), width - w);
      const y = Math.min(Math.max(ay + dy, 0), height - h);
      if (avoid && x < avoid.x + avoid.w + gap && avoid.x < x + w + gap && y < avoid.y + avoid.h + gap && avoid.y < y + h + gap) continue;
      if (hitsPlaced(buf, k, x, y, w, h, gap)) continue;
      const o = i * 4;
      buf.boxes[o] = x;
      buf.boxes[o + 1] = y;
      buf.boxes[o + 2] = w;
      buf.boxes[o + 3] = h;
      buf.shown[i] = 1;
      shownCount++;
      break;
    }
  }
  return shownCount;
}
