/**
 * LandXML 1.2 out, read back two ways: by the product's own importer (lib/import/landxml.ts), which
 * must give back the stored alignment and profile to 1e-9, and by fast-xml-parser (an independent
 * XML reader from the registry) against the element and attribute names of the LandXML 1.2 schema.
 */
import { XMLParser } from 'fast-xml-parser';
import { NextRequest } from 'next/server';
import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import type { BridgeDescription } from '@/lib/geometry';
import { parseLandXml } from '@/lib/import/landxml';
import * as alignmentXml from '@/app/api/bridges/[id]/alignment.xml/route';
import * as planDxf from '@/app/api/bridges/[id]/plan.dxf/route';
import { call, makeUsers, type TestUser } from './helpers';
import { callRaw, demoBridge } from './field-helpers';
import { metricCopy } from './export-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
beforeAll(async () => {
  people = await makeUsers();
});

const get = (handler: unknown, id: string) => callRaw(handler, new NextRequest(new URL(`/api/bridges/${id}/file`, 'http://localhost:3000'), { headers: { cookie: people.crew.cookie } }), { id });

/**
 * Element names and the attributes each may carry, from the LandXML 1.2 schema (LandXML-1.2.xsd;
 * written down from memory of the published schema, cross-checked against a generated binding of it).
 */
const POINT_ATTRS = ['code', 'desc', 'name', 'state', 'pntRef', 'featureRef', 'pointGeometry', 'DTMAttribute', 'timeStamp', 'role', 'determinedTimeStamp'];
const UNIT_ATTRS = [
  'areaUnit',
  'linearUnit',
  'volumeUnit',
  'temperatureUnit',
  'pressureUnit',
  'diameterUnit',
  'widthUnit',
  'heightUnit',
  'velocityUnit',
  'flowUnit',
  'angularUnit',
  'directionUnit',
  'latLongAngularUnit',
  'elevationUnit',
];
const SCHEMA: Record<string, string[]> = {
  LandXML: ['xmlns', 'version', 'date', 'time', 'readOnly', 'LandXMLId', 'language'],
  Units: [],
  Imperial: UNIT_ATTRS,
  Metric: UNIT_ATTRS,
  Project: ['name', 'desc', 'state'],
  Application: ['name', 'desc', 'manufacturer', 'version', 'manufacturerURL', 'timeStamp'],
  Alignments: ['name', 'desc', 'state'],
  Alignment: ['name', 'length', 'staStart', 'desc', 'oID', 'state'],
  CoordGeom: ['name', 'desc', 'oID', 'state'],
  Line: ['desc', 'dir', 'length', 'name', 'staStart', 'state', 'oID', 'note'],
  Curve: ['rot', 'chord', 'crvType', 'delta', 'desc', 'dirEnd', 'dirStart', 'external', 'length', 'midOrd', 'name', 'radius', 'staStart', 'state', 'tangent', 'oID', 'note'],
  Spiral: [
    'length',
    'radiusEnd',
    'radiusStart',
    'rot',
    'spiType',
    'chord',
    'constant',
    'desc',
    'dirEnd',
    'dirStart',
    'name',
    'theta',
    'totalY',
    'totalX',
    'staStart',
    'state',
    'tanLong',
    'tanShort',
    'oID',
    'note',
  ],
  Start: POINT_ATTRS,
  End: POINT_ATTRS,
  Center: POINT_ATTRS,
  PI: POINT_ATTRS,
  Profile: ['desc', 'name', 'staStart', 'endSta', 'state'],
  ProfAlign: ['name', 'desc', 'state', 'note'],
  PVI: ['desc', 'code', 'pntRef'],
  ParaCurve: ['length', 'desc'],
};

type Node = Record<string, unknown>;

