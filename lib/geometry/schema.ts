/**
 * The one schema for a bridge description (shared by the API, forms, the offsets command and
 * import). Field names follow the data contract exactly; unknown extra fields pass through so that
 * new optional fields can be added without breaking stored revisions.
 */
import { z } from 'zod';
import { hasUnsafeChars } from '@/lib/text/unsafe-chars';

const finite = (what: string) => z.number({ error: (iss) => (iss.input === undefined ? `${what} is required` : `${what} must be a finite number`) });

const positive = (what: string) => finite(what).gt(0, { error: `${what} must be greater than zero` });
const nonNegative = (what: string) => finite(what).min(0, { error: `${what} must not be negative` });

/** The refusal of a name holding a control or bidirectional-control character, naming the field. */
const noUnsafeChars = (what: string) => ({
  error: `${what} must not contain control characters (tab, line breaks, NUL and the like) or right-to-left controls`,
});

/**
 * A name shown to people (lists, sheets, CSV, PDF, DXF): text, not empty, with no control or
 * bidirectional-control character (tab, line breaks, NUL, BEL, right-to-left override, ...).
 */
const nameText = (what: string) =>
  z
    .string({ error: `${what} must be text` })
    .min(1, { error: `${what} is required` })
    .refine((v) => !hasUnsafeChars(v), noUnsafeChars(what));

const lineElement = z.looseObject({
  type: z.literal('line'),
  length: positive('Element length'),
});

const arcElement = z.looseObject({
  type: z.literal('arc'),
  length: positive('Element length'),
  radius: positive('Arc radius'),
  direction: z.enum(['left', 'right'], { error: 'Arc direction must be "left" or "right"' }),
});

/** A radius or null (infinite: curvature 0, a tangent). */
const spiralRadius = (what: string) => positive(what).nullable();

const spiralElement = z.looseObject({
  type: z.literal('spiral'),
  length: positive('Element length'),
  radius_start: spiralRadius('Spiral start radius'),
  radius_end: spiralRadius('Spiral end radius'),
  direction: z.enum(['left', 'right'], { error: 'Spiral direction must be "left" or "right"' }),
});

/** Most alignment elements, bents, girders, surveyed tops and deflection values a description may hold. */
export const SIZE_LIMITS = {
  elements: 10_000,
  bents: 200,
  girders: 40,
  topOfGirder: 50_000,
  deflectionValues: 201,
  pointsPerSpan: 200,
  chordSpaces: 200,
} as const;

const alignmentSchema = z.looseObject({
  start_station: finite('Start station'),
  start_x: finite('Start x (easting)'),
  start_y: finite('Start y (northing)'),
  start_bearing_deg: finite('Start bearing'),
  elements: z
    .array(
      z.discriminatedUnion('type', [lineElement, arcElement, spiralElement], {
        error: 'Element type must be "line", "arc" or "spiral"',
      }),
    )
    .min(1, { error: 'The alignment needs at least one element' })
    .max(SIZE_LIMITS.elements, { error: `The alignment may have at most ${SIZE_LIMITS.elements} elements` }),
});

const pviSchema = z.looseObject({
  station: finite('PVI station'),
  elevation: finite('PVI elevation'),
  curve_length: nonNegative('Vertical curve length').optional(),
});

const crossSlopeSchema = z.looseObject({
  station: finite('Cross-slope station'),
  left: finite('Left cross slope').min(-1, { error: 'Left cross slope must be from -1 to 1 (rise/run, both included)' }).max(1, {
    error: 'Left cross slope must be from -1 to 1 (rise/run, both included)',
  }),
  right: finite('Right cross slope').min(-1, { error: 'Right cross slope must be from -1 to 1 (rise/run, both included)' }).max(1, {
    error: 'Right cross slope must be from -1 to 1 (rise/run, both included)',
  }),
});

const edgeStationSchema = z.looseObject({
  station: finite('Edge station'),
  offset: finite('Edge offset'),
});

/** A deck edge: a constant offset, or a station/offset list (a flared edge, at least two rows). */
const edgeOffsetSchema = (what: string) =>
  z.union([finite(what), z.array(edgeStationSchema).min(2, { error: `${what}: a flared edge needs at least two stations` })], {
    error: `${what} must be a number or a list of { station, offset }`,
  });

const deckSchema = z.looseObject({
  left_edge_offset: edgeOffsetSchema('Left edge offset'),
  right_edge_offset: edgeOffsetSchema('Right edge offset'),
  slab_thickness: positive('Slab thickness'),
  edge_thickness: positive('Edge thickness'),
  left_barrier_width: nonNegative('Left barrier width'),
  right_barrier_width: nonNegative('Right barrier width'),
  form_settlement: nonNegative('Form settlement allowance').optional(),
});

const bentSchema = z.looseObject({
  name: nameText('Bent name'),
  station: finite('Bent station'),
  skew_deg: finite('Bent skew').gt(-90, { error: 'Bent skew must be strictly between -90 and 90 degrees' }).lt(90, { error: 'Bent skew must be strictly between -90 and 90 degrees' }),
});

