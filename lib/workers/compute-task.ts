/**
 * The engine's side of the compute pool: runs inside a worker thread (lib/workers/compute-pool.ts).
 * Checks the description against the schema, computes the offset table and writes the JSON answer
 * text, so the server's main thread only passes bytes along. Never imports next/* or React.
 */
import { parentPort } from 'node:worker_threads';
import { computeOffsetTable, GeometryError, parseBridgeSchema } from '@/lib/geometry';
import { shortProblemBody } from '@/lib/api/problem-list';
import { descriptionSizeProblems, MAX_JSON_DEPTH, nestedDeeperThan } from '@/lib/limits/description-size';

/** One job: the request body's text and whether interior girders' rows are wanted. */
export type ComputeJob = { id: number; body: string; interior: boolean };

/** The answer: the JSON text of the offset table, or a status and an error body for the client. */
export type ComputeResult = { id: number; status: number; json: string };

const answer = (id: number, status: number, body: unknown): ComputeResult => ({ id, status, json: JSON.stringify(body) });

/**
 * Runs one job to its answer; never throws for bad input. 400 malformed or too deeply nested JSON and
 * schema problems; 422 sizes no bridge reaches (before any other work, naming each limit) and geometry
 * that cannot be built; 200 the table. Error bodies list at most 20 problems and count the rest.
 */
export function runComputeJob(job: ComputeJob): ComputeResult {
  let input: unknown;
  try {
    input = JSON.parse(job.body);
  } catch {
    return answer(job.id, 400, { error: 'The request body is not valid JSON.' });
  }
  if (nestedDeeperThan(input)) return answer(job.id, 400, { error: `The request body nests deeper than ${MAX_JSON_DEPTH} levels; no bridge description does.` });
  const sizes = descriptionSizeProblems(input);
  if (sizes.length) return answer(job.id, 422, shortProblemBody(`This description is larger than any bridge: ${sizes[0].message}`, sizes));
  const parsed = parseBridgeSchema(input);
  if (!parsed.ok) return answer(job.id, 400, shortProblemBody(parsed.message.slice(0, 500), parsed.fields));
  try {
    const table = computeOffsetTable(parsed.bridge);
    const out = job.interior ? table : { ...table, points: table.points.filter((p) => p.side !== 'interior') };
    return { id: job.id, status: 200, json: JSON.stringify(out) };
  } catch (err) {
    if (err instanceof GeometryError) return answer(job.id, 422, { error: err.message.slice(0, 2000) });
    throw err;
  }
}

if (parentPort) {
  const port = parentPort;
  port.on('message', (job: ComputeJob) => {
    try {
      port.postMessage(runComputeJob(job));
    } catch (err) {
      console.error('[chordline] compute worker failed:', err instanceof Error ? err.message : err);
      port.postMessage({ id: job.id, status: 500, json: JSON.stringify({ error: 'Something went wrong on the server. Try again; if it keeps happening, tell your administrator.' }) });
    }
  });
}
