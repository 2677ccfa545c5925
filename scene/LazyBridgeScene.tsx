'use client';

import dynamic from 'next/dynamic';
import type { ReactNode } from 'react';
import type { BridgeSceneProps } from './BridgeScene';
import { useWebGL } from './webgl';
import SceneErrorBoundary from './SceneErrorBoundary';

// three.js loads only where a scene is drawn, and only in the browser.
const BridgeScene = dynamic(() => import('./BridgeScene'), {
  ssr: false,
  loading: () => (
    <div className="flex h-full items-center justify-center text-concrete-600" role="status">
      Loading the 3D view…
    </div>
  ),
});

/** The scene, or `fallback` when the browser has no WebGL or the scene fails to start. */
export default function LazyBridgeScene({ fallback, ...props }: BridgeSceneProps & { fallback: ReactNode }) {
  const webgl = useWebGL();
  if (webgl === null) return null;
  if (!webgl) return <>{fallback}</>;
  return (
    <SceneErrorBoundary fallback={fallback}>
      <BridgeScene {...props} />
    </SceneErrorBoundary>
  );
}
