import { NextRequest } from 'next/server';
import { computeOffsetTable, type OffsetPoint } from '@/lib/geometry';
import { demoBridges } from '@/lib/demo/bridges';
import { createBridge } from '@/lib/services/bridges';
import type { TestUser } from './helpers';

/** A smallest valid PNG (1×1, PNG spec §5.2 signature + IHDR/IDAT/IEND), as any camera app would save it. */
export const PNG_1X1 = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==', 'base64');

/** JPEG start: SOI + APP0 "JFIF" marker (ISO/IEC 10918-1, JFIF 1.02), padded. */
export const JPEG_START = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]), Buffer.from('JFIF\0', 'latin1'), Buffer.alloc(200, 7)]);

/** Builds a real multipart/form-data request (the browser's encoding via the Fetch API's FormData). */
export async function multipartRequest(
  url: string,
  cookie: string | undefined,
  file: { bytes: Uint8Array; name: string; type: string } | null,
  fields: Record<string, string> = {},
): Promise<NextRequest> {
  const form = new FormData();
  if (file) form.append('file', new Blob([new Uint8Array(file.bytes)], { type: file.type }), file.name);
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  const encoded = new Request('http://localhost:3000/x', { method: 'POST', body: form });
  const body = Buffer.from(await encoded.arrayBuffer());
  const headers: Record<string, string> = {
    'content-type': encoded.headers.get('content-type') as string,
    'content-length': String(body.byteLength),
    origin: 'http://localhost:3000',
  };
  if (cookie) headers.cookie = cookie;
  return new NextRequest(new URL(url, 'http://localhost:3000'), { method: 'POST', headers, body });
}

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** Calls a route handler with a prepared request. */
export async function callRaw(handler: unknown, req: NextRequest, params: Record<string, string> = {}) {
  const res = await (handler as Handler)(req, { params: Promise.resolve(params) });
  const buf = Buffer.from(await res.arrayBuffer());
  let json: any = null;
  try {
    json = JSON.parse(buf.toString('utf8'));
  } catch {}
  return { status: res.status, headers: res.headers, body: buf, json };
}

let made = 0;
/** A stored copy of the first demo bridge (feet, surveyed top of girder at span 1 points 0, 10, 20 of G1 and G5). */
export async function demoBridge(engineer: TestUser, description: unknown = demoBridges[0]): Promise<string> {
  const { id } = await createBridge({ id: engineer.id, email: engineer.email, name: 'Test engineer', role: 'engineer' }, { name: `Field test ${++made}`, description });
  return String(id);
}

/** The engine's own row for a bracket, the independent reference the checks are compared against. */
export function engineRow(span: number, girder: string, point: number, description = demoBridges[0]): OffsetPoint {
  const row = computeOffsetTable(description).points.find((p) => p.span === span && p.girder === girder && p.point === point);
  if (!row) throw new Error('no such row in the engine table');
  return row;
}
