/**
 * Builds the offset table from a description in four named steps: framing (points on the bent
 * lines, girder points), edge points and elevations (one row per girder point), and chord offsets
 * with the span summaries. Geometry problems found on the way (a girder point at or past the deck
 * edge, bent lines crossing, a solve that fails) are collected, not thrown, so that validation and
 * computation share one pass.
 */
import { deflectionTables, girderSpanKey } from './deflections';
import type { GeometryIssue } from './errors';
import { exteriorSides } from './framing';
import type { BridgeDescription } from './schema';
import { frameBents, spanGirderPoints, type Framing } from './table-framing';
import { createBridgeModel, type BridgeModel } from './table-model';
import { girderPointKey, interiorRows, overhangRows, type RowContext } from './table-rows';
import { spanChords } from './table-chords';
import type { ChordOffsetSet, OffsetPoint, OffsetTable, SpanSummary } from './types';

export { createBridgeModel, type BridgeModel } from './table-model';

type SpanWidths = Record<'left' | 'right', { girder: string; widths: number[] } | null>;

/** Rows of every girder in span j (0-based); the exterior girders' edge widths go to `widths`. */
function spanRows(ctx: RowContext, framing: Framing, sides: Array<Array<'left' | 'right'>>, j: number, widths: SpanWidths): OffsetPoint[] {
  const { bridge, model, issues } = ctx;
  const span = j + 1;
  const rows: OffsetPoint[] = [];
  for (let gi = 0; gi < bridge.girders.length; gi++) {
    const frame = spanGirderPoints(bridge, model, framing, gi, j, issues);
    if (!frame) continue;
    const g = bridge.girders[gi];
    const values = ctx.deflections.get(girderSpanKey(g.name, span));
    if (sides[gi].length === 0) {
      rows.push(...interiorRows(ctx, gi, span, frame.points, values));
      continue;
    }
    for (const side of sides[gi]) {
      const r = overhangRows(ctx, gi, span, frame, side, values);
      rows.push(...r.rows);
      if (r.widths) widths[side] = { girder: g.name, widths: r.widths };
    }
  }
  return rows;
}

/**
 * Compute the full offset table; problems go to `issues` (the table is still returned, possibly
 * incomplete, and must not be used when any issue was recorded).
 */
export function buildOffsetTable(bridge: BridgeDescription, issues: GeometryIssue[]): OffsetTable {
  const model: BridgeModel = createBridgeModel(bridge);
  const topOfGirder = new Map<string, number>();
  for (const t of bridge.top_of_girder ?? []) topOfGirder.set(girderPointKey(t.girder, t.span, t.point), t.elevation);
  const ctx: RowContext = { bridge, model, issues, topOfGirder, deflections: deflectionTables(bridge.deflections), edgeIssues: 0 };
  const framing = frameBents(bridge, model, issues);
  const sides = exteriorSides(bridge.girders);

  const points: OffsetPoint[] = [];
  const chordOffsets: ChordOffsetSet[] = [];
  const summaries: SpanSummary[] = [];
  for (let j = 0; j + 1 < bridge.bents.length; j++) {
    const widths: SpanWidths = { left: null, right: null };
    points.push(...spanRows(ctx, framing, sides, j, widths));
    for (const side of ['left', 'right'] as const) {
      const { set, summary } = spanChords(bridge, model, framing, j, side, widths[side], issues);
      if (set) chordOffsets.push(set);
      if (summary) summaries.push(summary);
    }
  }
  if (ctx.edgeIssues > 20) {
    issues.push({ path: 'girders', message: `${ctx.edgeIssues - 20} more girder points are at or beyond a deck edge` });
  }
  return { units: model.units, points, chord_offsets: chordOffsets, span_summaries: summaries };
}
