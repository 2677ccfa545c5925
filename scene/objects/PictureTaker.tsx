'use client';

import { useThree } from '@react-three/fiber';
import { useEffect, type RefObject } from 'react';

/** Draws the scene at `scale` times the picture's size and hands back a canvas holding it. */
export type PictureFn = (scale: number) => HTMLCanvasElement;

/**
 * Lends the page a way to draw the scene larger than the screen: the drawing buffer is resized
 * for one render (the page's layout does not change), copied out, and put back.
 */
export default function PictureTaker({ targetRef }: { targetRef: RefObject<PictureFn | null> }) {
  const gl = useThree((s) => s.gl);
  const scene = useThree((s) => s.scene);
  const camera = useThree((s) => s.camera);
  const size = useThree((s) => s.size);
  const invalidate = useThree((s) => s.invalidate);
  useEffect(() => {
    targetRef.current = (scale: number) => {
      const ratio = gl.getPixelRatio();
      const w = Math.round(size.width * scale);
      const h = Math.round(size.height * scale);
      gl.setPixelRatio(1);
      gl.setSize(w, h, false);
      gl.render(scene, camera);
      const out = document.createElement('canvas');
      out.width = w;
      out.height = h;
      out.getContext('2d')!.drawImage(gl.domElement, 0, 0, w, h);
      gl.setPixelRatio(ratio);
      gl.setSize(size.width, size.height, false);
      invalidate();
      return out;
    };
    return () => {
      targetRef.current = null;
    };
  }, [gl, scene, camera, size, invalidate, targetRef]);
  return null;
}
