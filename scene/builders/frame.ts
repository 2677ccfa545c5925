/**
 * Scene coordinates. three.js is y-up and works in float32, while bridge coordinates are state-plane
 * sized (easting/northing in the thousands or millions) — so the scene puts its origin near the
 * bridge before anything reaches the GPU:
 *
 *   scene x = easting − originX                         (east)
 *   scene y = (elevation − refElevation) × exaggeration (up)
 *   scene z = −(northing − originY)                     (south; so north is −z, the three.js "forward")
 *
 * Lengths stay in the bridge's unit (ft or m). Vertical exaggeration scales only elevations the engine
 * computes (top of deck, bottom of slab, form target, ...) about `refElevation`; parts of fixed size
 * hung off them (girder depth, bracket arms, handrail posts, bent caps) are drawn true size, so a
 * 10× view still shows a 6 ft girder as 6 ft.
 */
import type { OffsetTable } from '@/lib/geometry';

export interface SceneFrame {
  /** Easting subtracted from every x (bridge units). */
  originX: number;
  /** Northing subtracted from every y (bridge units). */
  originY: number;
  /** Elevation that maps to scene y = 0 (bridge units). */
  refElevation: number;
  /** Vertical exaggeration, 1 = true scale. */
  exaggeration: number;
}

/**
 * A frame centred on the bridge: origin at the middle of the girder points' plan extent and the
 * reference elevation at the lowest bottom of slab (both rounded to whole units so that readings
 * near the origin stay exact in float32).
 * @param exaggeration vertical exaggeration ≥ 1 (clamped to 1..50).
 */
export function frameForTable(table: Pick<OffsetTable, 'points'>, exaggeration = 1): SceneFrame {
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  let minZ = Infinity;
  for (const p of table.points) {
    if (p.x < minX) minX = p.x;
    if (p.x > maxX) maxX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.y > maxY) maxY = p.y;
    if (p.bottom_of_slab < minZ) minZ = p.bottom_of_slab;
  }
  if (!Number.isFinite(minX)) return { originX: 0, originY: 0, refElevation: 0, exaggeration: clampExaggeration(exaggeration) };
  return {
    originX: Math.round((minX + maxX) / 2),
    originY: Math.round((minY + maxY) / 2),
    refElevation: Math.floor(minZ),
    exaggeration: clampExaggeration(exaggeration),
  };
}

/** Vertical exaggeration limited to the 1×–50× the view offers. */
export function clampExaggeration(e: number): number {
  if (!Number.isFinite(e)) return 1;
  return Math.min(50, Math.max(1, e));
}

/** Scene x of an easting. */
export function sceneX(f: SceneFrame, easting: number): number {
  return easting - f.originX;
}
/** Scene y of an elevation (exaggerated about the reference elevation). */
export function sceneY(f: SceneFrame, elevation: number): number {
  return (elevation - f.refElevation) * f.exaggeration;
}
/** Scene z of a northing (north is −z). */
export function sceneZ(f: SceneFrame, northing: number): number {
  return -(northing - f.originY);
}

/** Writes the scene position of (easting, northing, elevation) into `out` at `i` (3 floats). */
export function writeScenePoint(f: SceneFrame, easting: number, northing: number, elevation: number, out: Float32Array | number[], i: number): void {
  out[i] = easting - f.originX;
  out[i + 1] = (elevation - f.refElevation) * f.exaggeration;
  out[i + 2] = -(northing - f.originY);
}

/** Inverse of the transform: bridge (easting, northing, elevation) of a scene point. */
export function bridgePoint(f: SceneFrame, x: number, y: number, z: number): { easting: number; northing: number; elevation: number } {
  return { easting: x + f.originX, northing: f.originY - z, elevation: y / f.exaggeration + f.refElevation };
}
