'use client';

import { useId } from 'react';
import EditorMessages from '@/components/editor/EditorMessages';
import type { OffsetDraft, Side } from '@/lib/editor/draft';

/**
 * An offset from the alignment as the crew reads it: a distance without sign and LT (left looking
 * up-station) or RT. Stored as a signed number, negative to the left.
 */
export default function EditorOffsetField({
  label,
  value,
  onChange,
  unit,
  messages = [],
  width = 'w-36',
}: {
  label: string;
  value: OffsetDraft;
  onChange: (value: OffsetDraft) => void;
  unit: string;
  messages?: readonly string[];
  width?: string;
}) {
  const id = useId();
  const bad = messages.length > 0;
  return (
    <div className={width}>
      <label htmlFor={id} className="block text-xs font-semibold text-concrete-600">
        {label}
      </label>
      <div className={`mt-1 flex items-stretch overflow-hidden rounded-md border bg-white shadow-sm focus-within:border-brand-500 ${bad ? 'border-fail-600' : 'border-concrete-300'}`}>
        <input
          id={id}
          value={value.magnitude}
          onChange={(e) => onChange({ ...value, magnitude: e.target.value })}
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          aria-invalid={bad || undefined}
          aria-describedby={bad ? `${id}-msg` : undefined}
          className="tabular w-full min-w-0 px-2 py-1.5 text-concrete-900 outline-none"
        />
        <span className="flex items-center border-l border-concrete-200 bg-concrete-50 px-1.5 text-xs text-concrete-600">{unit}</span>
        <select
          aria-label={`${label}: side`}
          value={value.side}
          onChange={(e) => onChange({ ...value, side: e.target.value as Side })}
          className="border-l border-concrete-200 bg-concrete-50 px-1 text-sm font-semibold text-concrete-800 outline-none"
        >
          <option value="LT">LT</option>
          <option value="RT">RT</option>
        </select>
      </div>
      <EditorMessages messages={messages} id={`${id}-msg`} />
    </div>
  );
}
