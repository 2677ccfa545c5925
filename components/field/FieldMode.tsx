'use client';

import { useCallback, useId, useMemo, useRef, useState } from 'react';
import useSWR from 'swr';
import { fetcher, type ApiError } from '@/lib/client/api-client';
import type { CheckRow } from '@/components/checks/check-types';
import type { OutboxUser } from '@/components/offline/outbox';
import FieldResult from '@/components/field/FieldResult';
import PhotoCaptureButton from '@/components/field/PhotoCaptureButton';
import SafetyCaution from '@/components/SafetyCaution';
import FieldHeader from './FieldHeader';
import FieldMeasureForm from './FieldMeasureForm';
import FieldPointPicker from './FieldPointPicker';
import FieldQueuePanel from './FieldQueuePanel';
import FieldTargetCard from './FieldTargetCard';
import KeepOnPhoneBar from './KeepOnPhoneBar';
import { bracketKey } from './field-verdicts';
import { bracketsHaveDeflections } from './has-deflections';
import type { FieldData } from './keep-for-field';
import { useBracketVerdicts } from './use-bracket-verdicts';
import { useFieldData } from './use-field-data';
import { useFieldQueue } from './use-field-queue';

type Props = FieldData & { canRecord: boolean; user: OutboxUser; renderedAt: string };

/**
 * Field mode: full screen on a phone, one bracket at a time. Pick span and girder, step point by point,
 * read the targets, type the measurement and see pass or fail at once. With the bridge kept on the
 * phone it opens without a connection; measurements and photos wait on the phone until the server has them.
 */
export default function FieldMode({ canRecord, user, renderedAt, ...server }: Props) {
  const id = useId();
  const { data, kept, online, fromPhone, keep, keeping } = useFieldData(server, user.id, renderedAt);
  const { bridge, units, groups, tolerances } = data;
  const [span, setSpan] = useState(groups[0].span);
  const [girder, setGirder] = useState(groups[0].girder);
  const [index, setIndex] = useState(0);
  const girders = groups.filter((g) => g.span === span);
  const group = girders.find((g) => g.girder === girder) ?? girders[0] ?? groups[0];
  const row = group.rows[Math.min(index, group.rows.length - 1)];
  const resultRef = useRef<HTMLDivElement>(null);
  const deflections = useMemo(() => bracketsHaveDeflections(groups), [groups]);

  const {
    data: checks,
    error,
    mutate,
  } = useSWR<CheckRow[], ApiError>(`/api/bridges/${bridge.id}/checks`, fetcher, {
    revalidateOnFocus: true,
    errorRetryInterval: 10000,
    fallbackData: fromPhone ? kept?.checks : undefined,
  });
  const onSaved = useCallback((check: CheckRow) => void mutate((list) => [check, ...(list ?? []).filter((c) => c.id !== check.id)], { revalidate: false }), [mutate]);
  const queue = useFieldQueue(bridge.id, user, bridge.revision, onSaved);

  const { states, current } = useBracketVerdicts({ checks, waiting: queue.items, groups, tolerances, revision: bridge.revision, online, span, group, row });

  const go = (to: number) => setIndex(Math.max(0, Math.min(group.rows.length - 1, to)));
  const pickSpan = (s: number) => {
    setSpan(s);
    setGirder((groups.find((x) => x.span === s && x.girder === girder) ?? groups.find((x) => x.span === s)!).girder);
    setIndex(0);
  };

  async function record(body: Parameters<typeof queue.enqueue>[0]) {
    await queue.enqueue(body);
    // Show the verdict at once, above the boxes, even with the keyboard open.
    (document.activeElement as HTMLElement | null)?.blur();
    requestAnimationFrame(() => resultRef.current?.scrollIntoView({ block: 'nearest', behavior: 'smooth' }));
  }

  return (
    <div className="fixed inset-0 z-40 flex flex-col bg-concrete-50 md:relative md:inset-auto md:z-auto md:min-h-[80vh] md:overflow-hidden md:rounded-lg md:border md:border-concrete-200">
      <FieldHeader bridge={bridge} online={online} kept={kept} fromPhone={fromPhone} waiting={queue.mine.length} checksFailed={Boolean(error) && !checks} />
      <KeepOnPhoneBar kept={kept} online={online} busy={keeping.busy} error={keeping.error} onKeep={() => void keep()} />

      <div className="flex-1 overflow-y-auto px-4 pb-4 pt-3">
        <FieldPointPicker
          groups={groups}
          span={span}
          group={group}
          index={index}
          states={states}
          onSpan={pickSpan}
          onGirder={(g) => {
            setGirder(g);
            setIndex(0);
          }}
          onPoint={go}
        />
        <FieldTargetCard headingId={`${id}-bracket`} row={row} lastPoint={group.rows[group.rows.length - 1].point} units={units} deflections={deflections} />

        <div ref={resultRef} className="scroll-mt-2">
          <FieldResult verdict={current} units={units} widthTolerance={tolerances.width} readingTolerance={tolerances.reading} currentRevision={bridge.revision} />
        </div>
        {canRecord && current && (current.checkId || current.clientKey) ? (
          <PhotoCaptureButton
            key={current.checkId ?? current.clientKey}
            bridgeId={bridge.id}
            user={user}
            target={{ checkId: current.checkId, checkKey: current.checkId ? null : current.clientKey, span, girder: group.girder, point: row.point }}
          />
        ) : null}

        {canRecord ? (
          <FieldMeasureForm key={bracketKey(span, group.girder, row.point)} formId={`${id}-form`} span={span} girder={group.girder} row={row} units={units} onRecord={(b) => void record(b)} />
        ) : (
          <p className="mt-4 rounded-md border border-concrete-300 bg-white p-3 text-sm text-concrete-700">Read only: your role can see the targets; inspectors record the checks.</p>
        )}

        <FieldQueuePanel mine={queue.mine} others={queue.others} refused={queue.refused} onSendNow={queue.retryNow} onDismiss={queue.dismissRefused} />
        {error && !checks ? <p className="mt-3 text-sm text-caution-700">Could not load earlier checks ({error.message}). New entries are still kept and sent.</p> : null}
        <SafetyCaution className="mt-6" />
      </div>

      <nav aria-label="Bracket" className="grid grid-cols-[1fr_1.4fr_1fr] gap-2 border-t border-concrete-200 bg-white px-3 py-3">
        <button type="button" className="btn-secondary h-14 text-lg" onClick={() => go(index - 1)} disabled={index === 0}>
          ◀ Prev
        </button>
        {canRecord ? (
          <button type="submit" form={`${id}-form`} className="btn-primary h-14 text-lg">
            Record
          </button>
        ) : (
          <span />
        )}
        <button type="button" className="btn-secondary h-14 text-lg" onClick={() => go(index + 1)} disabled={index >= group.rows.length - 1}>
          Next ▶
        </button>
      </nav>
    </div>
  );
}
