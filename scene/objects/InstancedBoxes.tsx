'use client';

import { useLayoutEffect, useRef } from 'react';
import * as THREE from 'three';
import type { ThreeElements } from '@react-three/fiber';

type Props = ThreeElements['group'] & { matrices: Float32Array; color: string; roughness?: number; metalness?: number; shadow?: boolean };

const unitBox = new THREE.BoxGeometry(1, 1, 1);

/**
 * Many boxes in one draw call: the unit cube placed by each instance matrix (see
 * builders/instances.ts). The matrices are copied in once per change of the array.
 */
export default function InstancedBoxes({ matrices, color, roughness = 0.6, metalness = 0.2, shadow = false, ...props }: Props) {
  const ref = useRef<THREE.InstancedMesh>(null);
  const count = matrices.length / 16;
  useLayoutEffect(() => {
    const mesh = ref.current;
    if (!mesh) return;
    (mesh.instanceMatrix.array as Float32Array).set(matrices);
    mesh.instanceMatrix.needsUpdate = true;
    mesh.computeBoundingSphere();
  }, [matrices]);
  if (count === 0) return null;
  return (
    <group {...props}>
      <instancedMesh key={count} ref={ref} args={[unitBox, undefined, count]} frustumCulled={false} castShadow={shadow} receiveShadow={shadow}>
        <meshStandardMaterial color={color} roughness={roughness} metalness={metalness} />
      </instancedMesh>
    </group>
  );
}
