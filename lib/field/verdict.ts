/**
 * The field verdict: whether a measured edge width or level-bar reading is within tolerance of the
 * table, and the words that tell the crew what to do. The server records it (lib/services/checks.ts) and
 * field mode shows it at once on the phone before the server answers; both call these functions.
 */
import { atMost, deviationText, toleranceText, type MeasureKind, type Units } from '@/lib/units';

/** Deviation and verdict of one measured value. */
export type Judged = { deviation: number; pass: boolean };

/**
 * Deviation and verdict of one measured value. `deviation` = measured − computed (bridge units, positive
 * when the measurement is larger); passes when |deviation| ≤ tolerance (allowing rounding noise).
 */
export function judge(measured: number, computed: number, tolerance: number): Judged {
  const deviation = measured - computed;
  return { deviation, pass: atMost(Math.abs(deviation), tolerance) };
}

/** What was measured at one bracket (either may be missing) and what the table says there. */
export type BracketMeasurement = {
  measuredWidth: number | null;
  computedWidth: number | null;
  measuredReading: number | null;
  computedReading: number | null;
};

/** The verdict of a bracket: each value's deviation and pass (null when not measured or not computable). */
export type BracketVerdict = {
  widthDeviation: number | null;
  widthPass: boolean | null;
  readingDeviation: number | null;
  readingPass: boolean | null;
  pass: boolean;
};

/**
 * Judges a bracket: the width and the reading each against its tolerance (bridge units). A value that
 * was not measured, or has no computed target, is not judged; the bracket passes when nothing judged fails.
 */
export function bracketVerdict(m: BracketMeasurement, tolerance: { width: number; reading: number }): BracketVerdict {
  const w = m.measuredWidth !== null && m.computedWidth !== null ? judge(m.measuredWidth, m.computedWidth, tolerance.width) : null;
  const r = m.measuredReading !== null && m.computedReading !== null ? judge(m.measuredReading, m.computedReading, tolerance.reading) : null;
  return {
    widthDeviation: w ? w.deviation : null,
    widthPass: w ? w.pass : null,
    readingDeviation: r ? r.deviation : null,
    readingPass: r ? r.pass : null,
    pass: (w ? w.pass : true) && (r ? r.pass : true),
  };
}

/**
 * Which way to move the form edge to close a deviation (measured − computed). Width: measured wider
 * means the edge is too far out. Reading (drop from the girder top): a larger drop means the edge is
 * too low.
 */
export function fixHint(kind: MeasureKind, deviation: number, units: Units): string {
  const by = deviationText(Math.abs(deviation), units, kind).replace(/^[+±]/, '');
  if (kind === 'width') return deviation > 0 ? `Bring the form edge in ${by}.` : `Set the form edge out ${by}.`;
  return deviation > 0 ? `Raise the form edge ${by}.` : `Lower the form edge ${by}.`;
}

/** The word beside a deviation: "OK" within tolerance, "over ±0.25 in (0.021 ft)" outside it. */
export function verdictWord(pass: boolean | null, tolerance: number, units: Units, kind: MeasureKind): string {
  return pass ? 'OK' : `over ${toleranceText(tolerance, units, kind)}`;
}
