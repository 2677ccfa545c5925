/** Shared setup of the scene builder tests: the fixture bridge, its engine table and the frame transform worked out by hand. */
import { expect } from 'vitest';
import { computeOffsetTable, createBridgeModel, type OffsetPoint } from '@/lib/geometry';
import { fixtureBridge } from './fixture';
import type { SceneFrame } from '@/scene/builders/frame';

export const desc = fixtureBridge('chord');
export const table = computeOffsetTable(desc);
export const model = createBridgeModel(desc);
// float32 keeps ~7 significant digits; scene coordinates stay under ~1000 units here.
export const TOL = 2e-3;

export function expected(f: SceneFrame, e: number, n: number, z: number): [number, number, number] {
  return [e - f.originX, (z - f.refElevation) * f.exaggeration, -(n - f.originY)];
}

export function expectNear(actual: ArrayLike<number>, at: number, want: [number, number, number], tol = TOL) {
  for (let k = 0; k < 3; k++) expect(Math.abs(actual[at + k] - want[k])).toBeLessThan(tol);
}

export const exteriorRows = (side: 'left' | 'right', span: number): OffsetPoint[] => table.points.filter((p) => p.side === side && p.span === span).sort((a, b) => a.point - b.point);
