import { formatLength } from '@/lib/geometry';
import { ft, inches } from '../walkthrough-numbers';
import type { Step } from './step-types';

/** Step 6: carrying the deck forms' grade out with a straightedge magnifies any error at the edge. */
export const straightedgeStep: Step = {
  title: 'Never extend the deck forms with a straightedge',
  view: 'section',
  span: 1,
  exaggeration: 5,
  straightedge: true,
  noDeck: true,
  Body: ({ n }) => (
    <>
      <p>
        An old habit: lay a straightedge on the deck forms and carry their grade out to set the overhang. Any error in the deck forms grows on the way out, and the overhang is not on that grade anyway
        — the slab changes thickness to the edge and is level under the barrier.
      </p>
      {n.straight ? (
        <p>
          With the deck form just 1/4 in high at the exterior girder and the next girder {ft(n.straight.bay)} in, the error at the edge is already{' '}
          <strong className="tabular">{inches(n.straight.magnified * 12)}</strong>, and the straightedge (amber bar) puts the form edge at{' '}
          <strong className="tabular">{formatLength(n.straight.atEdge, 'ft')}</strong> where the table says <strong className="tabular">{formatLength(n.straight.target, 'ft')}</strong> (green bar):
          off by <strong className="tabular">{inches(Math.abs(n.straight.atEdge - n.straight.target) * 12)}</strong>. Always go back to the girder: the buildup and the drop from girder top.
          (Elevations drawn 5×, the slab left off so the forms show.)
        </p>
      ) : null}
    </>
  ),
};
