'use client';

import type { ThreeElements } from '@react-three/fiber';
import { useBufferGeometry } from './BufferMesh';

type Props = ThreeElements['group'] & { positions: Float32Array; color: string; opacity?: number };

/** Line segments (pairs of points) from a builder, one draw call. */
export default function Segments({ positions, color, opacity = 1, ...props }: Props) {
  const geometry = useBufferGeometry(positions);
  return (
    <group {...props}>
      <lineSegments geometry={geometry}>
        <lineBasicMaterial color={color} transparent={opacity < 1} opacity={opacity} />
      </lineSegments>
    </group>
  );
}
