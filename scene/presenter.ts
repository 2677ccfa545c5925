'use client';
/**
 * Presenter mode for a projector or a tablet held up to a crew: the element fills the screen
 * (the browser's full screen when it allows it, else the window), type grows, and the arrow keys
 * step through views. Escape or leaving full screen ends it.
 */
import { useCallback, useEffect, useRef, useState, type RefObject } from 'react';

export function usePresenter(target: RefObject<HTMLElement | null>) {
  const [presenting, setPresenting] = useState(false);
  const start = useCallback(() => {
    setPresenting(true);
    const el = target.current;
    if (el && document.fullscreenEnabled && !document.fullscreenElement) el.requestFullscreen?.().catch(() => undefined);
  }, [target]);
  const stop = useCallback(() => {
    setPresenting(false);
    if (document.fullscreenElement) document.exitFullscreen?.().catch(() => undefined);
  }, []);
  useEffect(() => {
    if (!presenting) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') stop();
    };
    const onFull = () => {
      if (!document.fullscreenElement) setPresenting(false);
    };
    window.addEventListener('keydown', onKey);
    document.addEventListener('fullscreenchange', onFull);
    return () => {
      window.removeEventListener('keydown', onKey);
      document.removeEventListener('fullscreenchange', onFull);
    };
  }, [presenting, stop]);
  return { presenting, start, stop };
}

/**
 * Calls `onStep(+1 | −1)` for the right and left arrow keys pressed anywhere on the page, except
 * while a slider, a field or a list has the keys for itself.
 */
export function useArrowSteps(onStep: (delta: 1 | -1) => void) {
  const ref = useRef(onStep);
  useEffect(() => {
    ref.current = onStep;
  });
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.defaultPrevented || e.altKey || e.ctrlKey || e.metaKey || e.shiftKey) return;
      const t = e.target as HTMLElement | null;
      if (t && (t.isContentEditable || ['INPUT', 'SELECT', 'TEXTAREA'].includes(t.tagName))) return;
      if (e.key === 'ArrowRight' || e.key === 'ArrowLeft') {
        e.preventDefault();
        ref.current(e.key === 'ArrowRight' ? 1 : -1);
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
