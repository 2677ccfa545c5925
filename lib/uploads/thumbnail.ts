import fs from 'node:fs/promises';
import path from 'node:path';
import { Jimp } from 'jimp';
import { dataDir } from '@/lib/config';

/** Longest side of a thumbnail, pixels: sharp on a phone's 2× screen at the 160 px the lists show. */
export const THUMBNAIL_SIDE = 320;

/**
 * A small JPEG of a JPEG or PNG photo (the pure-JavaScript decoders; WebP has none that runs on the
 * server without fetching WebAssembly, so WebP photos serve as their own thumbnail): turned upright by its EXIF orientation, scaled so its longer side is at
 * most {@link THUMBNAIL_SIDE} pixels (never enlarged), quality 75.
 * @throws when the bytes cannot be decoded as an image.
 */
export async function makeThumbnail(bytes: Uint8Array): Promise<Buffer> {
  const image = await Jimp.fromBuffer(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
  const { width, height } = image.bitmap;
  const scale = Math.min(1, THUMBNAIL_SIDE / Math.max(width, height));
  if (scale < 1) image.resize({ w: Math.max(1, Math.round(width * scale)), h: Math.max(1, Math.round(height * scale)) });
  return image.getBuffer('image/jpeg', { quality: 75 });
}

/** Folder of made thumbnails. */
export function thumbsDir(): string {
  return path.join(dataDir(), 'cache', 'thumbs');
}

const STORED = /^([a-f0-9]{32})\.(jpg|png|webp)$/;
const DECODABLE = new Set(['jpg', 'png']);

/**
 * The thumbnail of a stored photo, made on first request and kept beside the uploads
 * (DATA_DIR/cache/thumbs/<generated name>.jpg: a cache, left out of backups, made again when missing). Returns null when the photo cannot be decoded
 * (WebP, or damaged bytes); the caller then serves the photo itself.
 */
export async function thumbnailOf(storedName: string, original: () => Promise<Buffer>): Promise<Buffer | null> {
  const m = STORED.exec(storedName);
  if (!m) throw new Error('Not a stored photo name');
  if (!DECODABLE.has(m[2])) return null;
  const dir = thumbsDir();
  const file = path.join(dir, `${m[1]}.jpg`);
  try {
    return await fs.readFile(file);
  } catch {
    // Not made yet.
  }
  let thumb: Buffer;
  try {
    thumb = await makeThumbnail(await original());
  } catch {
    return null;
  }
  await fs.mkdir(dir, { recursive: true });
  // Write to a temporary name and rename, so a concurrent reader never sees half a file.
  const tmp = `${file}.${process.pid}.${Date.now()}.tmp`;
  await fs.writeFile(tmp, thumb);
  await fs.rename(tmp, file);
  return thumb;
}

/** Removes the thumbnail of a stored upload, if one was made. */
export async function removeThumbnail(storedName: string): Promise<void> {
  const m = STORED.exec(storedName);
  if (m) await fs.rm(path.join(thumbsDir(), `${m[1]}.jpg`), { force: true });
}
