/**
 * Pixel size of a JPEG or PNG read from its header alone, so a photo can be judged before anything
 * decodes it (a few kilobytes can claim gigabytes of pixels).
 * PNG: IHDR is the first chunk, width and height as 4-byte big-endian at bytes 16 and 20 (PNG spec §11.2.2).
 * JPEG: the first start-of-frame segment (SOF0–SOF15 except DHT C4, JPG C8 and DAC CC) holds the
 * height and width as 2-byte big-endian at 5 and 7 bytes past its marker (ISO/IEC 10918-1 B.2.2).
 * @returns width and height in pixels, or null when the header cannot be read.
 */
export function photoPixels(bytes: Uint8Array): { width: number; height: number } | null {
  const u16 = (at: number) => (bytes[at] << 8) | bytes[at + 1];
  const u32 = (at: number) => ((bytes[at] << 24) >>> 0) + (bytes[at + 1] << 16) + (bytes[at + 2] << 8) + bytes[at + 3];
  if (bytes.length >= 24 && bytes[0] === 0x89 && bytes[1] === 0x50 && String.fromCharCode(...bytes.subarray(12, 16)) === 'IHDR') {
    return { width: u32(16), height: u32(20) };
  }
  if (bytes.length < 4 || bytes[0] !== 0xff || bytes[1] !== 0xd8) return null;
  let at = 2;
  while (at + 9 < bytes.length) {
    if (bytes[at] !== 0xff) return null;
    const marker = bytes[at + 1];
    if (marker === 0xff) {
      at += 1; // fill byte
      continue;
    }
    if (marker === 0xd8 || marker === 0x01 || (marker >= 0xd0 && marker <= 0xd7)) {
      at += 2; // markers without a length
      continue;
    }
    if (marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc) {
      return { width: u16(at + 7), height: u16(at + 5) };
    }
    if (marker === 0xd9 || marker === 0xda) return null; // end of image or scan data before any frame header
    at += 2 + u16(at + 2);
  }
  return null;
}

/** Most pixels a photo may have, megapixels: phone cameras give 12 to 50; more is not a site photo. */
export const MAX_PHOTO_MEGAPIXELS = 50;

/**
 * Why a JPEG or PNG photo is refused by its header's pixel count, or null when it is within
 * {@link MAX_PHOTO_MEGAPIXELS}, its header cannot be read, or it is another kind of file. Read from the header alone, before
 * anything decodes the image: a small file can claim gigabytes of pixels.
 */
export function photoPixelProblem(bytes: Uint8Array, contentType: string): string | null {
  if (contentType !== 'image/jpeg' && contentType !== 'image/png') return null;
  const size = photoPixels(bytes);
  // A header that cannot be read is never decoded either (the thumbnail maker refuses it too); the
  // file is kept and served as itself, as a damaged photo from the field still shows what it can.
  if (!size) return null;
  const megapixels = (size.width * size.height) / 1e6;
  if (megapixels <= MAX_PHOTO_MEGAPIXELS) return null;
  return `The photo is ${size.width} × ${size.height} pixels (${megapixels.toFixed(1)} megapixels); the limit is ${MAX_PHOTO_MEGAPIXELS} megapixels. Send a smaller photo.`;
}
