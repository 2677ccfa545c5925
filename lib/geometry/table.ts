/**
 * Builds the offset table from a description. Geometry problems found on the way (a girder point at
 * or past the deck edge, bent lines crossing, a solve that fails) are collected, not thrown, so that
 * validation and computation share one pass.
 */
import { createAlignment, SolveError, type Alignment } from './alignment';
import { chordOffsetSet, edgeMiddleOrdinate } from '@/lib/geometry/chord-offsets';
import { DeckSurface } from '@/lib/geometry/cross-section';
import { edgeOffsetAt } from './deck-edges';
import type { GeometryIssue } from './errors';
import { formatLength } from './format';
import { bentLinePoint, exteriorSides, girderPoints, type LocatedPoint } from './framing';
import { chordEdgePoint, curvedEdgePoint, overhangElevations } from './overhang';
import { createProfile, type Profile } from './profile';
import { DEFAULT_CHORD_SPACES, DEFAULT_POINTS_PER_SPAN, defaultFormSettlement, type BridgeDescription } from './schema';
import type { ChordOffsetSet, OffsetPoint, OffsetTable, SpanSummary } from './types';

/** The evaluated pieces of a bridge, for callers (such as the 3D view) that need more than the table. */
export interface BridgeModel {
  units: 'ft' | 'm';
  alignment: Alignment;
  profile: Profile;
  surface: DeckSurface;
  pointsPerSpan: number;
  chordSpaces: number;
  formSettlement: number;
}

/**
 * Lay out alignment, profile and deck surface of a description, with defaults applied
 * (points_per_span 10, chord_spaces 20, form_settlement 0.02 ft / 0.005 m).
 */
export function createBridgeModel(bridge: BridgeDescription): BridgeModel {
  const alignment = createAlignment(bridge.alignment);
  const profile = createProfile(bridge.profile.pvis);
  return {
    units: bridge.units,
    alignment,
    profile,
    surface: new DeckSurface(alignment, profile, bridge.cross_slopes, {
      ...bridge.deck,
      left_edge_offset: edgeOffsetAt(bridge.deck, 'left', bridge.bents[0]?.station ?? 0),
      right_edge_offset: edgeOffsetAt(bridge.deck, 'right', bridge.bents[0]?.station ?? 0),
    }),
    pointsPerSpan: bridge.points_per_span ?? DEFAULT_POINTS_PER_SPAN,
    chordSpaces: bridge.chord_spaces ?? DEFAULT_CHORD_SPACES,
    formSettlement: bridge.deck.form_settlement ?? defaultFormSettlement(bridge.units),
  };
}

function solveProblem(err: unknown): string {
  if (err instanceof SolveError) return err.message;
  throw err;
}

/**
 * Compute the full offset table; problems go to `issues` (the table is still returned, possibly
 * incomplete, and must not be used when any issue was recorded).
 */
