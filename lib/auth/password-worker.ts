/**
 * bcrypt in a worker thread of its own. The pure-JavaScript bcrypt works in slices of up to 100 ms
 * on whichever thread calls it; on the server's main thread every sign-in attempt then held all other
 * requests for 70-100 ms at a time (measured with the event-loop delay during a burst of sign-ins).
 * Here the main thread only passes messages; attempts queue in the worker one after another.
 *
 * The worker is CommonJS evaluated in place; `bcryptjs` resolves from the working directory (the
 * project folder for `npm start`, the tests and the command-line tools), as the thumbnail worker's
 * `jimp` does. The worker holds the process open only while a job is waiting, so command-line tools
 * that hash a password still exit when done.
 */
import { Worker } from 'node:worker_threads';

const SOURCE = `
const { parentPort } = require('node:worker_threads');
const bcrypt = require('bcryptjs');
parentPort.on('message', (job) => {
  try {
    const result = job.op === 'hash' ? bcrypt.hashSync(job.password, job.cost) : bcrypt.compareSync(job.password, job.hash);
    parentPort.postMessage({ id: job.id, ok: true, result });
  } catch (err) {
    parentPort.postMessage({ id: job.id, ok: false, error: String((err && err.message) || err) });
  }
});
`;

type Job = { op: 'hash'; password: string; cost: number } | { op: 'compare'; password: string; hash: string };
type Reply = { id: number; ok: true; result: string | boolean } | { id: number; ok: false; error: string };
type Waiting = { resolve: (value: string | boolean) => void; reject: (err: Error) => void };

let worker: Worker | null = null;
const waiting = new Map<number, Waiting>();
let nextId = 1;

function theWorker(): Worker {
  if (worker) return worker;
  const w = new Worker(SOURCE, { eval: true });
  w.unref();
  w.on('message', (reply: Reply) => {
    const job = waiting.get(reply.id);
    waiting.delete(reply.id);
    if (waiting.size === 0) w.unref();
    if (!job) return;
    if (reply.ok) job.resolve(reply.result);
    else job.reject(new Error(reply.error));
  });
  // A worker that fails takes its waiting jobs with it; the next job starts a new one.
  const fail = (err: Error) => {
    if (worker === w) worker = null;
    for (const job of waiting.values()) job.reject(err);
    waiting.clear();
  };
  w.on('error', fail);
  w.on('exit', (code) => fail(new Error(`the password worker stopped (${code})`)));
  worker = w;
  return w;
}

function run(job: Job): Promise<string | boolean> {
  const w = theWorker();
  const id = nextId++;
  return new Promise((resolve, reject) => {
    waiting.set(id, { resolve, reject });
    w.ref();
    w.postMessage({ ...job, id });
  });
}

/**
 * A bcrypt hash of `password` at `cost` (log2 of the rounds, 4 to 15), made off the main thread.
 * @throws RangeError for any other cost: a larger one would keep the worker busy for hours.
 */
export async function bcryptHash(password: string, cost: number): Promise<string> {
  if (!Number.isInteger(cost) || cost < 4 || cost > 15) throw new RangeError(`bcrypt cost ${cost} is outside 4 to 15`);
  return String(await run({ op: 'hash', password, cost }));
}

/** Whether `password` matches the bcrypt `hash`, compared off the main thread. */
export async function bcryptCompare(password: string, hash: string): Promise<boolean> {
  return (await run({ op: 'compare', password, hash })) === true;
}
