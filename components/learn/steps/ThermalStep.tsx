import { formatFeetInches } from '@/lib/geometry';
import { SANDBOX_GIRDER_DEPTH_IN } from '@/lib/scene-data/sandbox';
import Slider from '../Slider';
import { ft, inches } from '../walkthrough-numbers';
import { THERMAL_DRAWN, type Step } from './step-types';

/** Step 4: the sun bows a steel girder up; readings from the girder top move with it. */
export const thermalStep: Step = {
  title: 'Why absolute elevations drift with the sun',
  view: 'side',
  exaggeration: 1,
  thermal: true,
  Body: ({ n, c }) => (
    <>
      <p>The sun warms the top flange of a steel girder more than the bottom, and the girder bows up. Rise at midspan = α × ΔT × L² ÷ (8 × depth), with α = 6.5 × 10⁻⁶ per °F for steel.</p>
      <Slider label="Top flange warmer than bottom by" value={c.deltaT} text={`${c.deltaT} °F`} min={0} max={40} step={1} onChange={c.setDeltaT} />
      <p>
        For this {ft(n.built.spanLength)} span on a {SANDBOX_GIRDER_DEPTH_IN} in steel girder that is <strong className="tabular">{inches(n.bowIn)}</strong> (
        <span className="tabular">{formatFeetInches(n.bowIn / 12)}</span>). A form set in the cool morning to an elevation from the table is off by that much by afternoon. A reading from the top of
        the girder — the drop from girder top — moves with the girder and stays right. In the picture the girders and brackets rise ({THERMAL_DRAWN}× drawn) while the white form-target line, an
        absolute elevation, stays put.
      </p>
    </>
  ),
};
