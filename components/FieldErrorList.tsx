/**
 * The API's field errors as a list, each under its dotted path (e.g. "description.girders.0.offsets"),
 * so that a long description's problems can be found in the JSON.
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
            <code className="font-mono text-concrete-900">{path === '_' ? 'request' : path}</code>
            <span className="text-concrete-800">: {messages.join(' ')}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}
