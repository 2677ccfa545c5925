import { edgeWidthStep } from './EdgeWidthStep';
import { kinkStep } from './KinkStep';
import { stringLineStep } from './StringLineStep';
import { thermalStep } from './ThermalStep';
import { aboveGradeStep } from './AboveGradeStep';
import { straightedgeStep } from './StraightedgeStep';
import type { Step } from './step-types';

/** The walkthrough's steps, in order. */
export const STEPS: Step[] = [edgeWidthStep, kinkStep, stringLineStep, thermalStep, aboveGradeStep, straightedgeStep];
export type { Step, StepControls } from './step-types';
export { SWEEP_DRAWN, THERMAL_DRAWN, SAG_DRAWN } from './step-types';
