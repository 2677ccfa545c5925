/** Problems found at a field or row of the geometry editor, shown right beside it. */
export default function EditorMessages({ messages, id }: { messages: readonly string[]; id?: string }) {
  if (messages.length === 0) return null;
  return (
    <ul id={id} className="mt-1 space-y-0.5 text-sm text-fail-600" role="alert">
      {messages.map((m) => (
        <li key={m}>{m}</li>
      ))}
    </ul>
  );
}
