/**
 * The plan as a DXF drawing (@tarikjabiri/dxf): real-world coordinates in the bridge's unit, the
 * drawing unit ($INSUNITS) set from it, and plain layer names: ALIGNMENT (with station ticks),
 * DECK-EDGE, GUTTER, GIRDER, BENT, GIRDER-POINT (a POINT at every exterior girder point and one at
 * its edge point, joined by the edge-width line) and TEXT.
 */
import { DxfWriter, point3d, Units } from '@tarikjabiri/dxf';
import { formatStation, type PlanPoint } from '@/lib/geometry';
import { dxfAngle, type PlanLines } from './plan-lines';

/** Layer names and their colours (AutoCAD colour index). */
export const PLAN_LAYERS = {
  ALIGNMENT: 1,
  'DECK-EDGE': 7,
  GUTTER: 8,
  GIRDER: 5,
  BENT: 3,
  'GIRDER-POINT': 6,
  TEXT: 2,
} as const;

type Layer = keyof typeof PLAN_LAYERS;

export interface PlanDxfTitle {
  bridgeName: string;
  structureNumber: string | null;
  revision: number;
  revisionDate: string;
}

const on = (layerName: Layer) => ({ layerName });

function polyline(dxf: DxfWriter, points: PlanPoint[], layer: Layer): void {
  if (points.length < 2) return;
  if (points.length === 2) dxf.addLine(point3d(points[0].x, points[0].y), point3d(points[1].x, points[1].y), on(layer));
  else
    dxf.addLWPolyline(
      points.map((p) => ({ point: { x: p.x, y: p.y } })),
      on(layer),
    );
}

function text(dxf: DxfWriter, at: PlanPoint, height: number, value: string, rotation = 0): void {
  // DXF TEXT takes plain text; control characters and the %% codes are dropped.
  const clean = value.replace(/[\u0000-\u001f]/g, ' ').replace(/%%/g, '%');
  dxf.addText(point3d(at.x, at.y), height, clean, { ...on('TEXT'), rotation });
}

/** Text rotation that reads left to right (never upside down), degrees counterclockwise from +x. */
function readable(angle: number): number {
  let a = ((angle % 360) + 360) % 360;
  if (a > 90 && a < 270) a -= 180;
  return a;
}

function labels(dxf: DxfWriter, plan: PlanLines, title: PlanDxfTitle): void {
  const h = plan.units === 'm' ? 0.5 : 1.5;
  for (const t of plan.ticks) {
    if (!t.major) continue;
    text(dxf, t.a, h, formatStation(t.station, plan.units), readable(dxfAngle(t.bearing) + 90));
  }
  for (const b of plan.bents) text(dxf, b.a, h, b.name, readable((Math.atan2(b.b.y - b.a.y, b.b.x - b.a.x) * 180) / Math.PI));
  for (const g of plan.girders) {
    const mid = g.points[Math.floor(g.points.length / 2)];
    const p = g.points.length === 2 ? { x: (g.points[0].x + g.points[1].x) / 2, y: (g.points[0].y + g.points[1].y) / 2 } : mid;
    const end = g.points[g.points.length - 1];
    text(dxf, p, h * 0.7, `${g.name} span ${g.span}`, readable((Math.atan2(end.y - g.points[0].y, end.x - g.points[0].x) * 180) / Math.PI));
  }
  const start = plan.alignment[0];
  const lines = [
    `${title.bridgeName}${title.structureNumber ? ` (structure no. ${title.structureNumber})` : ''}`,
    `Plan from geometry revision ${title.revision} of ${title.revisionDate}; units ${plan.units === 'm' ? 'metres' : 'feet'}; coordinates x easting, y northing`,
    'Geometry only: check against the plans before use. The engineer of record and the agency decide.',
  ];
  lines.forEach((line, i) => text(dxf, { x: start.x, y: start.y - (i + 2) * h * 1.8 }, h, line));
}

/** Writes the DXF text of a sampled plan. */
export function planDxf(plan: PlanLines, title: PlanDxfTitle): string {
  const dxf = new DxfWriter();
  dxf.setUnits(plan.units === 'm' ? Units.Meters : Units.Feet);
  // $MEASUREMENT: 0 imperial, 1 metric (drawing defaults for hatch patterns and line types).
  dxf.setVariable('$MEASUREMENT', { 70: plan.units === 'm' ? 1 : 0 });
  for (const [name, colour] of Object.entries(PLAN_LAYERS)) dxf.addLayer(name, colour);

  polyline(dxf, plan.alignment, 'ALIGNMENT');
  for (const t of plan.ticks) dxf.addLine(point3d(t.a.x, t.a.y), point3d(t.b.x, t.b.y), on('ALIGNMENT'));
  for (const e of plan.edges) polyline(dxf, e.points, 'DECK-EDGE');
  for (const g of plan.gutters) polyline(dxf, g.points, 'GUTTER');
  for (const b of plan.bents) dxf.addLine(point3d(b.a.x, b.a.y), point3d(b.b.x, b.b.y), on('BENT'));
  for (const g of plan.girders) polyline(dxf, g.points, 'GIRDER');
  for (const p of plan.girderPoints) {
    dxf.addPoint(p.at.x, p.at.y, 0, on('GIRDER-POINT'));
    dxf.addPoint(p.edge.x, p.edge.y, 0, on('GIRDER-POINT'));
    dxf.addLine(point3d(p.at.x, p.at.y), point3d(p.edge.x, p.edge.y), on('GIRDER-POINT'));
  }
  labels(dxf, plan, title);
  return dxf.stringify();
}
