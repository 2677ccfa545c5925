import type { ReactNode } from 'react';
import type { ViewName } from '@/scene/cameras';
import type { StepNumbers } from '../walkthrough-numbers';

/** What a step's words can change in the picture. */
export interface StepControls {
  deltaT: number;
  setDeltaT: (v: number) => void;
  /** 0 = forms set, before the pour; 1 = after it. */
  pour: number;
  setPour: (v: number) => void;
  /** Drawn size of the deflection: magnified first, then true. */
  sagDrawn: number;
  setSagDrawn: (v: number) => void;
}

/** One step of the walkthrough: where the camera goes, what the picture shows, and its words. */
export interface Step {
  title: string;
  view: ViewName;
  /** Span the camera looks at (default: the walkthrough's middle span). */
  span?: number;
  exaggeration: number;
  sweep?: boolean;
  thermal?: boolean;
  straightedge?: boolean;
  /** Hide the slab: the forms and girders as the crew sees them before the pour. */
  noDeck?: boolean;
  /** Drives the pour state of the picture from the step's controls. */
  pour?: boolean;
  Body: (props: { n: StepNumbers; c: StepControls }) => ReactNode;
}

/** Drawn-size factors for effects too small to see true size. */
export const SWEEP_DRAWN = 12;
export const THERMAL_DRAWN = 100;
/** The sag is first drawn this many times its size, then true. */
export const SAG_DRAWN = 20;
