'use client';

import { useFrame } from '@react-three/fiber';
import { useEffect, useRef, type RefObject } from 'react';
import * as THREE from 'three';
import { labelBuffers, placeLabels, type ScreenBox } from '../builders/labels';
import { sceneStats, type LabelReport } from '../stats';

export interface SceneLabel {
  key: string;
  text: string;
  kind: 'bent' | 'station';
  /** Scene position of the anchor. */
  position: [number, number, number];
}

type Props = {
  labels: readonly SceneLabel[];
  /** The label elements, in the order of `labels` (rendered outside the canvas). */
  elementsRef: RefObject<Array<HTMLElement | null>>;
  /** Scene position of the picked point, kept clear of labels; null for none. */
  avoid: [number, number, number] | null;
  /** Changes whenever the labels' type size changes, so their boxes are measured again. */
  measureKey: string;
};

/** Half the side of the square kept clear around the picked point (px). */
const AVOID_HALF = 18;

/** What the frame loop keeps between frames (nothing is allocated per frame). */
type LayoutState = { v: THREE.Vector3; cam: THREE.Matrix4; proj: THREE.Matrix4; w: number; h: number; dirty: boolean; measured: boolean; avoidBox: ScreenBox };

const newLayoutState = (): LayoutState => ({
  v: new THREE.Vector3(),
  cam: new THREE.Matrix4(),
  proj: new THREE.Matrix4(),
  w: 0,
  h: 0,
  dirty: true,
  measured: false,
  avoidBox: { x: 0, y: 0, w: 0, h: 0 },
});

/**
 * Lays the labels out on the screen whenever the camera, the picture size or the labels change:
 * nearer labels win, bents before stations, and none covers the picked point (builders/labels.ts).
 * Positions are written straight to the label elements; nothing is allocated per frame.
 */
export default function LabelLayout({ labels, elementsRef, avoid, measureKey }: Props) {
  // The buffers (one set per list of labels) and the loop's state live in refs: the frame loop and the
  // effects write them, render never reads them.
  const bufRef = useRef<{ labels: readonly SceneLabel[]; buf: ReturnType<typeof labelBuffers> } | null>(null);
  const stateRef = useRef<LayoutState | null>(null);
  const avoidRef = useRef(avoid);
  useEffect(() => {
    avoidRef.current = avoid;
    (stateRef.current ??= newLayoutState()).dirty = true;
  }, [avoid]);
  useEffect(() => {
    const state = (stateRef.current ??= newLayoutState());
    state.measured = false;
    state.dirty = true;
    if (bufRef.current?.labels !== labels) bufRef.current = { labels, buf: labelBuffers(labels.length) };
    const buf = bufRef.current.buf;
    labels.forEach((l, i) => (buf.ranks[i] = l.kind === 'bent' ? 0 : 1));
  }, [labels, measureKey]);
  useEffect(() => {
    if (bufRef.current?.labels !== labels) bufRef.current = { labels, buf: labelBuffers(labels.length) };
    const buf = bufRef.current.buf;
    const stats = sceneStats();
    stats.labelSource = (): LabelReport[] => {
      const out: LabelReport[] = [];
      for (let i = 0; i < buf.count; i++) {
        if (!buf.shown[i]) continue;
        const o = i * 4;
        out.push({ text: labels[i]?.text ?? '', kind: labels[i]?.kind ?? '', x: buf.boxes[o], y: buf.boxes[o + 1], w: buf.boxes[o + 2], h: buf.boxes[o + 3] });
      }
      return out;
    };
    return () => {
      if (stats.labelSource) stats.labelSource = null;
    };
  }, [labels]);

  useFrame(({ camera, size, invalidate }) => {
    const els = elementsRef.current;
    const held = bufRef.current;
    if (!els || !held || held.labels !== labels) return;
    const buf = held.buf;
    const state = (stateRef.current ??= newLayoutState());
    if (!state.measured) {
      for (let i = 0; i < buf.count; i++) {
        const el = els[i];
        buf.sizes[i * 2] = el ? el.offsetWidth : 0;
        buf.sizes[i * 2 + 1] = el ? el.offsetHeight : 0;
      }
      state.measured = true;
      state.dirty = true;
    }
    const moved = !state.cam.equals(camera.matrixWorld) || !state.proj.equals(camera.projectionMatrix) || state.w !== size.width || state.h !== size.height;
    if (!moved && !state.dirty) return;
    state.cam.copy(camera.matrixWorld);
    state.proj.copy(camera.projectionMatrix);
    state.w = size.width;
    state.h = size.height;
    state.dirty = false;
    const v = state.v;
    for (let i = 0; i < buf.count; i++) {
      const p = labels[i].position;
      v.set(p[0], p[1], p[2]);
      const depth = v.distanceTo(camera.position);
      v.applyMatrix4(camera.matrixWorldInverse);
      const inFront = v.z < 0;
      v.applyMatrix4(camera.projectionMatrix);
      buf.anchors[i * 4] = ((v.x + 1) / 2) * size.width;
      buf.anchors[i * 4 + 1] = ((1 - v.y) / 2) * size.height;
      buf.anchors[i * 4 + 2] = depth;
      buf.anchors[i * 4 + 3] = inFront ? 1 : 0;
    }
    let avoidBox: ScreenBox | null = null;
    const a = avoidRef.current;
    if (a) {
      v.set(a[0], a[1], a[2]).project(camera);
      const b = state.avoidBox;
      b.x = ((v.x + 1) / 2) * size.width - AVOID_HALF;
      b.y = ((1 - v.y) / 2) * size.height - AVOID_HALF;
      b.w = AVOID_HALF * 2;
      b.h = AVOID_HALF * 2;
      avoidBox = b;
    }
    placeLabels(buf, size.width, size.height, avoidBox);
    for (let i = 0; i < buf.count; i++) {
      const el = els[i];
      if (!el) continue;
      if (buf.shown[i]) {
        el.style.transform = `translate(${buf.boxes[i * 4].toFixed(1)}px, ${buf.boxes[i * 4 + 1].toFixed(1)}px)`;
        el.style.visibility = 'visible';
      } else el.style.visibility = 'hidden';
    }
    invalidate();
  });
  return null;
}
