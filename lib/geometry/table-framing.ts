/**
 * Table step 1, framing: every girder's and deck edge's point on every bent line, solved once and
 * shared by the two spans meeting at a bent; then each girder's points along a span.
 */
import { SolveError } from './alignment';
import type { EdgeOffsetSpec } from './deck-edges';
import type { GeometryIssue } from './errors';
import { bentLinePoint, girderPoints, type GirderPoint, type LocatedPoint } from './framing';
import type { BridgeDescription } from './schema';
import type { BridgeModel } from './table-model';

/** Points on the bent lines: [girder][bent] and, per side, [bent] for the deck edge. */
export interface Framing {
  girders: Array<Array<LocatedPoint | null>>;
  edges: Record<'left' | 'right', Array<LocatedPoint | null>>;
}

/** The message of a solver failure; anything else is a bug and is thrown on. */
export function solveProblem(err: unknown): string {
  if (err instanceof SolveError) return err.message;
  throw err;
}

/** The deck edge of a side as described (a number or a flared list). */
export function edgeSpecOf(bridge: BridgeDescription, side: 'left' | 'right'): EdgeOffsetSpec {
  return side === 'left' ? bridge.deck.left_edge_offset : bridge.deck.right_edge_offset;
}

/** Framing step: girder and edge points on every bent line; failures become issues. */
export function frameBents(bridge: BridgeDescription, model: BridgeModel, issues: GeometryIssue[]): Framing {
  const { alignment } = model;
  const girders = bridge.girders.map((g, gi) =>
    bridge.bents.map((bent, b) => {
      try {
        return bentLinePoint(alignment, bent, g.offsets[b]);
      } catch (err) {
        issues.push({ path: `girders.${gi}.offsets.${b}`, girder: g.name, message: `Girder ${g.name}: its point on ${bent.name} cannot be found (${solveProblem(err)})` });
        return null;
      }
    }),
  );
  const edges: Framing['edges'] = { left: [], right: [] };
  for (const side of ['left', 'right'] as const) {
    edges[side] = bridge.bents.map((bent) => {
      try {
        return bentLinePoint(alignment, bent, edgeSpecOf(bridge, side));
      } catch (err) {
        issues.push({ path: `deck.${side}_edge_offset`, message: `The ${side} deck edge cannot be found on ${bent.name} (${solveProblem(err)})` });
        return null;
      }
    });
  }
  return { girders, edges };
}

/**
 * Girder points of girder gi in span j (0-based), or null with an issue when its ends are missing,
 * out of order (bent lines crossing inside the deck) or its points cannot be placed.
 */
export function spanGirderPoints(
  bridge: BridgeDescription,
  model: BridgeModel,
  framing: Framing,
  gi: number,
  j: number,
  issues: GeometryIssue[],
): { pa: LocatedPoint; pb: LocatedPoint; points: GirderPoint[] } | null {
  const g = bridge.girders[gi];
  const span = j + 1;
  const pa = framing.girders[gi][j];
  const pb = framing.girders[gi][j + 1];
  if (!pa || !pb) return null;
  if (!(pb.station > pa.station)) {
    issues.push({
      path: `girders.${gi}.offsets.${j + 1}`,
      span,
      girder: g.name,
      message: `Span ${span}, girder ${g.name}: its end on ${bridge.bents[j + 1].name} is not up-station of its end on ${bridge.bents[j].name} (the bent lines cross inside the deck)`,
    });
    return null;
  }
  try {
    return { pa, pb, points: girderPoints(model.alignment, g.layout, pa, pb, model.pointsPerSpan) };
  } catch (err) {
    issues.push({ path: `girders.${gi}`, span, girder: g.name, message: `Span ${span}, girder ${g.name}: its points cannot be placed (${solveProblem(err)})` });
    return null;
  }
}
