/**
 * Table step 4, chord offsets: per span and side, the deck edge's chord between its points on the
 * two bent lines, the offsets to the edge line at each division, and the span's overhang summary.
 */
import { chordOffsetSet, edgeMiddleOrdinate } from './chord-offsets';
import type { GeometryIssue } from './errors';
import type { BridgeDescription } from './schema';
import { edgeSpecOf, solveProblem, type Framing } from './table-framing';
import type { BridgeModel } from './table-model';
import { isSignificant } from './tolerance';
import type { ChordOffsetSet, SpanSummary } from './types';

/** Neighbouring girder points between which the edge width changes the most; null for a constant width. */
export function fastestChange(widths: readonly number[]): SpanSummary['fastest_change'] {
  let fastest: SpanSummary['fastest_change'] = null;
  for (let k = 1; k < widths.length; k++) {
    const change = widths[k] - widths[k - 1];
    if (fastest === null || Math.abs(change) > Math.abs(fastest.width_change)) fastest = { from_point: k - 1, to_point: k, width_change: change };
  }
  // A constant width (curved girders) has no place where it changes; noise is not a finding.
  return fastest !== null && isSignificant(fastest.width_change) ? fastest : null;
}

/**
 * Chord offsets of span j (0-based) on one side, and its summary when the exterior girder's widths
 * are known; problems become issues.
 */
export function spanChords(
  bridge: BridgeDescription,
  model: BridgeModel,
  framing: Framing,
  j: number,
  side: 'left' | 'right',
  widths: { girder: string; widths: number[] } | null,
  issues: GeometryIssue[],
): { set: ChordOffsetSet | null; summary: SpanSummary | null } {
  const span = j + 1;
  const ea = framing.edges[side][j];
  const eb = framing.edges[side][j + 1];
  if (!ea || !eb) return { set: null, summary: null };
  if (!(eb.station > ea.station)) {
    issues.push({
      path: `bents.${j + 1}.skew_deg`,
      span,
      message: `Span ${span}: the ${side} deck edge on ${bridge.bents[j + 1].name} is not up-station of its point on ${bridge.bents[j].name} (the bent lines cross inside the deck)`,
    });
    return { set: null, summary: null };
  }
  const edge = edgeSpecOf(bridge, side);
  let set: ChordOffsetSet;
  let middleOrdinate: number;
  try {
    set = chordOffsetSet(model.alignment, span, side, ea, eb, edge, model.chordSpaces);
    middleOrdinate = edgeMiddleOrdinate(model.alignment, ea, eb, side, edge);
  } catch (err) {
    issues.push({ path: `deck.${side}_edge_offset`, span, message: `Span ${span}: the chord offsets of the ${side} deck edge cannot be found (${solveProblem(err)})` });
    return { set: null, summary: null };
  }
  if (!widths) return { set, summary: null };
  const summary: SpanSummary = {
    span,
    side,
    girder: widths.girder,
    min_edge_width: Math.min(...widths.widths),
    max_edge_width: Math.max(...widths.widths),
    middle_ordinate: middleOrdinate,
    fastest_change: fastestChange(widths.widths),
  };
  return { set, summary };
}
