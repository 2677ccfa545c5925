import { UNSAFE_TEXT_RUNS } from './unsafe-chars';

/**
 * Text a person typed, made safe to show and store as a name, caption or file name: control
 * characters (C0 including NUL, BEL, CR and LF; DEL; C1) and the bidirectional controls that can make
 * text read backwards (U+061C, U+200E/F, U+202A–U+202E, U+2066–U+2069) are removed, runs of
 * whitespace become one space, and the ends are trimmed. Unicode NFC so equal names compare equal.
 */
export function cleanName(text: string): string {
  return text.normalize('NFC').replace(UNSAFE_TEXT_RUNS, ' ').replace(/\s+/g, ' ').trim();
}

/** Multi-line text (notes, captions): the same, but line breaks are kept as "\n". */
export function cleanText(text: string): string {
  return text
    .normalize('NFC')
    .replace(/\r\n?/g, '\n')
    .split('\n')
    .map((line) =>
      line
        .replace(UNSAFE_TEXT_RUNS, ' ')
        .replace(/[ \t]+/g, ' ')
        .trimEnd(),
    )
    .join('\n')
    .trim();
}
