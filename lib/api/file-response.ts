/** A file to download: its name, MIME type and bytes (or text). */
export type DownloadFile = { filename: string; contentType: string; body: Buffer | string };

/**
 * The HTTP answer for a generated file: an attachment under its own name, never cached (it holds a
 * signed-in user's data), its type never sniffed.
 */
export function fileResponse(file: DownloadFile): Response {
  const body = typeof file.body === 'string' ? file.body : new Uint8Array(file.body);
  return new Response(body, {
    headers: {
      'Content-Type': file.contentType,
      'Content-Disposition': `attachment; filename="${file.filename.replace(/["\\\r\n]/g, '')}"`,
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
    },
  });
}
