/**
 * The plan as DXF, read back with dxf-parser (an independent DXF reader from the registry), and the
 * alignment as LandXML 1.2, read back by the product's own importer and by fast-xml-parser.
 */
import DxfParser from 'dxf-parser';
import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { createAlignment, type BridgeDescription, type OffsetTable } from '@/lib/geometry';
import * as planDxf from '@/app/api/bridges/[id]/plan.dxf/route';
import * as offsets from '@/app/api/bridges/[id]/offsets/route';
import { call, makeUsers, type TestUser } from './helpers';
import { demoBridge } from './field-helpers';
import { metricCopy } from './export-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
beforeAll(async () => {
  people = await makeUsers();
});

type Entity = { type: string; layer: string; position?: { x: number; y: number }; vertices?: { x: number; y: number }[]; text?: string };

async function readDxf(id: string) {
  const res = await call(planDxf.GET, { cookie: people.crew.cookie, params: { id } });
  expect(res.status, res.text).toBe(200);
  // dxf-parser: an independent reader of the DXF group codes.
  const dxf = new DxfParser().parseSync(res.text) as unknown as { header: Record<string, unknown>; tables: { layer: { layers: Record<string, unknown> } }; entities: Entity[] };
  return { res, dxf, on: (layer: string, type?: string) => dxf.entities.filter((e) => e.layer === layer && (!type || e.type === type)) };
}

async function tableOf(id: string): Promise<OffsetTable> {
  return (await call(offsets.GET, { cookie: people.crew.cookie, params: { id } })).json as OffsetTable;
}

const demo = demoBridges[0] as BridgeDescription & { deck: { left_edge_offset: number; right_edge_offset: number } };
const deg = Math.PI / 180;
/**
 * The demo's 1000 ft curve by hand (handbook circular-curve layout): PC 150 ft along the 30° start
 * bearing from (5000, 5000); the centre 1000 ft to the right of the PC, square to that bearing. The
 * curve runs from station 1150 to 1650.
 */
const PC = { x: 5000 + 150 * Math.sin(30 * deg), y: 5000 + 150 * Math.cos(30 * deg) };
const CENTRE = { x: PC.x + 1000 * Math.cos(30 * deg), y: PC.y - 1000 * Math.sin(30 * deg) };
const fromCentre = (p: { x: number; y: number }) => Math.hypot(p.x - CENTRE.x, p.y - CENTRE.y);

