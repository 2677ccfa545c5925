'use client';

import type { ThreeElements } from '@react-three/fiber';

/** The ground under the bridge: a large flat plane at the bents' column feet. */
export default function Ground({ y, ...props }: ThreeElements['group'] & { y: number }) {
  return (
    <group {...props}>
      <mesh position={[0, y, 0]} rotation={[-Math.PI / 2, 0, 0]}>
        <planeGeometry args={[4000, 4000]} />
        <meshStandardMaterial color="#b7b9a3" roughness={1} />
      </mesh>
    </group>
  );
}
