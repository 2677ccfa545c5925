'use client';

import { useLayoutEffect, useMemo, useRef } from 'react';
import * as THREE from 'three';
import type { ThreeElements, ThreeEvent } from '@react-three/fiber';

type Props = ThreeElements['group'] & {
  /** Scene positions of the pickable girder points, 3 floats each. */
  positions: Float32Array;
  radius: number;
  selected: number | null;
  onPick: (index: number) => void;
};

const sphere = new THREE.SphereGeometry(1, 12, 8);

/** Clickable markers on the exterior girders' points (instanced) and a ring on the chosen one. */
export default function GirderPoints({ positions, radius, selected, onPick, ...props }: Props) {
  const ref = useRef<THREE.InstancedMesh>(null);
  const count = positions.length / 3;
  const matrices = useMemo(() => {
    const m = new Float32Array(count * 16);
    for (let i = 0; i < count; i++) {
      const o = i * 16;
      m[o] = radius;
      m[o + 5] = radius;
      m[o + 10] = radius;
      m[o + 15] = 1;
      m[o + 12] = positions[i * 3];
      m[o + 13] = positions[i * 3 + 1] + radius * 0.5;
      m[o + 14] = positions[i * 3 + 2];
    }
    return m;
  }, [positions, radius, count]);
  useLayoutEffect(() => {
    const mesh = ref.current;
    if (!mesh) return;
    (mesh.instanceMatrix.array as Float32Array).set(matrices);
    mesh.instanceMatrix.needsUpdate = true;
    mesh.computeBoundingSphere();
  }, [matrices]);
  const onClick = (e: ThreeEvent<MouseEvent>) => {
    if (e.instanceId === undefined) return;
    e.stopPropagation();
    onPick(e.instanceId);
  };
  const s = selected !== null && selected < count ? selected : null;
  return (
    <group {...props}>
      {count > 0 ? (
        <instancedMesh
          key={count}
          ref={ref}
          args={[sphere, undefined, count]}
          frustumCulled={false}
          onClick={onClick}
          onPointerOver={() => (document.body.style.cursor = 'pointer')}
          onPointerOut={() => (document.body.style.cursor = '')}
        >
          <meshStandardMaterial color="#24221f" roughness={0.5} />
        </instancedMesh>
      ) : null}
      {s !== null ? (
        <mesh position={[positions[s * 3], positions[s * 3 + 1] + radius * 0.5, positions[s * 3 + 2]]} scale={radius * 2.2} geometry={sphere}>
          <meshStandardMaterial color="#d98e04" emissive="#d98e04" emissiveIntensity={0.5} />
        </mesh>
      ) : null}
    </group>
  );
}
