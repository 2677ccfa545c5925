'use client';

import { useMemo } from 'react';
import type { BracketGroup, BracketRow, CheckRow } from '@/components/checks/check-types';
import type { OutboxItem } from '@/components/offline/offline-db';
import type { PointState } from './FieldPointStrip';
import type { Verdict } from './FieldResult';
import { bracketKey, localVerdict, serverVerdict } from './field-verdicts';

type Args = {
  checks: CheckRow[] | undefined;
  waiting: OutboxItem[];
  groups: BracketGroup[];
  tolerances: { width: number; reading: number };
  revision: number;
  online: boolean;
  span: number;
  group: BracketGroup;
  row: BracketRow;
};

/**
 * The latest word on every bracket of the girder on screen (a waiting measurement, newest, wins over the
 * server's latest check), as chip states for the point strip and the verdict of the current bracket.
 */
export function useBracketVerdicts({ checks, waiting, groups, tolerances, revision, online, span, group, row }: Args): { states: PointState[]; current: Verdict | null } {
  const latest = useMemo(() => {
    const map = new Map<string, Verdict>();
    for (const c of [...(checks ?? [])].reverse()) map.set(bracketKey(c.span, c.girder, c.point), serverVerdict(c));
    for (const p of waiting) {
      if (p.kind !== 'check') continue;
      const r = groups.find((g) => g.span === p.body.span && g.girder === p.body.girder)?.rows.find((x) => x.point === p.body.point);
      if (r) map.set(bracketKey(p.body.span, p.body.girder, p.body.point), localVerdict(p, { width: r.edge_width, reading: r.reading }, tolerances, online));
    }
    return map;
  }, [checks, waiting, groups, tolerances, online]);

  const states: PointState[] = group.rows.map((r) => {
    const v = latest.get(bracketKey(span, group.girder, r.point));
    if (!v) return 'none';
    if (v.state !== 'saved') return 'pending';
    if (v.revision !== null && v.revision !== revision) return 'old';
    return v.pass ? 'pass' : 'fail';
  });
  return { states, current: latest.get(bracketKey(span, group.girder, row.point)) ?? null };
}
