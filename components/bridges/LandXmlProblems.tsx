/** Alignments of a LandXML file that could not be imported, each with every problem found (with its station). */
export default function LandXmlProblems({ groups, tone }: { groups: { name: string; problems: string[]; problem_count?: number }[]; tone: 'fail' | 'caution' }) {
  if (groups.length === 0) return null;
  const colours = tone === 'fail' ? 'border-fail-600 bg-fail-100 text-fail-600' : 'border-caution-500 bg-caution-100 text-caution-700';
  return (
    <div className={`space-y-2 rounded-md border p-3 text-sm ${colours}`} data-testid="landxml-problems">
      {groups.map((g, i) => (
        <div key={`${g.name}-${i}`}>
          <p className="font-semibold">
            {tone === 'caution' ? 'Not importable: alignment' : 'Alignment'} “{g.name}” ({countText(g.problems.length, g.problem_count ?? g.problems.length)})
          </p>
          <ul className="mt-0.5 list-disc pl-5">
            {g.problems.map((p, j) => (
              <li key={j}>{p}</li>
            ))}
          </ul>
        </div>
      ))}
    </div>
  );
}

/** "3 problems", or "first 20 of 57 problems" when the server listed only the first ones. */
function countText(listed: number, total: number): string {
  if (total > listed) return `first ${listed} of ${total} problems`;
  return `${total} ${total === 1 ? 'problem' : 'problems'}`;
}

/** The per-alignment lists of a 422 answer's fields (`alignments.<i>.name`, `alignments.<i>.problems`). */
export function problemGroupsOf(fields: Record<string, string[]> | undefined): { name: string; problems: string[] }[] {
  const out: { name: string; problems: string[] }[] = [];
  for (let i = 0; fields && fields[`alignments.${i}.name`]; i++) out.push({ name: fields[`alignments.${i}.name`][0], problems: fields[`alignments.${i}.problems`] ?? [] });
  return out;
}