export function buildOffsetTable(bridge: BridgeDescription, issues: GeometryIssue[]): OffsetTable {
  const model = createBridgeModel(bridge);
  const { alignment, surface, units } = model;
  const n = model.pointsPerSpan;
  const deck = bridge.deck;
  const edgeOffsetOf = (side: 'left' | 'right') => edgeOffsetAt(deck, side, bridge.bents[0].station);
  const sides = exteriorSides(bridge.girders);
  const spanCount = bridge.bents.length - 1;

  const topOfGirder = new Map<string, number>();
  for (const t of bridge.top_of_girder ?? []) topOfGirder.set(`${t.girder}\u0000${t.span}\u0000${t.point}`, t.elevation);

  // Points of every girder on every bent line, solved once and shared by the two spans at a bent.
  const onBents: Array<Array<LocatedPoint | null>> = bridge.girders.map((g, gi) =>
    bridge.bents.map((bent, b) => {
      try {
        return bentLinePoint(alignment, bent, g.offsets[b]);
      } catch (err) {
        issues.push({
          path: `girders.${gi}.offsets.${b}`,
          girder: g.name,
          message: `Girder ${g.name}: its point on ${bent.name} cannot be found (${solveProblem(err)})`,
        });
        return null;
      }
    }),
  );
  const edgesOnBents: Record<'left' | 'right', Array<LocatedPoint | null>> = { left: [], right: [] };
  for (const side of ['left', 'right'] as const) {
    edgesOnBents[side] = bridge.bents.map((bent, b) => {
      try {
        return bentLinePoint(alignment, bent, edgeOffsetOf(side));
      } catch (err) {
        issues.push({
          path: `deck.${side}_edge_offset`,
          message: `The ${side} deck edge cannot be found on ${bent.name} (${solveProblem(err)})`,
        });
        return null;
      }
    });
  }

  const points: OffsetPoint[] = [];
  const chordOffsets: ChordOffsetSet[] = [];
  const summaries: SpanSummary[] = [];
  let edgeIssues = 0;

  for (let j = 0; j < spanCount; j++) {
    const span = j + 1;
    const spanWidths: Record<'left' | 'right', { girder: string; widths: number[] } | null> = { left: null, right: null };
    for (let gi = 0; gi < bridge.girders.length; gi++) {
      const g = bridge.girders[gi];
      const pa = onBents[gi][j];
      const pb = onBents[gi][j + 1];
      if (!pa || !pb) continue;
      if (!(pb.station > pa.station)) {
        issues.push({
          path: `girders.${gi}.offsets.${j + 1}`,
          span,
          girder: g.name,
          message: `Span ${span}, girder ${g.name}: its end on ${bridge.bents[j + 1].name} is not up-station of its end on ${bridge.bents[j].name} (the bent lines cross inside the deck)`,
        });
        continue;
      }
      let gps: ReturnType<typeof girderPoints>;
      try {
        gps = girderPoints(alignment, g.layout, pa, pb, n);
      } catch (err) {
        issues.push({ path: `girders.${gi}`, span, girder: g.name, message: `Span ${span}, girder ${g.name}: its points cannot be placed (${solveProblem(err)})` });
        continue;
      }
      const faces = sides[gi];
      if (faces.length === 0) {
        for (const pk of gps) {
          const tog = topOfGirder.get(`${g.name}\u0000${span}\u0000${pk.point}`) ?? null;
          const topOfDeck = surface.topOfDeckAtStationOffset(pk.station, pk.offset);
          const bottomOfSlab = topOfDeck - deck.slab_thickness;
          points.push({
            span,
            girder: g.name,
            side: 'interior',
            point: pk.point,
            fraction: pk.fraction,
            station: pk.station,
            offset: pk.offset,
            x: pk.x,
            y: pk.y,
            edge_x: null,
            edge_y: null,
            edge_station: null,
            edge_width: null,
            top_of_deck: topOfDeck,
            bottom_of_slab: bottomOfSlab,
            edge_bottom: null,
            edge_drop: null,
            form_target: null,
            top_of_girder: tog,
            buildup: tog === null ? null : bottomOfSlab - tog,
            drop_from_girder_top: null,
            deflection: 0,
            screed_grade: topOfDeck,
          });
        }
        continue;
      }
      const girderDirection = { x: pb.x - pa.x, y: pb.y - pa.y };
      for (const side of faces) {
        const edgeOffset = edgeOffsetOf(side);
        const widths: number[] = [];
        for (const pk of gps) {
          let ek;
          try {
            ek =
              g.layout === 'chord'
                ? chordEdgePoint(alignment, pk, girderDirection, side, edgeOffset)
                : curvedEdgePoint(alignment, pk, side, edgeOffset);
          } catch (err) {
            issues.push({
              path: `girders.${gi}`,
              span,
              girder: g.name,
              point: pk.point,
              message: `Span ${span}, girder ${g.name}, point ${pk.point}: the ${side} deck edge cannot be reached square to the girder (${solveProblem(err)})`,
            });
            continue;
          }
          if (!(ek.edgeWidth > 0)) {
            edgeIssues++;
            // One line per point would bury the cause on a 10,000-point span; the first ones locate it.
            if (edgeIssues <= 20) {
              issues.push({
                path: `girders.${gi}.offsets`,
                span,
                girder: g.name,
                point: pk.point,
                message: `Span ${span}, girder ${g.name}, point ${pk.point}: the girder point is at or beyond the ${side} deck edge (edge width ${formatLength(ek.edgeWidth, units)})`,
              });
            }
          }
          widths.push(ek.edgeWidth);
          const tog = topOfGirder.get(`${g.name}\u0000${span}\u0000${pk.point}`) ?? null;
          const elev = overhangElevations(surface, pk, ek, deck.slab_thickness, deck.edge_thickness, model.formSettlement, tog);
          points.push({
            span,
            girder: g.name,
            side,
            point: pk.point,
            fraction: pk.fraction,
            station: pk.station,
            offset: pk.offset,
            x: pk.x,
            y: pk.y,
            edge_x: ek.x,
            edge_y: ek.y,
            edge_station: ek.station,
            edge_width: ek.edgeWidth,
            top_of_deck: elev.topOfDeck,
            bottom_of_slab: elev.bottomOfSlab,
            edge_bottom: elev.edgeBottom,
            edge_drop: elev.edgeDrop,
            form_target: elev.formTarget,
            top_of_girder: tog,
            buildup: elev.buildup,
            drop_from_girder_top: elev.dropFromGirderTop,
            deflection: 0,
            screed_grade: elev.topOfDeck,
          });
        }
        if (widths.length === gps.length) spanWidths[side] = { girder: g.name, widths };
      }
    }

    for (const side of ['left', 'right'] as const) {
      const ea = edgesOnBents[side][j];
      const eb = edgesOnBents[side][j + 1];
      if (!ea || !eb) continue;
      if (!(eb.station > ea.station)) {
        issues.push({
          path: `bents.${j + 1}.skew_deg`,
          span,
          message: `Span ${span}: the ${side} deck edge on ${bridge.bents[j + 1].name} is not up-station of its point on ${bridge.bents[j].name} (the bent lines cross inside the deck)`,
        });
        continue;
      }
      const edgeOffset = edgeOffsetOf(side);
      let middleOrdinate: number;
      try {
        chordOffsets.push(chordOffsetSet(alignment, span, side, ea, eb, edgeOffset, model.chordSpaces));
        middleOrdinate = edgeMiddleOrdinate(alignment, ea, eb, side, edgeOffset);
      } catch (err) {
        issues.push({
          path: `deck.${side}_edge_offset`,
          span,
          message: `Span ${span}: the chord offsets of the ${side} deck edge cannot be found (${solveProblem(err)})`,
        });
        continue;
      }
      const w = spanWidths[side];
      if (!w) continue;
      let fastest: SpanSummary['fastest_change'] = null;
      for (let k = 1; k < w.widths.length; k++) {
        const change = w.widths[k] - w.widths[k - 1];
        if (fastest === null || Math.abs(change) > Math.abs(fastest.width_change)) {
          fastest = { from_point: k - 1, to_point: k, width_change: change };
        }
      }
      // A constant width (curved girders) has no place where it changes; noise is not a finding.
      if (fastest !== null && !(Math.abs(fastest.width_change) > 1e-9)) fastest = null;
      summaries.push({
        span,
        side,
        girder: w.girder,
        min_edge_width: Math.min(...w.widths),
        max_edge_width: Math.max(...w.widths),
        middle_ordinate: middleOrdinate,
        fastest_change: fastest,
      });
    }
  }

  if (edgeIssues > 20) {
    issues.push({
      path: 'girders',
      message: `${edgeIssues - 20} more girder points are at or beyond a deck edge`,
    });
  }

  return { units, points, chord_offsets: chordOffsets, span_summaries: summaries };
}