/** Walks fast-xml-parser's tree and lists every element or attribute the schema does not name. */
function outsideSchema(name: string, node: unknown, out: string[] = []): string[] {
  const allowed = SCHEMA[name];
  if (!allowed) {
    out.push(`element ${name}`);
    return out;
  }
  for (const item of Array.isArray(node) ? node : [node]) {
    if (item === null || typeof item !== 'object') continue;
    for (const [k, v] of Object.entries(item as Node)) {
      if (k === '#text') continue;
      if (k.startsWith('@_')) {
        if (!allowed.includes(k.slice(2))) out.push(`${name}@${k.slice(2)}`);
      } else outsideSchema(k, v, out);
    }
  }
  return out;
}

const near = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));
const bearingNear = (a: number, b: number) => Math.abs(((((a - b) % 360) + 540) % 360) - 180) <= 1e-9;

/** Imports the route's file with the product's importer and compares it with the stored description. */
async function roundTrip(description: BridgeDescription) {
  const id = await demoBridge(people.engineer, description);
  const res = await get(alignmentXml.GET, id);
  expect(res.status).toBe(200);
  const xml = res.body.toString('utf8');
  const imported = parseLandXml(xml, description.units);
  expect(imported.alignments.length).toBe(1);
  expect(imported.skipped).toEqual([]);
  const got = imported.alignments[0];
  const want = description.alignment;
  expect(near(got.alignment.start_station, want.start_station)).toBe(true);
  expect(near(got.alignment.start_x, want.start_x)).toBe(true);
  expect(near(got.alignment.start_y, want.start_y)).toBe(true);
  expect(bearingNear(got.alignment.start_bearing_deg, want.start_bearing_deg), `${got.alignment.start_bearing_deg}`).toBe(true);
  expect(got.alignment.elements.length).toBe(want.elements.length);
  got.alignment.elements.forEach((e, i) => {
    const w = want.elements[i] as unknown as Record<string, unknown>;
    const g = e as unknown as Record<string, unknown>;
    expect(g.type).toBe(w.type);
    for (const key of ['length', 'radius', 'radius_start', 'radius_end'] as const) {
      if (w[key] === undefined) continue;
      if (w[key] === null) expect(g[key], `element ${i + 1} ${key}`).toBeNull();
      else expect(near(g[key] as number, w[key] as number), `element ${i + 1} ${key}: ${g[key]} vs ${w[key]}`).toBe(true);
    }
    if (w.direction) expect(g.direction).toBe(w.direction);
  });
  const pvis = got.profile?.pvis ?? [];
  expect(pvis.length).toBe(description.profile.pvis.length);
  description.profile.pvis.forEach((p, i) => {
    expect(near(pvis[i].station, p.station) && near(pvis[i].elevation, p.elevation)).toBe(true);
    expect(near(pvis[i].curve_length ?? 0, p.curve_length ?? 0)).toBe(true);
  });
  return { res, xml };
}

