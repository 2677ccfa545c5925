'use client';

import { useFrame, useThree } from '@react-three/fiber';
import { useEffect, useRef } from 'react';
import * as THREE from 'three';
import type { CameraPose } from '../cameras';

type Controls = { target: THREE.Vector3; update: () => void } | null;

/**
 * Moves the camera (and the orbit controls' target) to a pose over about a second, eased. A new
 * `version` starts a new move even to the same pose. Overview poses back away on viewports narrower
 * than they were framed for.
 */
export default function CameraRig({ pose, version, instant = false }: { pose: CameraPose; version: number; instant?: boolean }) {
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as unknown as Controls;
  const invalidate = useThree((s) => s.invalidate);
  const aspect = useThree((s) => s.size.width / Math.max(1, s.size.height));
  const anim = useRef({
    t: 1,
    fromPos: new THREE.Vector3(),
    fromTarget: new THREE.Vector3(),
    toPos: new THREE.Vector3(),
    toTarget: new THREE.Vector3(),
    target: new THREE.Vector3(),
  });
  const first = useRef(true);

  useEffect(() => {
    const a = anim.current;
    a.fromPos.copy(camera.position);
    a.fromTarget.copy(controls ? controls.target : a.target);
    a.toTarget.set(pose.target[0], pose.target[1], pose.target[2]);
    a.toPos.set(pose.position[0], pose.position[1], pose.position[2]);
    // An overview framed for a wider viewport backs away on a narrow one (a phone held upright).
    const back = pose.fitAspect ? Math.max(1, pose.fitAspect / aspect) : 1;
    if (back > 1) a.toPos.sub(a.toTarget).multiplyScalar(back).add(a.toTarget);
    a.t = instant || first.current ? 1 : 0;
    first.current = false;
    if (a.t === 1) {
      camera.position.copy(a.toPos);
      a.target.copy(a.toTarget);
      if (controls) {
        controls.target.copy(a.toTarget);
        controls.update();
      } else camera.lookAt(a.toTarget);
    }
    invalidate();
    // eslint-disable-next-line react-hooks/exhaustive-deps -- runs once per preset change (version); the pose is read from the ref at that moment
  }, [version, controls]);

  useFrame((_, delta) => {
    const a = anim.current;
    if (a.t >= 1) return;
    a.t = Math.min(1, a.t + delta / 1.0);
    const k = a.t < 0.5 ? 2 * a.t * a.t : 1 - Math.pow(-2 * a.t + 2, 2) / 2;
    camera.position.lerpVectors(a.fromPos, a.toPos, k);
    a.target.lerpVectors(a.fromTarget, a.toTarget, k);
    if (controls) {
      controls.target.copy(a.target);
      controls.update();
    } else camera.lookAt(a.target);
    invalidate();
  });
  return null;
}