const girderSchema = z.looseObject({
  name: nameText('Girder name'),
  layout: z.enum(['chord', 'curved'], { error: 'Girder layout must be "chord" or "curved"' }),
  offsets: z.array(finite('Girder offset')).min(2, { error: 'A girder needs an offset at each bent (at least two)' }),
});

const topOfGirderSchema = z.looseObject({
  girder: z.string({ error: 'Top-of-girder entry needs a girder name' }).refine((v) => !hasUnsafeChars(v), noUnsafeChars('The girder name of a top-of-girder entry')),
  span: z.int({ error: 'Span must be a whole number' }).min(1, { error: 'Span numbers start at 1' }),
  point: z.int({ error: 'Point must be a whole number' }).min(0, { error: 'Point numbers start at 0' }),
  elevation: finite('Top-of-girder elevation'),
});

const deflectionSchema = z.looseObject({
  girder: z.string({ error: 'Deflection entry needs a girder name' }).refine((v) => !hasUnsafeChars(v), noUnsafeChars('The girder name of a deflection entry')),
  span: z.int({ error: 'Span must be a whole number' }).min(1, { error: 'Span numbers start at 1' }),
  values: z
    .array(finite('Deflection'))
    .min(2, { error: 'A deflection table needs at least two values (fraction 0 and 1 of the span)' })
    .max(SIZE_LIMITS.deflectionValues, { error: `A deflection table may have at most ${SIZE_LIMITS.deflectionValues} values` }),
});

/** Zod schema of a bridge description (see shared bridge-format contract). */
export const bridgeDescriptionSchema = z.looseObject({
  name: nameText('Name'),
  units: z.enum(['ft', 'm'], { error: 'Units must be "ft" or "m"' }),
  alignment: alignmentSchema,
  profile: z.looseObject({
    pvis: z.array(pviSchema).min(1, { error: 'The profile needs at least one PVI' }),
  }),
  cross_slopes: z.array(crossSlopeSchema).min(1, { error: 'Give cross slopes at one station at least' }),
  deck: deckSchema,
  bents: z
    .array(bentSchema)
    .min(2, { error: 'A bridge needs at least two bents' })
    .max(SIZE_LIMITS.bents, { error: `A bridge may have at most ${SIZE_LIMITS.bents} bents` }),
  girders: z
    .array(girderSchema)
    .min(1, { error: 'A bridge needs at least one girder' })
    .max(SIZE_LIMITS.girders, { error: `A bridge may have at most ${SIZE_LIMITS.girders} girders` }),
  points_per_span: z
    .int({ error: 'Points per span must be a whole number' })
    .min(1, { error: `Points per span must be from 1 to ${SIZE_LIMITS.pointsPerSpan} (both included)` })
    .max(SIZE_LIMITS.pointsPerSpan, { error: `Points per span must be from 1 to ${SIZE_LIMITS.pointsPerSpan} (both included)` })
    .optional(),
  chord_spaces: z
    .int({ error: 'Chord spaces must be a whole number' })
    .min(1, { error: `Chord spaces must be from 1 to ${SIZE_LIMITS.chordSpaces} (both included)` })
    .max(SIZE_LIMITS.chordSpaces, { error: `Chord spaces must be from 1 to ${SIZE_LIMITS.chordSpaces} (both included)` })
    .optional(),
  top_of_girder: z
    .array(topOfGirderSchema)
    .max(SIZE_LIMITS.topOfGirder, { error: `At most ${SIZE_LIMITS.topOfGirder} surveyed girder tops` })
    .optional(),
  deflections: z.array(deflectionSchema).optional(),
});

/** A bridge description as accepted by the schema (lengths in `units`, angles in degrees). */
export type BridgeDescription = z.infer<typeof bridgeDescriptionSchema>;
/** The same, as a form or import may hand it over before parsing. */
export type BridgeDescriptionInput = z.input<typeof bridgeDescriptionSchema>;

/** A deck edge as described: a constant offset or a flared station/offset list. */
export type EdgeOffsetInput = BridgeDescription['deck']['left_edge_offset'];
/** A spiral element as described. */
export type SpiralElementDescription = z.infer<typeof spiralElement>;
/** One deflection table entry as described. */
export type DeflectionInput = z.infer<typeof deflectionSchema>;

/** Girder points per span when `points_per_span` is omitted (tenth points). */
export const DEFAULT_POINTS_PER_SPAN = 10;
/** Chord spaces per span when `chord_spaces` is omitted. */
export const DEFAULT_CHORD_SPACES = 20;

/**
 * Form settlement allowance when omitted: 0.02 ft (common practice) or 0.005 m (5 mm, common
 * practice), in the bridge's length unit.
 */
export function defaultFormSettlement(units: 'ft' | 'm'): number {
  return units === 'm' ? 0.005 : 0.02;
}
