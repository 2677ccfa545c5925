/**
 * The one shape every API answer that lists problems takes: at most {@link MAX_LISTED_PROBLEMS}
 * messages (each at most 300 characters, keys at most 200), with `problem_count` saying how many there
 * were in all, so a hostile input (60,000 alignments, a 10,000-line survey file, a thousand bad
 * girders) cannot make the answer large. Pure: no next/*, so the compute worker uses it too.
 */

/** At most this many problems are listed in an answer; the rest are counted. */
export const MAX_LISTED_PROBLEMS = 20;

/** Longest message and longest field key kept in a listed problem, characters. */
const MAX_MESSAGE_CHARS = 300;
const MAX_KEY_CHARS = 200;

/** One problem located by its dotted path ("girders.3.name"). */
export type LocatedProblem = { path: string; message: string };

/** An error answer's body with its problems listed short. */
export type ProblemBody = { error: string; fields: Record<string, string[]>; problem_count: number };

/**
 * The first {@link MAX_LISTED_PROBLEMS} problems keyed by path, how many there were in all, and the
 * error message with "(first 20 of N problems listed)" added when some were left out.
 */
export function shortProblemBody(error: string, problems: LocatedProblem[] | Record<string, readonly string[]>): ProblemBody {
  const entries: [string, readonly string[]][] = Array.isArray(problems) ? problems.map((p) => [p.path, [p.message]] as [string, string[]]) : Object.entries(problems);
  const total = entries.reduce((n, [, v]) => n + v.length, 0);
  const fields: Record<string, string[]> = {};
  let listed = 0;
  for (const [path, messages] of entries) {
    if (listed >= MAX_LISTED_PROBLEMS) break;
    const take = messages.slice(0, MAX_LISTED_PROBLEMS - listed).map((m) => m.slice(0, MAX_MESSAGE_CHARS));
    const key = path.slice(0, MAX_KEY_CHARS);
    fields[key] = [...(fields[key] ?? []), ...take];
    listed += take.length;
  }
  const more = total - listed;
  return { error: more > 0 ? `${error} (first ${listed} of ${total} problems listed)` : error, fields, problem_count: total };
}

/**
 * A list of problems inside a successful answer (an alignment skipped on import, say): the first
 * {@link MAX_LISTED_PROBLEMS} and the count of all.
 */
export function shortList(problems: readonly string[]): { problems: string[]; problem_count: number } {
  return { problems: problems.slice(0, MAX_LISTED_PROBLEMS).map((m) => m.slice(0, MAX_MESSAGE_CHARS)), problem_count: problems.length };
}
