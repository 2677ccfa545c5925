import type { CheckRow } from '@/components/checks/check-types';
import type { OutboxCheck } from '@/components/offline/offline-db';
import type { Verdict } from '@/components/field/FieldResult';
import { bracketVerdict } from '@/lib/field/verdict';

/** One bracket's identity as a map key. */
export const bracketKey = (span: number, girder: string, point: number) => `${span}|${girder}|${point}`;

/** The verdict the server would give, worked out at once on the phone (the server's answer replaces it). */
export function localVerdict(p: OutboxCheck, targets: { width: number; reading: number | null }, tol: { width: number; reading: number }, online: boolean): Verdict {
  const judged = bracketVerdict(
    { measuredWidth: p.body.measured_edge_width, computedWidth: targets.width, measuredReading: p.body.measured_drop_from_girder_top, computedReading: targets.reading },
    tol,
  );
  return {
    ...judged,
    measuredWidth: p.body.measured_edge_width,
    measuredReading: p.body.measured_drop_from_girder_top,
    state: p.lastError || !online ? 'waiting' : 'sending',
    note: p.lastError ?? (online ? null : 'No connection: kept on this phone, sent when the connection returns.'),
    when: p.takenAt,
    checkId: null,
    clientKey: p.key,
    revision: p.revision,
  };
}

/** The server's word on a bracket. */
export function serverVerdict(c: CheckRow): Verdict {
  return {
    widthDeviation: c.width_deviation,
    readingDeviation: c.reading_deviation,
    widthPass: c.width_pass,
    readingPass: c.reading_pass,
    pass: c.pass,
    measuredWidth: c.measured_edge_width,
    measuredReading: c.measured_drop_from_girder_top,
    state: 'saved',
    note: null,
    when: c.created_at,
    checkId: c.id,
    clientKey: null,
    revision: c.revision,
  };
}
