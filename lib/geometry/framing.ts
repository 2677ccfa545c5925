/**
 * Framing: bent lines, girder lines and girder points.
 */
import { pointOnSkewedLine, type Alignment, type PlanPoint } from './alignment';
import type { EdgeOffsetSpec } from './deck-edges';

/** A bent as described: station where its line crosses the alignment, skew in degrees. */
export interface BentInput {
  name: string;
  station: number;
  skew_deg: number;
}

/** A girder line: one offset per bent, laid out as a chord or concentric with the alignment. */
export interface GirderInput {
  name: string;
  layout: 'chord' | 'curved';
  offsets: readonly number[];
}

/** A point in plan with its station and offset (positive right). Length units. */
export interface LocatedPoint extends PlanPoint {
  station: number;
  offset: number;
}

/** Girder point k of a span: k / n along the girder. */
export interface GirderPoint extends LocatedPoint {
  point: number;
  fraction: number;
}

/**
 * Point of bent line `bent` at offset `offset` (length units, positive right), solved numerically
 * on a curve (the bent line is straight in plan, the offset is measured normal to the alignment).
 * `offset` may be a flared edge's station/offset list: the point whose offset equals the edge's
 * offset at its own station.
 */
export function bentLinePoint(alignment: Alignment, bent: BentInput, offset: EdgeOffsetSpec): LocatedPoint {
  return pointOnSkewedLine(alignment, bent.station, bent.skew_deg, offset);
}

/**
 * Girder points k = 0..n of one girder in one span.
 * Chord layout: Pk = Pa + (k/n)(Pb − Pa), its station and offset found by the inverse.
 * Curved layout: station and offset interpolated linearly between Pa's and Pb's, and Pk placed there.
 * @param pa, pb the girder's points on the span's first and second bent lines.
 * @param n points per span (≥ 1).
 */
export function girderPoints(alignment: Alignment, layout: 'chord' | 'curved', pa: LocatedPoint, pb: LocatedPoint, n: number): GirderPoint[] {
  const points: GirderPoint[] = new Array(n + 1);
  for (let k = 0; k <= n; k++) {
    const f = k / n;
    if (layout === 'chord') {
      const x = pa.x + f * (pb.x - pa.x);
      const y = pa.y + f * (pb.y - pa.y);
      const so = alignment.stationOffset(x, y);
      points[k] = { point: k, fraction: f, x, y, station: so.station, offset: so.offset };
    } else {
      const station = pa.station + f * (pb.station - pa.station);
      const offset = pa.offset + f * (pb.offset - pa.offset);
      const p = alignment.pointAt(station, offset);
      points[k] = { point: k, fraction: f, x: p.x, y: p.y, station, offset };
    }
  }
  return points;
}

/**
 * Which deck edges each girder faces, judged by offsets at the FIRST bent: the most negative offset
 * faces the left edge, the most positive the right edge. A tie goes to the girder listed first, on
 * either side (as a minimum or maximum search that keeps the first it finds); so a lone girder, or
 * girders that all share one offset at the first bent, leave the first girder facing both edges.
 * @returns for each girder index, the sides it faces (empty for interior girders).
 */
export function exteriorSides(girders: readonly GirderInput[]): Array<Array<'left' | 'right'>> {
  const sides: Array<Array<'left' | 'right'>> = girders.map(() => []);
  if (girders.length === 0) return sides;
  let left = 0;
  let right = 0;
  for (let g = 1; g < girders.length; g++) {
    if (girders[g].offsets[0] < girders[left].offsets[0]) left = g;
    if (girders[g].offsets[0] > girders[right].offsets[0]) right = g;
  }
  sides[left].push('left');
  sides[right].push('right');
  return sides;
}
