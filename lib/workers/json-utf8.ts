/**
 * UTF-8 JSON bytes of an answer, written in slices. Encoding one large JSON string (an offset table is
 * 150 KB at 40th points, tens of MB at the largest allowed size) costs three times what writing it did,
 * measured in this project's worker (see DEVELOPERS.md, "Work off the main thread"); the same text encoded in slices
 * of 64 rows costs a fraction. The bytes are exactly those of `JSON.stringify(value)` encoded as UTF-8.
 */

/** Items of a long array written per slice. */
const SLICE = 64;

const encoder = new TextEncoder();

/** The JSON text of an array, as pieces that join to `JSON.stringify(items)`. */
function arrayPieces(items: readonly unknown[], out: Uint8Array[]): void {
  if (items.length <= SLICE) {
    out.push(encoder.encode(JSON.stringify(items)));
    return;
  }
  for (let i = 0; i < items.length; i += SLICE) {
    const text = JSON.stringify(items.slice(i, i + SLICE));
    const open = i === 0 ? '[' : ',';
    const close = i + SLICE >= items.length ? ']' : '';
    out.push(encoder.encode(open + text.slice(1, -1) + close));
  }
}

/**
 * The UTF-8 bytes of `JSON.stringify(value)` for a plain object whose values are JSON data, with each
 * top-level array written in slices. Keys keep their order; keys whose value is undefined are left out,
 * as JSON.stringify does. The result owns its buffer, so it can be moved to another thread.
 */
export function jsonUtf8(value: object): Uint8Array<ArrayBuffer> {
  const pieces: Uint8Array[] = [];
  let first = true;
  for (const [key, v] of Object.entries(value)) {
    if (v === undefined || typeof v === 'function' || typeof v === 'symbol') continue;
    pieces.push(encoder.encode(`${first ? '{' : ','}${JSON.stringify(key)}:`));
    first = false;
    if (Array.isArray(v)) arrayPieces(v, pieces);
    else pieces.push(encoder.encode(JSON.stringify(v)));
  }
  pieces.push(encoder.encode(first ? '{}' : '}'));
  let length = 0;
  for (const p of pieces) length += p.byteLength;
  const bytes = new Uint8Array(length);
  let at = 0;
  for (const p of pieces) {
    bytes.set(p, at);
    at += p.byteLength;
  }
  return bytes;
}
