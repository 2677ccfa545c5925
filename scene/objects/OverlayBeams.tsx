'use client';

import { useMemo } from 'react';
import type { ThreeElements } from '@react-three/fiber';
import { writeBeamMatrix } from '../builders/instances';
import InstancedBoxes from './InstancedBoxes';

type Props = ThreeElements['group'] & { positions: Float32Array; color: string; size: number };

/** Line work that must read at any distance (a straightedge): each segment pair as a thin bar. */
export default function OverlayBeams({ positions, color, size, ...props }: Props) {
  const matrices = useMemo(() => {
    const n = Math.floor(positions.length / 6);
    const m = new Float32Array(n * 16);
    for (let i = 0; i < n; i++) {
      const o = i * 6;
      writeBeamMatrix(m, i, positions[o], positions[o + 1], positions[o + 2], positions[o + 3], positions[o + 4], positions[o + 5], size, size);
    }
    return m;
  }, [positions, size]);
  return <InstancedBoxes matrices={matrices} color={color} roughness={0.4} metalness={0} {...props} />;
}
