/**
 * The engine's side of the compute pool: runs inside a worker thread (lib/workers/compute-pool.ts).
 * Checks the description against the schema, computes the offset table and writes the answer as
 * UTF-8 JSON bytes (lib/workers/json-utf8.ts), so the server's main thread only passes bytes along. Never imports next/* or React.
 */
import { parentPort } from 'node:worker_threads';
import { jsonUtf8 } from './json-utf8';
import { computeOffsetTable, GeometryError, parseBridgeSchema } from '@/lib/geometry';
import { shortProblemBody } from '@/lib/api/problem-list';
import { descriptionSizeProblems, MAX_JSON_DEPTH, nestedDeeperThan } from '@/lib/limits/description-size';

/** One job: the request body's text and whether interior girders' rows are wanted. */
export type ComputeJob = { id: number; body: string; interior: boolean };

/** The answer: the offset table, or a status and an error body for the client. */
export type ComputeResult = { id: number; status: number; body: object };

const answer = (id: number, status: number, body: object): ComputeResult => ({ id, status, body });

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
    return answer(job.id, 200, out);
  } catch (err) {
    if (err instanceof GeometryError) return answer(job.id, 422, { error: err.message.slice(0, 2000) });
    throw err;
  }
}

/** What the worker posts back: the answer's UTF-8 bytes, whose buffer is moved to the main thread, not copied. */
export type ComputeReply = { id: number; status: number; bytes: Uint8Array<ArrayBuffer> };

const failed = (id: number): ComputeResult => answer(id, 500, { error: 'Something went wrong on the server. Try again; if it keeps happening, tell your administrator.' });

if (parentPort) {
  const port = parentPort;
  port.on('message', (job: ComputeJob) => {
    let result: ComputeResult;
    try {
      result = runComputeJob(job);
    } catch (err) {
      console.error('[chordline] compute worker failed:', err instanceof Error ? err.message : err);
      result = failed(job.id);
    }
    // Encoded here, so the main thread neither copies a large table's text nor encodes it.
    const bytes = jsonUtf8(result.body);
    const reply: ComputeReply = { id: result.id, status: result.status, bytes };
    port.postMessage(reply, [bytes.buffer]);
  });
}
