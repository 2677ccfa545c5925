'use client';

import dynamic from 'next/dynamic';
import type { BridgeViewerProps } from './BridgeViewer';
import { useWebGL } from './webgl';
import NoWebGL from './NoWebGL';
import SceneErrorBoundary from './SceneErrorBoundary';

function Loading() {
  return (
    <div className="flex h-[62vh] min-h-[420px] items-center justify-center rounded-lg border border-concrete-300 bg-concrete-100 text-concrete-600" role="status">
      Loading the 3D view…
    </div>
  );
}

// three.js and the scene load only on the routes that render this, and only in the browser.
const BridgeViewer = dynamic(() => import('./BridgeViewer'), { ssr: false, loading: Loading });

/** The bridge's 3D view, or a plain message with a way to the numbers when there is no WebGL. */
export default function LazyBridgeViewer(props: BridgeViewerProps & { offsetsHref: string }) {
  const webgl = useWebGL();
  if (webgl === null) return <Loading />;
  const fallback = <NoWebGL offsetsHref={props.offsetsHref} />;
  if (!webgl) return fallback;
  return (
    <SceneErrorBoundary fallback={fallback}>
      <BridgeViewer {...props} />
    </SceneErrorBoundary>
  );
}
