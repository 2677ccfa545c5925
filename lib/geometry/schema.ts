/**
 * The one schema for a bridge description (shared by the API, forms, the offsets command and
 * import). Field names follow the data contract exactly; unknown extra fields pass through so that
 * new optional fields can be added without breaking stored revisions.
 */
import { z } from 'zod';

const finite = (what: string) =>
  z.number({ error: (iss) => (iss.input === undefined ? `${what} is required` : `${what} must be a finite number`) });

const positive = (what: string) => finite(what).gt(0, { error: `${what} must be greater than zero` });
const nonNegative = (what: string) => finite(what).min(0, { error: `${what} must not be negative` });

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

const alignmentSchema = z.looseObject({
  start_station: finite('Start station'),
  start_x: finite('Start x (easting)'),
  start_y: finite('Start y (northing)'),
  start_bearing_deg: finite('Start bearing'),
  elements: z
    .array(
      z.discriminatedUnion('type', [lineElement, arcElement], {
        error: 'Element type must be "line" or "arc"',
      }),
    )
    .min(1, { error: 'The alignment needs at least one element' }),
});

const pviSchema = z.looseObject({
  station: finite('PVI station'),
  elevation: finite('PVI elevation'),
  curve_length: nonNegative('Vertical curve length').optional(),
});

const crossSlopeSchema = z.looseObject({
  station: finite('Cross-slope station'),
  left: finite('Left cross slope').min(-1, { error: 'Left cross slope must be between -1 and 1 (rise/run)' }).max(1, {
    error: 'Left cross slope must be between -1 and 1 (rise/run)',
  }),
  right: finite('Right cross slope').min(-1, { error: 'Right cross slope must be between -1 and 1 (rise/run)' }).max(1, {
    error: 'Right cross slope must be between -1 and 1 (rise/run)',
  }),
});

const deckSchema = z.looseObject({
  left_edge_offset: finite('Left edge offset'),
  right_edge_offset: finite('Right edge offset'),
  slab_thickness: positive('Slab thickness'),
  edge_thickness: positive('Edge thickness'),
  left_barrier_width: nonNegative('Left barrier width'),
  right_barrier_width: nonNegative('Right barrier width'),
  form_settlement: nonNegative('Form settlement allowance').optional(),
});

const bentSchema = z.looseObject({
  name: z.string({ error: 'Bent name must be text' }).min(1, { error: 'Bent name is required' }),
  station: finite('Bent station'),
  skew_deg: finite('Bent skew')
    .gt(-90, { error: 'Bent skew must be between -90 and 90 degrees' })
    .lt(90, { error: 'Bent skew must be between -90 and 90 degrees' }),
});

const girderSchema = z.looseObject({
  name: z.string({ error: 'Girder name must be text' }).min(1, { error: 'Girder name is required' }),
  layout: z.enum(['chord', 'curved'], { error: 'Girder layout must be "chord" or "curved"' }),
  offsets: z.array(finite('Girder offset')).min(2, { error: 'A girder needs an offset at each bent (at least two)' }),
});

const topOfGirderSchema = z.looseObject({
  girder: z.string({ error: 'Top-of-girder entry needs a girder name' }),
  span: z.int({ error: 'Span must be a whole number' }).min(1, { error: 'Span numbers start at 1' }),
  point: z.int({ error: 'Point must be a whole number' }).min(0, { error: 'Point numbers start at 0' }),
  elevation: finite('Top-of-girder elevation'),
});

/** Zod schema of a bridge description (see shared bridge-format contract). */
export const bridgeDescriptionSchema = z.looseObject({
  name: z.string({ error: 'Name must be text' }).min(1, { error: 'Name is required' }),
  units: z.enum(['ft', 'm'], { error: 'Units must be "ft" or "m"' }),
  alignment: alignmentSchema,
  profile: z.looseObject({
    pvis: z.array(pviSchema).min(1, { error: 'The profile needs at least one PVI' }),
  }),
  cross_slopes: z.array(crossSlopeSchema).min(1, { error: 'Give cross slopes at one station at least' }),
  deck: deckSchema,
  bents: z.array(bentSchema).min(2, { error: 'A bridge needs at least two bents' }),
  girders: z.array(girderSchema).min(1, { error: 'A bridge needs at least one girder' }),
  points_per_span: z
    .int({ error: 'Points per span must be a whole number' })
    .min(1, { error: 'Points per span must be between 1 and 10000' })
    .max(10000, { error: 'Points per span must be between 1 and 10000' })
    .optional(),
  chord_spaces: z
    .int({ error: 'Chord spaces must be a whole number' })
    .min(1, { error: 'Chord spaces must be between 1 and 10000' })
    .max(10000, { error: 'Chord spaces must be between 1 and 10000' })
    .optional(),
  top_of_girder: z.array(topOfGirderSchema).optional(),
});

/** A bridge description as accepted by the schema (lengths in `units`, angles in degrees). */
export type BridgeDescription = z.infer<typeof bridgeDescriptionSchema>;
/** The same, as a form or import may hand it over before parsing. */
export type BridgeDescriptionInput = z.input<typeof bridgeDescriptionSchema>;

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
