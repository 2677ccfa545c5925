import EditorMessages from '@/components/editor/EditorMessages';

/** A card of the geometry editor: a heading, a line on what it holds, its rows and an add button. */
export default function EditorSection({
  id,
  title,
  intro,
  messages = [],
  addLabel,
  onAdd,
  children,
}: {
  id: string;
  title: string;
  intro?: React.ReactNode;
  messages?: readonly string[];
  addLabel?: string;
  onAdd?: () => void;
  children: React.ReactNode;
}) {
  return (
    <section id={id} aria-labelledby={`${id}-title`} className="card scroll-mt-4 p-4">
      <h2 id={`${id}-title`} className="text-lg font-bold text-concrete-900">
        {title}
      </h2>
      {intro ? <p className="mt-0.5 text-sm text-concrete-600">{intro}</p> : null}
      <EditorMessages messages={messages} />
      <div className="mt-3">{children}</div>
      {addLabel && onAdd ? (
        <button type="button" className="btn-secondary mt-3" onClick={onAdd}>
          + {addLabel}
        </button>
      ) : null}
    </section>
  );
}
