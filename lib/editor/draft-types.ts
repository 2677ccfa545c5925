/** Small types the editor's draft modules share. */
export type Side = 'LT' | 'RT';

/** An offset as typed: a distance without sign, and LT (left, negative) or RT (right, positive). */
export interface OffsetDraft {
  magnitude: string;
  side: Side;
}
