/**
 * Line work the straightedge step lays over the picture: the straightedge on the deck forms carried
 * out past the exterior girder (amber) and the form target it should have reached (green).
 */
import { sceneY, type SceneFrame } from '@/scene/builders/frame';
import type { SceneOverlay } from '@/scene/BridgeScene';
import type { Straightedge } from './walkthrough-numbers';

export function straightedgeOverlays(straight: Straightedge | null, frame: SceneFrame): SceneOverlay[] {
  if (!straight) return [];
  const { mid, inner, error, atEdge } = straight;
  // Lying on the forms: lifted by about its own thickness (true size) so it shows above them.
  const lift = 0.2;
  const p = (x: number, y: number, z: number) => [x - frame.originX, sceneY(frame, z) + lift, -(y - frame.originY)];
  const ex = mid.edge_x as number;
  const ey = mid.edge_y as number;
  const a = p(inner.x, inner.y, inner.bottom_of_slab);
  const b = p(mid.x, mid.y, mid.bottom_of_slab + error);
  const c = p(ex, ey, atEdge);
  const g = p(mid.x, mid.y, mid.bottom_of_slab);
  const f = p(ex, ey, mid.form_target as number);
  return [
    { positions: new Float32Array([...a, ...b, ...b, ...c]), color: '#d98e04' },
    { positions: new Float32Array([...g, ...f]), color: '#17695d' },
  ];
}
