'use client';

import EditorMessages from '@/components/editor/EditorMessages';

/**
 * One row of a list in the geometry editor (an element, a PVI, a bent, a girder…): its fields, the
 * buttons that move it up or down or remove it, and the problems that concern the row as a whole.
 */
export default function EditorRow({
  title,
  index,
  count,
  minRows,
  onMove,
  onRemove,
  messages = [],
  children,
}: {
  title: string;
  index: number;
  count: number;
  minRows: number;
  onMove: (to: number) => void;
  onRemove: () => void;
  messages?: readonly string[];
  children: React.ReactNode;
}) {
  const bad = messages.length > 0;
  return (
    <li className={`rounded-md border p-3 ${bad ? 'border-fail-600 bg-fail-100/40' : 'border-concrete-200 bg-concrete-50/60'}`}>
      <div className="flex items-start justify-between gap-2">
        <h3 className="text-sm font-bold text-concrete-800">{title}</h3>
        <div className="flex shrink-0 gap-1">
          <button
            type="button"
            className="rounded border border-concrete-300 bg-white px-2 py-0.5 text-sm text-concrete-700 hover:bg-concrete-100 disabled:opacity-40"
            onClick={() => onMove(index - 1)}
            disabled={index === 0}
            aria-label={`Move ${title} up`}
            title="Move up"
          >
            ↑
          </button>
          <button
            type="button"
            className="rounded border border-concrete-300 bg-white px-2 py-0.5 text-sm text-concrete-700 hover:bg-concrete-100 disabled:opacity-40"
            onClick={() => onMove(index + 1)}
            disabled={index === count - 1}
            aria-label={`Move ${title} down`}
            title="Move down"
          >
            ↓
          </button>
          <button
            type="button"
            className="rounded border border-concrete-300 bg-white px-2 py-0.5 text-sm text-fail-600 hover:bg-fail-100 disabled:opacity-40"
            onClick={onRemove}
            disabled={count <= minRows}
            aria-label={`Remove ${title}`}
            title={count <= minRows ? `At least ${minRows} needed` : 'Remove'}
          >
            ✕
          </button>
        </div>
      </div>
      <div className="mt-2 flex flex-wrap items-start gap-x-3 gap-y-2">{children}</div>
      <EditorMessages messages={messages} />
    </li>
  );
}
