'use client';

import { useLayoutEffect, useRef } from 'react';
import * as THREE from 'three';
import type { ThreeElements } from '@react-three/fiber';

type Props = ThreeElements['group'] & {
  /** Scene point the sun shines on (the bridge's middle). */
  target: [number, number, number];
  /** Half the size of the area that gets shadows (scene units). */
  reach: number;
  shadows: boolean;
};

/** Sun direction: from the south-east, high in the sky (unit vector, scene axes: x east, y up, z south). */
const SUN = new THREE.Vector3(0.45, 0.8, 0.4).normalize();

/**
 * One sun-like directional light with soft (filtered) shadows framed on the bridge, a sky/ground
 * fill so shaded sides stay readable, and a weak back light.
 */
export default function SunLight({ target, reach, shadows, ...props }: Props) {
  const light = useRef<THREE.DirectionalLight>(null);
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
