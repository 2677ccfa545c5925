'use client';

import { useMemo, useRef } from 'react';
import * as THREE from 'three';
import { useFrame, type ThreeElements } from '@react-three/fiber';

type Props = ThreeElements['group'] & { radius: number; zenith?: string; horizon?: string; ground?: string };

const VERTEX = /* glsl */ `
  varying vec3 vDir;
  void main() {
    vDir = normalize(position);
    gl_Position = projectionMatrix * modelViewMatrix * vec4(position, 1.0);
  }
`;
const FRAGMENT = /* glsl */ `
  uniform vec3 zenith;
  uniform vec3 horizon;
  uniform vec3 ground;
  varying vec3 vDir;
  void main() {
    float h = vDir.y;
    vec3 sky = mix(horizon, zenith, pow(clamp(h, 0.0, 1.0), 0.55));
    vec3 below = mix(horizon, ground, clamp(-h * 6.0, 0.0, 1.0));
    gl_FragColor = vec4(h >= 0.0 ? sky : below, 1.0);
    #include <colorspace_fragment>
  }
`;

/**
 * A sky gradient (pale at the horizon, deeper blue overhead) on a sphere that travels with the
 * camera, drawn behind everything in one draw call; it casts and takes no shadow.
 */
export default function SkyDome({ radius, zenith = '#7fa6c9', horizon = '#e4ebee', ground = '#c9c6b8', ...props }: Props) {
  const ref = useRef<THREE.Mesh>(null);
  const material = useMemo(
    () =>
      new THREE.ShaderMaterial({
        vertexShader: VERTEX,
        fragmentShader: FRAGMENT,
        uniforms: { zenith: { value: new THREE.Color(zenith) }, horizon: { value: new THREE.Color(horizon) }, ground: { value: new THREE.Color(ground) } },
        side: THREE.BackSide,
        depthWrite: false,
        depthTest: false,
      }),
    [zenith, horizon, ground],
  );
  useFrame(({ camera }) => {
    ref.current?.position.copy(camera.position);
  });
  return (
    <group {...props}>
      <mesh ref={ref} material={material} renderOrder={-1000} frustumCulled={false}>
        <sphereGeometry args={[radius, 24, 12]} />
      </mesh>
    </group>
  );
}
