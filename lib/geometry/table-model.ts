/**
 * The evaluated pieces of a bridge (alignment, profile, deck surface) with the description's
 * defaults applied, shared by the table steps and by callers such as the 3D view.
 */
import { createAlignment, type Alignment } from './alignment';
import { DeckSurface } from './cross-section';
import { createProfile, type Profile } from './profile';
import { DEFAULT_CHORD_SPACES, DEFAULT_POINTS_PER_SPAN, defaultFormSettlement, type BridgeDescription } from './schema';

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
 * (points_per_span 10, chord_spaces 20, form_settlement 0.02 ft / 0.005 m). Flared deck edges are
 * followed station by station by the deck surface's gutter lines.
 */
export function createBridgeModel(bridge: BridgeDescription): BridgeModel {
  const alignment = createAlignment(bridge.alignment);
  const profile = createProfile(bridge.profile.pvis);
  return {
    units: bridge.units,
    alignment,
    profile,
    surface: new DeckSurface(alignment, profile, bridge.cross_slopes, bridge.deck),
    pointsPerSpan: bridge.points_per_span ?? DEFAULT_POINTS_PER_SPAN,
    chordSpaces: bridge.chord_spaces ?? DEFAULT_CHORD_SPACES,
    formSettlement: bridge.deck.form_settlement ?? defaultFormSettlement(bridge.units),
  };
}
