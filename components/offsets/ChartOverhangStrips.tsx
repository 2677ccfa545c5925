'use client';

import type { DisplayStyle, SpanSummary } from '@/lib/geometry';
import ChartStrip, { type ChartBent, type ChartSeries } from '@/components/offsets/ChartStrip';
import type { OffsetPointRow } from '@/components/offsets/offset-table-types';
import { lengthWithUnit, stationText, type Units } from '@/lib/units';

// Okabe & Ito, "Color Universal Design" (2008): blue and vermillion stay apart for every common
// colour-vision deficiency; the series also differ by marker shape and dash.
const SIDE_STYLE = {
  left: { color: '#0072B2', marker: 'circle' as const, dash: undefined, name: 'Left overhang' },
  right: { color: '#D55E00', marker: 'square' as const, dash: '6 3', name: 'Right overhang' },
};

function seriesOf(points: OffsetPointRow[], summaries: SpanSummary[], value: (p: OffsetPointRow) => number | null, label: (p: OffsetPointRow, v: number) => string): ChartSeries[] {
  const out: ChartSeries[] = [];
  for (const side of ['left', 'right'] as const) {
    const rows = points.filter((p) => p.side === side);
    if (rows.length === 0) continue;
    const spans = [...new Set(rows.map((p) => p.span))].sort((a, b) => a - b);
    const segments = spans.map((span) => {
      const fast = summaries.find((s) => s.span === span && s.side === side)?.fastest_change ?? null;
      return rows
        .filter((p) => p.span === span && value(p) !== null)
        .sort((a, b) => a.point - b.point)
        .map((p) => {
          const v = value(p) as number;
          return { x: p.station, y: v, label: label(p, v), marked: fast !== null && (p.point === fast.from_point || p.point === fast.to_point) };
        });
    });
    const girder = rows[0].girder;
    out.push({ id: side, ...SIDE_STYLE[side], name: `${SIDE_STYLE[side].name} (${girder})`, segments });
  }
  return out;
}

/**
 * The two pictures a trainer points at: in plan, the edge width of each exterior girder along the
 * bridge (it bows between bents where straight girders sit under a curved edge); in elevation, the
 * form edge's drop below the bottom of slab at the girder, whose kinks at the bents are why the
 * finished forms look peaked.
 */
export default function ChartOverhangStrips({ points, summaries, bents, units, style }: { points: OffsetPointRow[]; summaries: SpanSummary[]; bents: ChartBent[]; units: Units; style: DisplayStyle }) {
  const axisUnit = units;
  const fmt = (v: number) => lengthWithUnit(v, units, style);
  const tick = (v: number) => (units === 'm' ? v.toFixed(2) : v.toFixed(2).replace(/\.?0+$/, '') || '0');
  const where = (p: OffsetPointRow) => `span ${p.span} point ${p.point}, station ${stationText(p.station, units)}`;
  const stationTick = (x: number) => stationText(x, units).replace(/\.0+$/, '');
  return (
    <div className="grid gap-4">
      <ChartStrip
        title="Plan: edge width along the bridge"
        description={`Horizontal distance from each exterior girder's centreline to the deck edge, square to the girder, at every girder point. Straight girders under a curved edge make it bow between bents; the diamonds mark where it changes fastest in each span.`}
        xLabel={`Station (${units})`}
        yLabel={`Edge width (${axisUnit})`}
        series={seriesOf(
          points,
          summaries,
          (p) => p.edge_width,
          (p, v) => `${where(p)}: edge width ${fmt(v)}`,
        )}
        bents={bents}
        formatX={stationTick}
        formatY={tick}
        markLabel="Fastest change of edge width in the span"
      />
      <ChartStrip
        title="Elevation: form edge below the bottom of slab at the girder"
        description="Edge drop at every girder point, drawn downward as the form edge hangs below the girder's bottom of slab. Where two spans meet at a bent the line kinks: the forms look peaked there even when every grade is right."
        xLabel={`Station (${units})`}
        yLabel={`Edge drop, down (${axisUnit})`}
        series={seriesOf(
          points,
          summaries,
          (p) => p.edge_drop,
          (p, v) => `${where(p)}: edge drop ${fmt(v)}`,
        )}
        bents={bents}
        formatX={stationTick}
        formatY={tick}
        invertY
        markLabel="Where the edge width changes fastest in the span"
      />
    </div>
  );
}
