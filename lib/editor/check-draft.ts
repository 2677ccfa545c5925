/**
 * Checks a draft the way the server will: the fields it could not read, then the shared zod schema
 * (bridgeDescriptionSchema), then the engine's geometric checks while computing the offset table
 * (computeOffsetTable runs validateGeometry's checks and throws GeometryError with located issues).
 * Runs in the browser on every change; the engine is pure TypeScript.
 */
import { bridgeDescriptionSchema, computeOffsetTable, GeometryError, type BridgeDescription, type GeometryIssue, type OffsetTable } from '@/lib/geometry';
import { toDescription, type Draft } from './draft';

export interface DraftCheck {
  /** The description as the draft stands (may be invalid). */
  description: Record<string, unknown>;
  /** The description when it passes the schema (the plan sketch can draw it), else null. */
  bridge: BridgeDescription | null;
  /** Messages by dotted path: unreadable fields, schema errors and geometric issues. */
  messages: Record<string, string[]>;
  /** The offset table when everything passes, else null. */
  table: OffsetTable | null;
  /** Number of messages in all. */
  problemCount: number;
  /** The engine's issues (with span, girder and point where they apply). */
  issues: GeometryIssue[];
}

function add(messages: Record<string, string[]>, path: string, message: string) {
  const list = (messages[path] ??= []);
  if (!list.includes(message)) list.push(message);
}

export function checkDraft(draft: Draft): DraftCheck {
  const { description, errors } = toDescription(draft);
  const messages: Record<string, string[]> = {};
  for (const [path, list] of Object.entries(errors)) for (const m of list) add(messages, path, m);
  let bridge: BridgeDescription | null = null;
  let table: OffsetTable | null = null;
  let issues: GeometryIssue[] = [];
  const parsed = bridgeDescriptionSchema.safeParse(description);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const path = issue.path.length ? issue.path.map(String).join('.') : '_';
      // A field the editor could not read already says what to type; the schema's "required" adds nothing.
      if (errors[path]) continue;
      add(messages, path, issue.message);
    }
  } else if (Object.keys(errors).length === 0) {
    bridge = parsed.data;
    try {
      table = computeOffsetTable(parsed.data);
    } catch (err) {
      if (!(err instanceof GeometryError)) throw err;
      issues = err.issues;
      for (const issue of err.issues) add(messages, issue.path || '_', issue.message);
    }
  }
  const problemCount = Object.values(messages).reduce((n, l) => n + l.length, 0);
  return { description, bridge, messages, table, problemCount, issues };
}

/** Messages at exactly this path. */
export function messagesAt(check: DraftCheck, path: string): string[] {
  return check.messages[path] ?? [];
}

/** Messages under `prefix` (the prefix itself or deeper) that are not at one of the `shown` paths. */
export function messagesUnder(check: DraftCheck, prefix: string, shown: readonly string[] = []): string[] {
  const out: string[] = [];
  for (const [path, list] of Object.entries(check.messages)) {
    if ((path === prefix || path.startsWith(`${prefix}.`)) && !shown.includes(path)) out.push(...list);
  }
  return out;
}
