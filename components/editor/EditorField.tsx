'use client';

import { useId } from 'react';
import EditorMessages from '@/components/editor/EditorMessages';

/**
 * One text field of the geometry editor with its label, its unit after the value, and the problems
 * found at it underneath. Numbers are typed as text (stations as 12+34.56 or a plain number).
 */
export default function EditorField({
  label,
  value,
  onChange,
  unit,
  messages = [],
  width = 'w-28',
  placeholder,
  inputMode = 'decimal',
  name,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  unit?: string;
  messages?: readonly string[];
  width?: string;
  placeholder?: string;
  inputMode?: 'decimal' | 'text' | 'numeric';
  name?: string;
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
          name={name}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          inputMode={inputMode}
          placeholder={placeholder}
          autoComplete="off"
          spellCheck={false}
          aria-invalid={bad || undefined}
          aria-describedby={bad ? `${id}-msg` : undefined}
          className="tabular w-full min-w-0 px-2 py-1.5 text-concrete-900 outline-none"
        />
        {unit ? <span className="flex items-center border-l border-concrete-200 bg-concrete-50 px-2 text-xs text-concrete-600">{unit}</span> : null}
      </div>
      <EditorMessages messages={messages} id={`${id}-msg`} />
    </div>
  );
}
