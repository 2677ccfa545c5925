/** Longest side of a photo kept on the phone (px): plenty to see a bracket, a fraction of a camera's bytes. */
export const PHOTO_MAX_SIDE = 1600;

/**
 * Makes a camera photo small on the phone before it is stored: decoded upright (EXIF orientation),
 * drawn on a canvas at most PHOTO_MAX_SIDE px on its longer side, saved as JPEG. A photo the browser
 * cannot decode is kept as it is when it is under the server's 10 MB limit.
 */
export async function resizePhoto(file: Blob, maxSide = PHOTO_MAX_SIDE): Promise<{ blob: Blob; width: number; height: number } | null> {
  let bitmap: ImageBitmap;
  try {
    bitmap = await createImageBitmap(file, { imageOrientation: 'from-image' });
  } catch {
    return file.size <= 10 * 1024 * 1024 ? { blob: file, width: 0, height: 0 } : null;
  }
  const scale = Math.min(1, maxSide / Math.max(bitmap.width, bitmap.height));
  const width = Math.max(1, Math.round(bitmap.width * scale));
  const height = Math.max(1, Math.round(bitmap.height * scale));
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = height;
  const ctx = canvas.getContext('2d');
  if (!ctx) {
    bitmap.close();
    return file.size <= 10 * 1024 * 1024 ? { blob: file, width: 0, height: 0 } : null;
  }
  ctx.drawImage(bitmap, 0, 0, width, height);
  bitmap.close();
  const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/jpeg', 0.85));
  return blob ? { blob, width, height } : null;
}
