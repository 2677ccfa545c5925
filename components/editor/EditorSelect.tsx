'use client';

import { useId } from 'react';

/** A labelled choice in the geometry editor, the same height as the text fields beside it. */
export default function EditorSelect<T extends string>({
  label,
  value,
  onChange,
  options,
  width = 'w-28',
}: {
  label: string;
  value: T;
  onChange: (value: T) => void;
  options: readonly { value: T; label: string }[];
  width?: string;
}) {
  const id = useId();
  return (
    <div className={width}>
      <label htmlFor={id} className="block text-xs font-semibold text-concrete-600">
        {label}
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value as T)}
        className="mt-1 block h-[38px] w-full rounded-md border border-concrete-300 bg-white px-2 text-concrete-900 shadow-sm focus:border-brand-500"
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}
