import { useSyncExternalStore } from 'react';

/** True when the browser can create a WebGL context (hardware or software). Client only. */
export function hasWebGL(): boolean {
  try {
    const canvas = document.createElement('canvas');
    const gl = canvas.getContext('webgl2') ?? canvas.getContext('webgl');
    if (!gl) return false;
    (gl as WebGLRenderingContext).getExtension('WEBGL_lose_context')?.loseContext();
    return true;
  } catch {
    return false;
  }
}

let webglAnswer: boolean | undefined;
const noSubscription = () => () => {};

/**
 * Whether this browser has WebGL: null while rendering on the server and during hydration, then the
 * answer (asked once per page load).
 */
export function useWebGL(): boolean | null {
  return useSyncExternalStore(
    noSubscription,
    () => (webglAnswer ??= hasWebGL()),
    () => null,
  );
}
