'use client';

import { useFrame } from '@react-three/fiber';
import { useRef } from 'react';
import * as THREE from 'three';
import { screenTurnDeg } from '../builders/kink';
import { sceneStats, type KinkReport } from '../stats';

/** One interior bent on the viewed side: four scene points on each line, [far before, at, at, far after]. */
export interface KinkCandidate {
  bent: string;
  side: 'left' | 'right';
  rail: Float32Array;
  formEdge: Float32Array;
}

/** Reused objects of the frame loop (nothing is allocated per frame), kept in a ref. */
type Scratch = { v: THREE.Vector3; cam: THREE.Matrix4; proj: THREE.Matrix4; px: Float64Array; report: KinkReport | null };

const newScratch = (): Scratch => ({ v: new THREE.Vector3(), cam: new THREE.Matrix4(), proj: new THREE.Matrix4(), px: new Float64Array(8), report: null });

/**
 * Measures, whenever the camera moves, how sharply the handrail and the form edge turn at the
 * nearest interior bent in view, as drawn on the screen, and reports it in `window.__chordlineStats.kink`.
 */
export default function KinkProbe({ candidates }: { candidates: readonly KinkCandidate[] }) {
  const scratchRef = useRef<Scratch | null>(null);
  useFrame(({ camera, size }) => {
    const state = (scratchRef.current ??= newScratch());
    if (state.cam.equals(camera.matrixWorld) && state.proj.equals(camera.projectionMatrix)) return;
    state.cam.copy(camera.matrixWorld);
    state.proj.copy(camera.projectionMatrix);
    const v = state.v;
    let best = -1;
    let bestDepth = Infinity;
    for (let c = 0; c < candidates.length; c++) {
      const r = candidates[c].rail;
      v.set(r[3], r[4], r[5]);
      const depth = v.distanceTo(camera.position);
      v.applyMatrix4(camera.matrixWorldInverse);
      if (v.z >= 0) continue;
      v.applyMatrix4(camera.projectionMatrix);
      if (Math.abs(v.x) > 1 || Math.abs(v.y) > 1) continue;
      if (depth < bestDepth) {
        bestDepth = depth;
        best = c;
      }
    }
    const stats = sceneStats();
    if (best < 0) {
      stats.kink = null;
      return;
    }
    const cand = candidates[best];
    const angle = (pts: Float32Array) => {
      for (let k = 0; k < 4; k++) {
        v.set(pts[k * 3], pts[k * 3 + 1], pts[k * 3 + 2]).project(camera);
        state.px[k * 2] = ((v.x + 1) / 2) * size.width;
        state.px[k * 2 + 1] = ((1 - v.y) / 2) * size.height;
      }
      const p = state.px;
      return screenTurnDeg(p[0], p[1], p[2], p[3], p[4], p[5], p[6], p[7]);
    };
    const report = state.report ?? (state.report = { bent: '', side: 'left', railDeg: 0, formEdgeDeg: 0 });
    report.bent = cand.bent;
    report.side = cand.side;
    report.railDeg = angle(cand.rail);
    report.formEdgeDeg = angle(cand.formEdge);
    stats.kink = report;
  });
  return null;
}
