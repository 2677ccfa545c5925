/**
 * Public surface of the Chordline geometry engine: pure TypeScript, no I/O. Lengths in the bridge's
 * unit ("ft" or "m"), angles in degrees at the input, offsets positive to the right looking
 * up-station, bearings clockwise from north.
 */
export { computeOffsetTable } from './compute';
export type { OffsetTable, OffsetPoint, ChordOffsetSet, ChordOffsetPoint, SpanSummary, PointSide } from './types';
export {
  bridgeDescriptionSchema,
  defaultFormSettlement,
  DEFAULT_CHORD_SPACES,
  DEFAULT_POINTS_PER_SPAN,
  type BridgeDescription,
  type BridgeDescriptionInput,
  type DeflectionInput,
  type EdgeOffsetInput,
  type SpiralElementDescription,
  SIZE_LIMITS,
} from './schema';
export { edgeOffsetAt, edgeSpecOffsetAt, isConstantEdge, type DeckEdgeSpecs, type EdgeOffsetSpec, type EdgeStationOffset } from './deck-edges';
export { parseBridge, parseBridgeSchema, validateGeometry, MAX_GIRDER_POINTS, MAX_CHORD_POINTS, type ParseBridgeResult } from './validate';
export { GeometryError, type GeometryIssue } from './errors';
export { formatFeet, formatFeetFine, formatFeetInches, formatLength, formatMetres, formatOffset, formatStation, type DisplayStyle } from './format';
export { thermalBow, thermalBowInches, STEEL_EXPANSION_PER_F, CONCRETE_EXPANSION_PER_F, STEEL_EXPANSION_PER_C, CONCRETE_EXPANSION_PER_C } from './thermal';
export { offsetTableToCsv, csvCell, type CsvOptions } from './csv';
export {
  Alignment,
  createAlignment,
  directionOf,
  rightNormalOf,
  pointOnSkewedLine,
  skewedLineBearing,
  distanceAlongRayToOffset,
  SolveError,
  type AlignmentInput,
  type AlignmentElementInput,
  type SpiralElementInput,
  type AlignmentPoint,
  type PlanPoint,
  type StationOffset,
} from './alignment';
export { Profile, createProfile, type PviInput, type VerticalCurve } from './profile';
export { DeckSurface, crossSlopeAt, gutterOffsets, sideOfOffset, type CrossSlopeInput, type DeckSide } from '@/lib/geometry/cross-section';
export { bentLinePoint, girderPoints, exteriorSides, type GirderPoint, type LocatedPoint } from './framing';
export { chordEdgePoint, curvedEdgePoint, overhangElevations, outwardNormal, type EdgePoint } from './overhang';
export { chordOffsetSet, chordOffsetAt, edgeMiddleOrdinate } from '@/lib/geometry/chord-offsets';
export { createBridgeModel, type BridgeModel } from './table';
