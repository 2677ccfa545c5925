import { ft, inches } from '../walkthrough-numbers';
import { SWEEP_DRAWN, type Step } from './step-types';

/** Step 3: measure from a string line between the girder-end centres, not from the swept girder. */
export const stringLineStep: Step = {
  title: 'Measure from a string line, not the girder',
  view: 'string',
  span: 1,
  exaggeration: 1,
  sweep: true,
  noDeck: true,
  Body: ({ n }) => (
    <>
      <p>
        Long concrete girders are never perfectly straight: they bow sideways (sweep). A common limit is about 1/8 in per 10 ft of length (from memory of precast tolerances) — for this{' '}
        <span className="tabular">{ft(n.girderLength)}</span> girder up to <strong className="tabular">{inches(n.sweepLimitIn)}</strong>.
      </p>
      <p>
        The edge widths are measured from the girder&apos;s straight centreline between its end centres. Stretch a <strong>string line</strong> (red) between the centres of the girder ends and measure
        from the string. Measuring from the bowed girder would copy the bow into the deck edge. The bow here is drawn {SWEEP_DRAWN}× its size so you can see it.
      </p>
    </>
  ),
};
