import { Worker } from 'node:worker_threads';
import { fileStore } from '@/lib/storage';
import { diskAreaDir } from '@/lib/storage/disk';
import { MAX_PHOTO_MEGAPIXELS, photoPixels } from './pixels';

/** Longest side of a thumbnail, pixels: sharp on a phone's 2× screen at the 160 px the lists show. */
export const THUMBNAIL_SIDE = 320;

/** Largest photo decoded for a thumbnail, megapixels: the upload limit; larger (older uploads) serve themselves. */
export const MAX_SOURCE_MEGAPIXELS = MAX_PHOTO_MEGAPIXELS;

// Runs in a worker thread so decoding a large photo never stalls the server's other requests. The
// worker is CommonJS code evaluated in place; `jimp` resolves from the working directory, which is the
// project folder for `npm start` (next start) and for the tests.
const WORKER_SOURCE = `
const { parentPort, workerData } = require('node:worker_threads');
const { Jimp } = require('jimp');
(async () => {
  const { bytes, side } = workerData;
  const image = await Jimp.fromBuffer(Buffer.from(bytes));
  const { width, height } = image.bitmap;
  const scale = Math.min(1, side / Math.max(width, height));
  if (scale < 1) image.resize({ w: Math.max(1, Math.round(width * scale)), h: Math.max(1, Math.round(height * scale)) });
  parentPort.postMessage({ ok: true, bytes: await image.getBuffer('image/jpeg', { quality: 75 }) });
})().catch((err) => parentPort.postMessage({ ok: false, error: String((err && err.message) || err) }));
`;

function decodeInWorker(bytes: Uint8Array): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(WORKER_SOURCE, { eval: true, workerData: { bytes, side: THUMBNAIL_SIDE }, resourceLimits: { maxOldGenerationSizeMb: 256 } });
    worker.once('message', (m: { ok: true; bytes: Uint8Array } | { ok: false; error: string }) => {
      if (m.ok) resolve(Buffer.from(m.bytes));
      else reject(new Error(m.error));
      void worker.terminate();
    });
    worker.once('error', reject);
    worker.once('exit', (code) => reject(new Error(`thumbnail worker stopped (${code})`)));
  });
}

// One decode at a time: a burst of uploads queues instead of holding several full-size photos in memory.
let queue: Promise<unknown> = Promise.resolve();

/**
 * A small JPEG of a JPEG or PNG photo (the pure-JavaScript decoders; WebP has none that runs on the
 * server without fetching WebAssembly, so WebP photos serve as their own thumbnail): turned upright by
 * its EXIF orientation, scaled so its longer side is at most {@link THUMBNAIL_SIDE} pixels (never
 * enlarged), quality 75. Decoded in a worker thread, one photo at a time.
 * @throws when the header cannot be read, the photo is over {@link MAX_SOURCE_MEGAPIXELS}, or the
 * bytes do not decode.
 */
export function makeThumbnail(bytes: Uint8Array): Promise<Buffer> {
  const size = photoPixels(bytes);
  if (!size) return Promise.reject(new Error('The photo header cannot be read'));
  if (size.width * size.height > MAX_SOURCE_MEGAPIXELS * 1e6) return Promise.reject(new Error('The photo is too large to decode for a thumbnail'));
  const run = queue.then(() => decodeInWorker(bytes));
  queue = run.catch(() => undefined);
  return run;
}

/** Folder of made thumbnails when files stay on disk (DATA_DIR/cache/thumbs). */
export function thumbsDir(): string {
  return diskAreaDir('thumbs');
}

const STORED = /^([a-f0-9]{32})\.(jpg|png|webp|pdf)$/;
const DECODABLE = new Set(['jpg', 'png']);

/** The thumbnail's name for a stored upload's name: the same 32 hex digits, always .jpg. */
function thumbName(storedName: string): string | null {
  const m = STORED.exec(storedName);
  return m ? `${m[1]}.jpg` : null;
}

/**
 * The thumbnail of a stored photo, made on first request and kept in the file store's thumbnail area
 * (DATA_DIR/cache/thumbs/<generated name>.jpg, or cache/thumbs/ in the bucket: a cache, left out of
 * backups, made again when missing). Returns null when the photo cannot be decoded (WebP, or damaged
 * bytes); the caller then serves the photo itself.
 */
export async function thumbnailOf(storedName: string, original: () => Promise<Buffer>): Promise<Buffer | null> {
  const m = STORED.exec(storedName);
  if (!m || m[2] === 'pdf') throw new Error('Not a stored photo name');
  if (!DECODABLE.has(m[2])) return null;
  const name = `${m[1]}.jpg`;
  const store = fileStore();
  const kept = await store.read('thumbs', name).catch(() => null);
  if (kept) return kept;
  let thumb: Buffer;
  try {
    thumb = await makeThumbnail(await original());
  } catch {
    return null;
  }
  // Keep it for next time. A cache that cannot be written costs only a decode next time.
  await store.put('thumbs', name, thumb, 'image/jpeg').catch(() => undefined);
  return thumb;
}

/** Removes a stored upload's thumbnail, if one was made. */
export async function removeThumbnail(storedName: string): Promise<void> {
  const name = thumbName(storedName);
  if (name) await fileStore().remove('thumbs', name);
}
