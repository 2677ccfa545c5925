'use client';

import { useEffect, useMemo } from 'react';
import * as THREE from 'three';
import type { ThreeElements } from '@react-three/fiber';

/** A geometry built once from a builder's arrays (normals computed here), disposed when replaced. */
export function useBufferGeometry(positions: Float32Array, indices?: Uint32Array, colors?: Float32Array): THREE.BufferGeometry {
  const geometry = useMemo(() => {
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(positions, 3));
    if (colors) g.setAttribute('color', new THREE.BufferAttribute(colors, 3));
    if (indices) {
      g.setIndex(new THREE.BufferAttribute(indices, 1));
      g.computeVertexNormals();
    }
    g.computeBoundingSphere();
    return g;
  }, [positions, indices, colors]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  return geometry;
}

type Props = ThreeElements['group'] & {
  positions: Float32Array;
  indices: Uint32Array;
  colors?: Float32Array;
  color?: string;
  roughness?: number;
  metalness?: number;
  /** Push the surface back in depth so lines and bands drawn on it win. */
  recessed?: boolean;
  /** Pull the surface forward in depth (bands lying on another surface). */
  raised?: boolean;
  /** Casts and takes the sun's shadow. */
  shadow?: boolean;
};

/** A lit, double-sided mesh from builder arrays. */
export default function BufferMesh({ positions, indices, colors, color = '#cccccc', roughness = 0.85, metalness = 0, recessed, raised, shadow = false, ...props }: Props) {
  const geometry = useBufferGeometry(positions, indices, colors);
  return (
    <group {...props}>
      <mesh geometry={geometry} castShadow={shadow} receiveShadow={shadow}>
        <meshStandardMaterial
          color={colors ? '#ffffff' : color}
          vertexColors={!!colors}
          roughness={roughness}
          metalness={metalness}
          side={THREE.DoubleSide}
          polygonOffset={!!(recessed || raised)}
          polygonOffsetFactor={recessed ? 1 : raised ? -1 : 0}
          polygonOffsetUnits={recessed ? 1 : raised ? -2 : 0}
        />
      </mesh>
    </group>
  );
}
