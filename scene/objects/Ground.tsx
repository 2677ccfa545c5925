'use client';

import { Grid } from '@react-three/drei';
import type { ThreeElements } from '@react-three/fiber';
import type { Units } from '@/lib/units';
import { groundGridSpacing } from './ground-grid';

type Props = ThreeElements['group'] & { y: number; units: Units; centre?: [number, number]; extent: number };

/**
 * The ground under the bridge at the bents' column feet: a plane that takes the sun's shadows and a
 * faint survey grid on it (squares of 10 ft or 5 m, a heavier line every 100 ft or 50 m).
 */
export default function Ground({ y, units, centre = [0, 0], extent, ...props }: Props) {
  const { cell, section } = groundGridSpacing(units);
  const size = Math.max(extent * 4, section * 10);
  // Grid lines snapped to whole sections so they keep their place when the bridge is re-framed.
  const gx = Math.round(centre[0] / section) * section;
  const gz = Math.round(centre[1] / section) * section;
  return (
    <group {...props}>
      <mesh position={[0, y, 0]} rotation={[-Math.PI / 2, 0, 0]} receiveShadow>
        <planeGeometry args={[40000, 40000]} />
        <meshStandardMaterial color="#aeb29b" roughness={1} />
      </mesh>
      <Grid
        position={[gx, y + 0.02 * cell, gz]}
        args={[size, size]}
        cellSize={cell}
        sectionSize={section}
        cellThickness={0.6}
        sectionThickness={1.1}
        cellColor="#8f937c"
        sectionColor="#6f735e"
        fadeDistance={size * 0.6}
        fadeStrength={1.5}
        side={2}
      />
    </group>
  );
}
