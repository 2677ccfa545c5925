/**
 * A small pool of worker threads that run the engine (lib/workers/compute-task.ts), so a heavy
 * computation never stops the server's main thread from answering other requests (health, pages,
 * other users' saves). Jobs queue when every worker is busy; a full queue answers 503 at once, and a
 * job that runs past its time limit has its worker replaced.
 *
 * Workers load the TypeScript task through tsx's require hook (a dependency), resolved from the
 * working directory: the project folder for `npm start`, the tests and the load benchmark.
 */
import os from 'node:os';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { ComputeJob, ComputeReply } from './compute-task';

/** Workers in the pool: COMPUTE_WORKERS, else one less than the cores (at least 1, at most 4). */
export function poolSize(): number {
  const configured = Number(process.env.COMPUTE_WORKERS);
  if (Number.isInteger(configured) && configured > 0) return Math.min(configured, 16);
  return Math.max(1, Math.min(4, os.availableParallelism() - 1));
}

/** Jobs allowed to wait for a worker before new ones are turned away (503). */
export const MAX_QUEUED = 64;
/** Longest one job may run before its worker is stopped and the client told (503). */
export const JOB_TIME_LIMIT_MS = 30_000;

const busyAnswer = (id: number, what: string): ComputeReply => ({
  id,
  status: 503,
  bytes: new TextEncoder().encode(JSON.stringify({ error: `The server is busy computing (${what}). Try again in a few seconds.` })),
});

type Pending = { job: ComputeJob; resolve: (r: ComputeReply) => void };
type Slot = { worker: Worker; current: Pending | null; timer: NodeJS.Timeout | null };

function workerSource(): string {
  const task = path.join(/*turbopackIgnore: true*/ process.cwd(), 'lib', 'workers', 'compute-task.ts');
  return `require('tsx/cjs/api').register(); require(${JSON.stringify(task)});`;
}

class ComputePool {
  private slots: Slot[] = [];
  private queue: Pending[] = [];

  constructor(private readonly size: number) {
    for (let i = 0; i < size; i++) this.slots.push(this.spawn());
  }

  private spawn(): Slot {
    const worker = new Worker(workerSource(), { eval: true, resourceLimits: { maxOldGenerationSizeMb: 768 } });
    worker.unref();
    const slot: Slot = { worker, current: null, timer: null };
    worker.on('message', (result: ComputeReply) => this.finish(slot, result));
    worker.on('error', (err) => console.error('[chordline] compute worker error:', err.message));
    worker.on('exit', () => this.replace(slot, 'a worker stopped'));
    return slot;
  }

  private finish(slot: Slot, result: ComputeReply) {
    if (slot.timer) clearTimeout(slot.timer);
    const done = slot.current;
    slot.current = null;
    slot.timer = null;
    done?.resolve(result);
    this.next();
  }

  /** A worker that stopped (crash, memory limit, time limit) is replaced; its job is answered 503. */
  private replace(slot: Slot, why: string) {
    const i = this.slots.indexOf(slot);
    if (i < 0) return;
    if (slot.timer) clearTimeout(slot.timer);
    slot.current?.resolve(busyAnswer(slot.current.job.id, why));
    slot.current = null;
    this.slots[i] = this.spawn();
    this.next();
  }

  private next() {
    for (const slot of this.slots) {
      if (slot.current || !this.queue.length) continue;
      const pending = this.queue.shift()!;
      slot.current = pending;
      slot.timer = setTimeout(() => {
        slot.worker.removeAllListeners('exit');
        void slot.worker.terminate();
        this.replace(slot, 'the computation ran too long');
      }, JOB_TIME_LIMIT_MS);
      slot.worker.postMessage(pending.job);
    }
  }

  run(job: ComputeJob): Promise<ComputeReply> {
    if (this.queue.length >= MAX_QUEUED) return Promise.resolve(busyAnswer(job.id, 'too many requests waiting'));
    return new Promise((resolve) => {
      this.queue.push({ job, resolve });
      this.next();
    });
  }

  /** Resolves when every worker has loaded the engine (answers one tiny job each). */
  async warm(): Promise<void> {
    await Promise.all(this.slots.map((_, i) => this.run({ id: -1 - i, body: 'null', interior: false })));
  }
}

let pool: ComputePool | null = null;
let nextId = 1;

function thePool(): ComputePool {
  pool ??= new ComputePool(poolSize());
  return pool;
}

/** Runs the engine on a request body's JSON text in the pool; the answer's status and UTF-8 JSON bytes. */
export function computeInPool(body: string, interior: boolean): Promise<ComputeReply> {
  return thePool().run({ id: nextId++, body, interior });
}

/** Starts the workers and waits until they can compute (tests and the server's first request). */
export function warmComputePool(): Promise<void> {
  return thePool().warm();
}

/** Bytes handed to the response at a time when an answer is large. */
const PIECE_BYTES = 64 * 1024;

/**
 * A large answer as a stream of views into the worker's bytes, one piece per turn of the event loop.
 * Handed the whole buffer, the response copied it and then wrote it to the socket within one turn,
 * which held every other request for 100-250 ms at the largest allowed table (27 MB, measured on a
 * 2-core machine); views are not copied, and other requests are answered between the pieces.
 */
function piecesOf(bytes: Uint8Array<ArrayBuffer>): Uint8Array<ArrayBuffer> | ReadableStream<Uint8Array<ArrayBuffer>> {
  if (bytes.byteLength <= PIECE_BYTES) return bytes;
  let at = 0;
  return new ReadableStream({
    async pull(controller) {
      if (at > 0) await new Promise((resolve) => setImmediate(resolve));
      controller.enqueue(bytes.subarray(at, at + PIECE_BYTES));
      at += PIECE_BYTES;
      if (at >= bytes.byteLength) controller.close();
    },
  });
}

/** The compute API's answer for a request body's JSON text: the offset table, or a short JSON error. */
export async function computeAnswer(body: string, interior: boolean): Promise<Response> {
  const result = await computeInPool(body, interior);
  return new Response(piecesOf(result.bytes), {
    status: result.status,
    headers: { 'Content-Type': 'application/json', 'Content-Length': String(result.bytes.byteLength) },
  });
}
