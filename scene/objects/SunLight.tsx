'use client';

import { useEffect, useLayoutEffect, useRef } from 'react';
import * as THREE from 'three';
import { useThree, type ThreeElements } from '@react-three/fiber';

type Props = ThreeElements['group'] & {
  /** Scene point the sun shines on (the bridge's middle). */
  target: [number, number, number];
  /** Half the size of the area that gets shadows (scene units). */
  reach: number;
  shadows: boolean;
  /**
   * What casts and takes the shadows (geometry arrays, toggles): the shadow map is static (the
   * Canvas turns the renderer's `shadowMap.autoUpdate` off) and is drawn again only when one of
   * these, the sun's framing or the shadows toggle changes, never because the camera moved.
   */
  casters: readonly unknown[];
};

/**
 * The renderer's shadow settings for the Canvas `shadows` prop: a variance shadow map (VSM), drawn
 * on request only. Its softening blur is paid when the map is drawn (once per change of the scene);
 * while the camera moves each pixel reads the map once, where filtered (PCF) shadows read it five
 * times, which in software WebGL made a frame cost 1.6-1.7x the frame without shadows.
 */
export const STATIC_SHADOWS = { enabled: true, type: THREE.VSMShadowMap, autoUpdate: false } as const;

/** Sun direction: from the south-east, high in the sky (unit vector, scene axes: x east, y up, z south). */
const SUN = new THREE.Vector3(0.45, 0.8, 0.4).normalize();

/**
 * One sun-like directional light with soft (blurred variance) shadows framed on the bridge, a sky/ground
 * fill so shaded sides stay readable, and a weak back light. The sun's shadow map does not depend
 * on the camera, so it is drawn once per change of the scene (see `casters`) instead of every frame.
 */
export default function SunLight({ target, reach, shadows, casters, ...props }: Props) {
  const light = useRef<THREE.DirectionalLight>(null);
  const get = useThree((s) => s.get);
  useEffect(() => {
    // Runs after the meshes and instance matrices of this change are in place; the next frame draws the map.
    const { gl, invalidate } = get();
    gl.shadowMap.needsUpdate = true;
    invalidate();
  }, [get, target, reach, shadows, casters]);
  useLayoutEffect(() => {
    const l = light.current;
    if (!l) return;
    const d = reach * 2;
    l.position.set(target[0] + SUN.x * d, target[1] + SUN.y * d, target[2] + SUN.z * d);
    l.target.position.set(target[0], target[1], target[2]);
    l.target.updateMatrixWorld();
    const cam = l.shadow.camera;
    cam.left = -reach;
    cam.right = reach;
    cam.top = reach;
    cam.bottom = -reach;
    cam.near = 1;
    cam.far = d * 2.5;
    cam.updateProjectionMatrix();
    l.shadow.needsUpdate = true;
  }, [target, reach]);
  return (
    <group {...props}>
      <hemisphereLight args={['#f1f4f6', '#7a7462', 0.75]} />
      <directionalLight
        ref={light}
        intensity={2.1}
        color="#fff6e8"
        castShadow={shadows}
        shadow-mapSize={[2048, 2048]}
        shadow-radius={4}
        shadow-blurSamples={12}
        shadow-bias={-0.0004}
        shadow-normalBias={(0.02 * reach) / 100}
      />
      <directionalLight position={[-200, 120, -300]} intensity={0.3} />
    </group>
  );
}
