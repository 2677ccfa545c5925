/**
 * The printed field sheet (PDF) of a bridge with a deflection table carries, like the sheet page and the
 * CSV, the deflection still to come and the screed grade at every bracket, and says what they mean;
 * a bridge without one prints neither. Read back with pdf-parse (an independent PDF reader from the
 * registry, built on Mozilla's pdf.js); the expected numbers are the engine's rows (bridge-format.md,
 * "Definitions the engine computes": deflection at Pk, screed grade = top of deck + deflection) rounded
 * as the sheet page rounds them (lib/units).
 */
import { NextRequest } from 'next/server';
import { PDFParse } from 'pdf-parse';
import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable, type BridgeDescription } from '@/lib/geometry';
import { lengthText, stationText } from '@/lib/units';
import { DEFLECTION_DEFINITION } from '@/lib/services/field-sheet';
import * as sheetPdf from '@/app/api/bridges/[id]/field-sheet.pdf/route';
import { makeUsers, type TestUser } from './helpers';
import { demoBridge } from './field-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
beforeAll(async () => {
  people = await makeUsers();
});

type Handler = (req: NextRequest, ctx: { params: Promise<{ id: string }> }) => Promise<Response>;

async function sheetLines(id: string): Promise<{ lines: string[]; all: string }> {
  const req = new NextRequest(new URL(`/api/bridges/${id}/field-sheet.pdf`, 'http://localhost:3000'), { headers: { cookie: people.crew.cookie } });
  const res = await (sheetPdf.GET as unknown as Handler)(req, { params: Promise.resolve({ id }) });
  const bytes = new Uint8Array(await res.arrayBuffer());
  expect(res.status).toBe(200);
  const parser = new PDFParse({ data: bytes.slice() });
  const text = await parser.getText();
  await parser.destroy();
  return { lines: text.pages.flatMap((p) => p.text.split('\n').map((l) => l.trim())), all: text.text };
}

const squash = (s: string) => s.replace(/\s+/g, ' ').trim();
const num = (v: number) => lengthText(v, 'ft', false);

describe('field sheet PDF with deflections', () => {
  it('prints the deflection and screed grade after the form target at every bracket of the ramp demo bridge, with what they mean', async () => {
    const ramp = demoBridges[2];
    const id = await demoBridge(people.engineer, ramp);
    const table = computeOffsetTable(ramp);
    const pdf = await sheetLines(id);
    expect(pdf.all).toContain('Deflection');
    expect(pdf.all).toContain('Screed grade');
    expect(squash(pdf.all)).toContain(squash(DEFLECTION_DEFINITION));
    const brackets = table.points.filter((p) => p.side !== 'interior');
    expect(brackets.some((p) => p.deflection > 0)).toBe(true);
    for (const p of brackets) {
      // Row: point, station, widths, reading, rods, extra, form target, deflection, screed grade (blank columns print nothing).
      const row = pdf.lines.filter((l) => l.startsWith(`${p.point} ${stationText(p.station, 'ft')} `));
      expect(
        row.some((l) => l.endsWith(` ${num(p.form_target as number)} ${num(p.deflection)} ${num(p.screed_grade)}`)),
        `span ${p.span} ${p.girder} ${p.point}`,
      ).toBe(true);
    }
  });

  it('prints neither column nor definition for a bridge without deflections', async () => {
    const plain = demoBridges[0] as BridgeDescription;
    const id = await demoBridge(people.engineer, plain);
    const pdf = await sheetLines(id);
    expect(pdf.all).not.toContain('Screed grade');
    expect(squash(pdf.all)).not.toContain(squash(DEFLECTION_DEFINITION));
    const table = computeOffsetTable(plain);
    const p = table.points.find((q) => q.side !== 'interior' && q.span === 2 && q.point === 5)!;
    expect(pdf.lines.some((l) => l.startsWith(`${p.point} ${stationText(p.station, 'ft')} `) && l.endsWith(` ${num(p.form_target as number)}`))).toBe(true);
  });
});
