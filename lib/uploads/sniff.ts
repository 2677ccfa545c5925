/**
 * File type from the first bytes (magic numbers), never from the name or the declared type.
 * Signatures: JPEG FF D8 FF (ISO/IEC 10918-1 SOI marker + next marker); PNG 89 50 4E 47 0D 0A 1A 0A
 * (PNG spec §5.2); WebP "RIFF" size "WEBP" (RIFF container, WebP container spec); PDF "%PDF-"
 * (ISO 32000-1 §7.5.2).
 */
export type SniffedType = { contentType: 'image/jpeg' | 'image/png' | 'image/webp' | 'application/pdf'; ext: 'jpg' | 'png' | 'webp' | 'pdf'; image: boolean };

const startsWith = (b: Uint8Array, sig: number[], at = 0) => b.length >= at + sig.length && sig.every((v, i) => b[at + i] === v);
const ascii = (s: string) => [...s].map((c) => c.charCodeAt(0));

/** The type the bytes actually are, or null for anything that is not a JPEG, PNG, WebP or PDF. */
export function sniffType(bytes: Uint8Array): SniffedType | null {
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return { contentType: 'image/jpeg', ext: 'jpg', image: true };
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return { contentType: 'image/png', ext: 'png', image: true };
  if (startsWith(bytes, ascii('RIFF')) && startsWith(bytes, ascii('WEBP'), 8)) return { contentType: 'image/webp', ext: 'webp', image: true };
  if (startsWith(bytes, ascii('%PDF-'))) return { contentType: 'application/pdf', ext: 'pdf', image: false };
  return null;
}
