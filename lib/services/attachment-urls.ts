/**
 * Where the browser fetches an attachment and, for a photo, its thumbnail
 * (GET /api/attachments/:id, signed-in users only).
 */
export function attachmentUrls(id: number, contentType: string): { url: string; thumbnail_url: string | null } {
  const url = `/api/attachments/${id}`;
  return { url, thumbnail_url: contentType.startsWith('image/') ? `${url}?size=thumb` : null };
}
