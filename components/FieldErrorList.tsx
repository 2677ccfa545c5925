import { fieldLabel } from '@/lib/services/revision-field-labels';

/** A person's name for an API field path: "description.alignment.elements.1.radius" → "Alignment element 2 · radius". */
function labelOf(path: string): string {
  if (path === '_') return 'The request';
  if (path === 'name') return 'Bridge name';
  return fieldLabel(path.replace(/^description\./, ''), null);
}

/**
 * The API's field errors as a list: each under a plain name, with its dotted path in the JSON beside it
 * (e.g. "description.girders.0.offsets", counted from 0) so a long description's problems can be found.
 */
export default function FieldErrorList({ fields, title = 'Fix these fields' }: { fields: Record<string, string[]>; title?: string }) {
  const entries = Object.entries(fields);
  if (entries.length === 0) return null;
  return (
    <div role="alert" className="rounded-md border border-fail-600 bg-fail-100 p-4 text-sm">
      <h2 className="font-bold text-fail-600">{title}</h2>
      <ul className="mt-2 space-y-1">
        {entries.map(([path, messages]) => (
          <li key={path}>
            <strong className="text-concrete-900">{labelOf(path)}</strong>
            {path !== '_' ? <code className="ml-1 font-mono text-xs text-concrete-600">({path})</code> : null}
            <span className="text-concrete-800">: {messages.join(' ')}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}
