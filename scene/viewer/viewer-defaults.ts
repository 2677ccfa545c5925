/** Sizes the bridge view draws with, in the bridge's units. */
import type { Units } from '@/lib/units';
import { defaultGirderShape } from '../builders/girders';

export { defaultBracketSpacing } from '../builders/brackets';

/** Drawn girder depth (6 ft or 1.8 m), which the thermal bow example uses too. */
export function defaultGirderShapeDepth(units: Units): number {
  return defaultGirderShape(units).depth;
}
