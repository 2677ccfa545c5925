'use client';

import { useFrame } from '@react-three/fiber';
import { useEffect, useRef, type RefObject } from 'react';
import { sceneStats } from '../stats';

/**
 * Keeps the overlay's data attributes and `window.__chordlineStats` current from the renderer's
 * counters: draw calls and triangles of the last frame (shadow pass included when that frame drew the
 * static shadow map), the most draw calls of any frame, and frames rendered so far. Writes
 * attributes only when a number changed.
 */
export default function RenderStats({ targetRef, shadows }: { targetRef?: RefObject<HTMLElement | null>; shadows: boolean }) {
  const last = useRef({ calls: -1, triangles: -1, frames: 0 });
  useEffect(() => {
    // A new scene on this page (client-side navigation keeps the stats object): its own peak.
    sceneStats().peakDrawCalls = 0;
  }, []);
  useFrame(({ gl, size }, delta) => {
    const s = last.current;
    s.frames += 1;
    const stats = sceneStats();
    if (stats.firstFrameMs === null) stats.firstFrameMs = performance.now();
    stats.frameDeltas[stats.frameDeltaCount % stats.frameDeltas.length] = delta * 1000;
    stats.frameDeltaCount += 1;
    // info.render holds the previous frame's totals here (it is reset when a frame starts).
    const calls = gl.info.render.calls;
    const triangles = gl.info.render.triangles;
    stats.drawCalls = calls;
    stats.peakDrawCalls = Math.max(stats.peakDrawCalls, calls);
    stats.triangles = triangles;
    stats.frames = s.frames;
    stats.shadows = shadows;
    stats.width = size.width;
    stats.height = size.height;
    const el = targetRef?.current;
    if (!el) return;
    if (calls !== s.calls) {
      s.calls = calls;
      el.setAttribute('data-draw-calls', String(calls));
    }
    if (triangles !== s.triangles) {
      s.triangles = triangles;
      el.setAttribute('data-triangles', String(triangles));
    }
    el.setAttribute('data-frames', String(s.frames));
    // The visible text is refreshed now and then; the attributes above are the exact figures.
    if (s.frames % 10 === 3) el.replaceChildren(`${calls} draw calls · ${triangles} triangles · ${s.frames} frames${shadows ? ' · shadows' : ''}`);
  });
  return null;
}