describe('GET /api/bridges/:id/plan.dxf', () => {
  it('has the plain layers, the drawing unit and a DXF attachment that is never cached', async () => {
    const { res, dxf } = await readDxf(await demoBridge(people.engineer));
    for (const layer of ['ALIGNMENT', 'DECK-EDGE', 'GUTTER', 'GIRDER', 'BENT', 'GIRDER-POINT', 'TEXT']) expect(Object.keys(dxf.tables.layer.layers)).toContain(layer);
    // $INSUNITS 2 = feet, 6 = metres (DXF reference, HEADER section variables).
    expect(dxf.header.$INSUNITS).toBe(2);
    expect(res.text.length).toBeGreaterThan(1000);
    const metric = await readDxf(await demoBridge(people.engineer, metricCopy(demo)));
    expect(metric.dxf.header.$INSUNITS).toBe(6);
  });

  it('puts one POINT at every exterior girder point and one at its edge point, at the engine’s x and y to 1e-6', async () => {
    const id = await demoBridge(people.engineer);
    const table = await tableOf(id);
    const { on } = await readDxf(id);
    const rows = table.points.filter((p) => p.side !== 'interior');
    const points = on('GIRDER-POINT', 'POINT').map((e) => e.position as { x: number; y: number });
    expect(points.length).toBe(2 * rows.length);
    const near = (x: number, y: number) => points.some((q) => Math.abs(q.x - x) <= 1e-6 && Math.abs(q.y - y) <= 1e-6);
    for (const p of rows) {
      expect(near(p.x, p.y), `girder point ${p.span}/${p.girder}/${p.point}`).toBe(true);
      expect(near(p.edge_x as number, p.edge_y as number), `edge point ${p.span}/${p.girder}/${p.point}`).toBe(true);
    }
  });

  it('draws both deck edges with every vertex on the edge line, on the curve at R ∓ the edge offset from its centre', async () => {
    const { on } = await readDxf(await demoBridge(people.engineer));
    const edges = on('DECK-EDGE');
    expect(edges.length).toBe(2);
    const al = createAlignment(demo.alignment);
    let onCurve = 0;
    for (const e of edges) {
      const vertices = e.vertices as { x: number; y: number }[];
      expect(vertices.length).toBeGreaterThan(20);
      const side = al.stationOffset(vertices[0].x, vertices[0].y).offset < 0 ? 'left' : 'right';
      const offset = side === 'left' ? demo.deck.left_edge_offset : demo.deck.right_edge_offset;
      for (const v of vertices) {
        // The engine's edge line: the points whose offset from the alignment is the edge offset.
        const so = al.stationOffset(v.x, v.y);
        expect(Math.abs(so.offset - offset)).toBeLessThanOrEqual(0.001);
        // Handbook: a parallel at offset o to a circular curve of radius R turning right is a circle of radius R − o.
        if (so.station > 1150.001 && so.station < 1649.999) {
          expect(Math.abs(fromCentre(v) - (1000 - offset))).toBeLessThanOrEqual(0.001);
          onCurve++;
        }
      }
    }
    expect(onCurve).toBeGreaterThan(40);
    expect(on('GUTTER').length).toBe(2);
  });

  it('follows a flared edge: every vertex at the listed offset, linear in station between the rows', async () => {
    // Contract, "deck": a flared edge is linear in station between the listed stations, constant beyond.
    const rows = [
      { station: 1250, offset: 21 },
      { station: 1350, offset: 24 },
    ];
    const flared = { ...demo, deck: { ...demo.deck, right_edge_offset: rows } } as BridgeDescription;
    const { on } = await readDxf(await demoBridge(people.engineer, flared));
    const al = createAlignment(demo.alignment);
    const expected = (s: number) => (s <= 1250 ? 21 : s >= 1350 ? 24 : 21 + ((s - 1250) / 100) * 3);
    const right = on('DECK-EDGE').find((e) => al.stationOffset((e.vertices as { x: number; y: number }[])[0].x, (e.vertices as { x: number; y: number }[])[0].y).offset > 0);
    const vs = right?.vertices as { x: number; y: number }[];
    let inFlare = 0;
    for (const v of vs) {
      const so = al.stationOffset(v.x, v.y);
      expect(Math.abs(so.offset - expected(so.station)), `station ${so.station}`).toBeLessThanOrEqual(0.001);
      if (so.station > 1250 && so.station < 1350) inFlare++;
    }
    // The kinks of the flare are vertices, and the taper between them is sampled.
    expect(inFlare).toBeGreaterThan(5);
    for (const kink of rows) expect(vs.some((v) => Math.abs(al.stationOffset(v.x, v.y).station - kink.station) < 1e-6)).toBe(true);
  });

  it('draws the alignment on its curve, ticks its stations and labels them', async () => {
    const { on } = await readDxf(await demoBridge(people.engineer));
    const line = on('ALIGNMENT', 'LWPOLYLINE');
    expect(line.length).toBe(1);
    const curve = (line[0].vertices as { x: number; y: number }[]).filter((v) => Math.hypot(v.x - PC.x, v.y - PC.y) > 0.01 && fromCentre(v) < 1000.5);
    expect(curve.length).toBeGreaterThan(50);
    for (const v of curve) expect(Math.abs(fromCentre(v) - 1000)).toBeLessThanOrEqual(1e-6);
    // Ticks every 20 ft from 10+00 to 18+50: stations 1000, 1020, …, 1840.
    expect(on('ALIGNMENT', 'LINE').length).toBe(43);
    const labels = on('TEXT').map((t) => t.text);
    for (const s of ['10+00.00', '11+00.00', '18+00.00', 'Abutment 1', 'Pier 2', 'Abutment 4']) expect(labels).toContain(s);
  });

  it('draws chord girders as lines between their end points and curved girders as polylines on their own curve', async () => {
    const chordId = await demoBridge(people.engineer);
    const table = await tableOf(chordId);
    const chord = (await readDxf(chordId)).on('GIRDER', 'LINE');
    expect(chord.length).toBe(5 * 3);
    const ends = (span: number, girder: string) => table.points.filter((p) => p.span === span && p.girder === girder).sort((a, b) => a.point - b.point);
    for (const e of chord) {
      const [a, b] = e.vertices as { x: number; y: number }[];
      const match = [1, 2, 3].flatMap((s) => demo.girders.map((g) => ends(s, g.name))).find((rows) => Math.hypot(rows[0].x - a.x, rows[0].y - a.y) < 1e-6);
      expect(match).toBeDefined();
      const last = (match as OffsetTable['points'])[(match as OffsetTable['points']).length - 1];
      expect(Math.hypot(last.x - b.x, last.y - b.y)).toBeLessThan(1e-6);
    }
    const curved = { ...demo, girders: demo.girders.map((g) => ({ ...g, layout: 'curved' as const })) };
    const lines = (await readDxf(await demoBridge(people.engineer, curved))).on('GIRDER', 'LWPOLYLINE');
    expect(lines.length).toBe(15);
    for (const e of lines) {
      const vs = e.vertices as { x: number; y: number }[];
      // Concentric with the alignment at a constant offset: one radius from the curve's centre throughout.
      const r = fromCentre(vs[0]);
      for (const v of vs) expect(Math.abs(fromCentre(v) - r)).toBeLessThanOrEqual(1e-6);
    }
  });
});