describe('GET /api/bridges/:id/alignment.xml', () => {
  it('round-trips the stored alignment and profile through the product’s own importer to 1e-9 (feet and metres)', async () => {
    const { res } = await roundTrip(demoBridges[0]);
    expect(res.headers.get('content-type')).toBe('application/xml; charset=utf-8');
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename=".*-rev1-alignment\.xml"$/);
    expect(res.headers.get('cache-control')).toBe('no-store');
    await roundTrip(demoBridges[1]);
    await roundTrip(metricCopy(demoBridges[0]));
    // A curve to the left first, then a line.
    const left = {
      ...demoBridges[0],
      alignment: {
        ...demoBridges[0].alignment,
        start_bearing_deg: 350,
        elements: [
          { type: 'arc' as const, length: 420, radius: 1500, direction: 'left' as const },
          { type: 'line' as const, length: 400 },
        ],
      },
    };
    await roundTrip(left);
  });

  it('writes clothoids as <Spiral spiType="clothoid"> with INF for a tangent end, and they round-trip too', async () => {
    const spirals = {
      ...demoBridges[0],
      alignment: {
        ...demoBridges[0].alignment,
        elements: [
          { type: 'line' as const, length: 150 },
          { type: 'spiral' as const, length: 40, radius_start: null, radius_end: 1000, direction: 'right' as const },
          { type: 'arc' as const, length: 420, radius: 1000, direction: 'right' as const },
          { type: 'spiral' as const, length: 60, radius_start: 1000, radius_end: 700, direction: 'right' as const },
          { type: 'spiral' as const, length: 80, radius_start: 700, radius_end: null, direction: 'right' as const },
          { type: 'line' as const, length: 200 },
        ],
      },
    } as BridgeDescription;
    const { xml } = await roundTrip(spirals);
    const geom = ((((new XMLParser({ ignoreAttributes: false }).parse(xml) as Node).LandXML as Node).Alignments as Node).Alignment as Node).CoordGeom as Node;
    const list = geom.Spiral as Node[];
    expect(list.map((s) => [s['@_spiType'], s['@_rot'], s['@_radiusStart'], s['@_radiusEnd'], s['@_length']])).toEqual([
      ['clothoid', 'cw', 'INF', '1000', '40'],
      ['clothoid', 'cw', '1000', '700', '60'],
      ['clothoid', 'cw', '700', 'INF', '80'],
    ]);
  });

  it('uses only LandXML 1.2 element and attribute names, northing first, in the bridge’s unit', async () => {
    const { xml } = await roundTrip(demoBridges[0]);
    // fast-xml-parser: an independent XML reader.
    const tree = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '@_', parseAttributeValue: false, parseTagValue: false }).parse(xml) as Node;
    const root = tree.LandXML as Node;
    expect(root['@_version']).toBe('1.2');
    expect(root['@_xmlns']).toBe('http://www.landxml.org/schema/LandXML-1.2');
    expect(outsideSchema('LandXML', root)).toEqual([]);
    expect(((root.Units as Node).Imperial as Node)['@_linearUnit']).toBe('foot');
    const alignment = (root.Alignments as Node).Alignment as Node;
    const geom = alignment.CoordGeom as Node;
    expect(Object.keys(geom)).toEqual(['Line', 'Curve']);
    const curve = geom.Curve as Node;
    expect(curve['@_rot']).toBe('cw');
    // LandXML points are "northing easting": the start of the demo's first line is (x 5000, y 5000),
    // its end 150 ft along bearing 30°: northing 5000 + 150 cos 30°, easting 5000 + 150 sin 30°.
    const firstEnd = ((geom.Line as Node[])[0].End as string).split(' ').map(Number);
    expect(Math.abs(firstEnd[0] - (5000 + 150 * Math.cos(Math.PI / 6)))).toBeLessThan(1e-9);
    expect(Math.abs(firstEnd[1] - (5000 + 150 * Math.sin(Math.PI / 6)))).toBeLessThan(1e-9);
    const prof = (alignment.Profile as Node).ProfAlign as Node;
    expect(prof.PVI).toHaveLength(2);
    expect((prof.ParaCurve as Node)['@_length']).toBe('400');
    const metric = await roundTrip(metricCopy(demoBridges[0]));
    const mroot = (new XMLParser({ ignoreAttributes: false }).parse(metric.xml) as Node).LandXML as Node;
    expect(((mroot.Units as Node).Metric as Node)['@_linearUnit']).toBe('meter');
    expect(outsideSchema('LandXML', mroot)).toEqual([]);
  });

  it('answers the plan as a DXF attachment, never cached, and refuses strangers', async () => {
    const id = await demoBridge(people.engineer);
    const res = await get(planDxf.GET, id);
    expect(res.headers.get('content-type')).toBe('application/dxf');
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename=".*-rev1-plan\.dxf"$/);
    expect(res.headers.get('cache-control')).toBe('no-store');
    expect((await call(planDxf.GET, { params: { id } })).status).toBe(401);
    expect((await call(alignmentXml.GET, { params: { id } })).status).toBe(401);
    expect((await call(alignmentXml.GET, { cookie: people.crew.cookie, params: { id: 'x' } })).status).toBe(404);
  });
});
