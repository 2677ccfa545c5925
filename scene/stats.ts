/**
 * What the 3D view reports about itself, for tests, outside checks and the benchmark: render
 * counters, the label boxes on screen, the corner angle of the rail at a bent as drawn, and the last
 * saved picture. One object per page at `window.__chordlineStats`; the label list is read from the
 * layout's buffers only when asked, so the render loop never builds it.
 */
import type { ScreenBox } from './builders/labels';

export interface LabelReport extends ScreenBox {
  text: string;
  kind: string;
}

export interface KinkReport {
  /** Bent name, its side, and the corner angles (degrees) of the lines as drawn on the screen. */
  bent: string;
  side: 'left' | 'right';
  /** Handrail on the bracket ends (fixed to the girder). */
  railDeg: number;
  /** The form's bottom outside edge at form target (follows the deck edge). */
  formEdgeDeg: number;
}

export interface PictureReport {
  width: number;
  height: number;
  sceneWidth: number;
  sceneHeight: number;
  caption: string;
  caution: string;
  fileName: string;
}

export interface SceneStats {
  /** Draw calls of the last frame (the shadow pass included when that frame drew the shadow map). */
  drawCalls: number;
  /** Most draw calls of any one frame so far: the shadow map is static, so this is the frame that redrew it. */
  peakDrawCalls: number;
  triangles: number;
  frames: number;
  shadows: boolean;
  /** performance.now() when the first frame was drawn (ms since the page started). */
  firstFrameMs: number | null;
  /** The last frame intervals (ms), a ring of `frameDeltas.length`; `frameDeltaCount` written so far. */
  frameDeltas: Float64Array;
  frameDeltaCount: number;
  /** CSS size of the picture (px). */
  width: number;
  height: number;
  readonly labels: LabelReport[];
  kink: KinkReport | null;
  picture: PictureReport | null;
  /** Set by the label layout: builds the label list from its buffers. */
  labelSource: (() => LabelReport[]) | null;
}

declare global {
  interface Window {
    __chordlineStats?: SceneStats;
  }
}

/** The page's stats object, made on first use (client only). */
export function sceneStats(): SceneStats {
  if (typeof window === 'undefined') throw new Error('sceneStats() is client-only');
  if (!window.__chordlineStats) {
    const s: SceneStats = {
      drawCalls: 0,
      peakDrawCalls: 0,
      triangles: 0,
      frames: 0,
      shadows: false,
      firstFrameMs: null,
      frameDeltas: new Float64Array(600),
      frameDeltaCount: 0,
      width: 0,
      height: 0,
      get labels() {
        return this.labelSource ? this.labelSource() : [];
      },
      kink: null,
      picture: null,
      labelSource: null,
    };
    window.__chordlineStats = s;
  }
  return window.__chordlineStats;
}
