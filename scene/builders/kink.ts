/**
 * How sharply a line turns where two runs meet, as drawn on the screen: the angle between the
 * direction of the run arriving at a point and the run leaving it, each taken over a baseline of
 * several brackets so that the figure is the corner at the bent, not the sampling of the line.
 */

/**
 * Deviation angle in degrees (0 = straight on, 180 = doubling back) between the screen directions
 * a→b and c→d, all in pixels. NaN when either direction has no length.
 */
export function screenTurnDeg(ax: number, ay: number, bx: number, by: number, cx: number, cy: number, dx: number, dy: number): number {
  const ux = bx - ax;
  const uy = by - ay;
  const vx = dx - cx;
  const vy = dy - cy;
  const lu = Math.hypot(ux, uy);
  const lv = Math.hypot(vx, vy);
  if (!(lu > 1e-9) || !(lv > 1e-9)) return NaN;
  const cos = Math.min(1, Math.max(-1, (ux * vx + uy * vy) / (lu * lv)));
  return (Math.acos(cos) * 180) / Math.PI;
}

/**
 * Indices into a side's run of post tops (placements in span order) that measure the corner at the
 * bent between span `span` and `span + 1`: [far before, last before, first after, far after], with
 * the far ones about `reach` placements from the bent. Null when either span has fewer than two.
 */
export function bentProbeIndices(spans: readonly number[], span: number, reach: number): [number, number, number, number] | null {
  let first = -1;
  let last = -1;
  let nextFirst = -1;
  let nextLast = -1;
  for (let i = 0; i < spans.length; i++) {
    if (spans[i] === span) {
      if (first < 0) first = i;
      last = i;
    } else if (spans[i] === span + 1) {
      if (nextFirst < 0) nextFirst = i;
      nextLast = i;
    }
  }
  if (first < 0 || nextFirst < 0 || last - first < 1 || nextLast - nextFirst < 1) return null;
  const r = Math.max(1, reach);
  return [Math.max(first, last - r), last, nextFirst, Math.min(nextLast, nextFirst + r)];
}
