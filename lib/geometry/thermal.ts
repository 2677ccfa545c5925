/**
 * Thermal bowing of a girder: a top-to-bottom temperature difference ΔT bends a member of depth h
 * to curvature α·ΔT/h, a midspan rise (or sag) of α·ΔT·L²/(8h) on a simple span (Gere, Mechanics of
 * Materials, §9.11). It is why overhang forms are set from the girder, not to absolute elevations.
 */

/** Steel, per °F (AASHTO LRFD 6.4.1, from memory). */
export const STEEL_EXPANSION_PER_F = 6.5e-6;
/** Normal-weight concrete, per °F (from memory). */
export const CONCRETE_EXPANSION_PER_F = 6.0e-6;
/** Steel, per °C (the per-°F value × 1.8). */
export const STEEL_EXPANSION_PER_C = STEEL_EXPANSION_PER_F * 1.8;
/** Concrete, per °C (the per-°F value × 1.8). */
export const CONCRETE_EXPANSION_PER_C = CONCRETE_EXPANSION_PER_F * 1.8;

/**
 * Midspan thermal bow α·ΔT·L²/(8h).
 * @param alpha coefficient of thermal expansion per degree (same degree as `deltaT`).
 * @param deltaT temperature of the top flange minus the bottom flange, degrees; positive bows the
 * girder up (the hotter top lengthens).
 * @param spanLength L and @param depth h in the SAME length unit; the result is in that unit.
 * Valid for depth > 0 and small rotations (any realistic bridge).
 * @returns midspan rise, positive upward.
 */
export function thermalBow(alpha: number, deltaT: number, spanLength: number, depth: number): number {
  return (alpha * deltaT * spanLength * spanLength) / (8 * depth);
}

/**
 * Midspan thermal bow of a steel or concrete girder in inches, from span in feet and depth in
 * inches (the way a crew states them).
 * @param material 'steel' (6.5e-6 /°F) or 'concrete' (6.0e-6 /°F).
 * @param deltaTF top-minus-bottom temperature difference, °F.
 * @param spanFeet span, ft; @param depthInches girder depth, in (> 0).
 * @returns midspan rise in inches, positive upward.
 */
export function thermalBowInches(material: 'steel' | 'concrete', deltaTF: number, spanFeet: number, depthInches: number): number {
  const alpha = material === 'steel' ? STEEL_EXPANSION_PER_F : CONCRETE_EXPANSION_PER_F;
  return thermalBow(alpha, deltaTF, spanFeet * 12, depthInches);
}
