/**
 * Characters a name may never hold: C0 controls (NUL, BEL, tab, CR, LF, ...), DEL, C1 controls, and
 * the bidirectional controls that can make text read backwards (U+061C, U+200E/F, U+202A–U+202E,
 * U+2066–U+2069). Shown in lists, sheets, CSV, PDF and DXF they hide or reorder what a person reads.
 * Pure: the engine's schema refuses them in a description's names; lib/text/clean.ts strips them
 * from names, captions and file names a person types elsewhere.
 */
export const UNSAFE_TEXT_CHARS = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/;

/** The same characters, every run of them (for replacing). */
export const UNSAFE_TEXT_RUNS = new RegExp(`${UNSAFE_TEXT_CHARS.source}+`, 'g');

/** True when the text holds a control or bidirectional-control character. */
export function hasUnsafeChars(text: string): boolean {
  return UNSAFE_TEXT_CHARS.test(text);
}
