import { ft, SPAN } from '../walkthrough-numbers';
import type { Step } from './step-types';

/** Step 1: where the edge width changes along a span of straight girders under a curved deck, and why. */
export const edgeWidthStep: Step = {
  title: 'Where the edge width changes, and why',
  view: 'span',
  exaggeration: 1,
  Body: ({ n }) => (
    <>
      <p>
        Precast girders are straight from bent to bent. The deck edge follows the curve. So the distance from the girder to the edge — the <strong>edge width</strong> — changes along every span.
      </p>
      {n.layoutIsChord && n.outside && n.inside ? (
        <p>
          In span {SPAN} of this bridge the outside overhang runs from <strong className="tabular">{ft(n.outside.min_edge_width)}</strong> at the bents to{' '}
          <strong className="tabular">{ft(n.outside.max_edge_width)}</strong> at midspan
          {Math.abs(n.outside.min_edge_width - n.built.overhang) >= 0.005
            ? ` (at the bents a touch more than the ${ft(n.built.overhang)} set there: the width is measured square to the girder, which meets the bent at a slight angle to the curve)`
            : ''}
          ; the inside one from <strong className="tabular">{ft(n.inside.max_edge_width)}</strong> down to <strong className="tabular">{ft(n.inside.min_edge_width)}</strong>. The swing is about the
          chord&apos;s middle ordinate, span² ÷ (8 × radius) = <span className="tabular">{ft(n.chordOrdinate)}</span>. Tighter curves and longer spans swing more.
        </p>
      ) : (
        <p>With curved girders the girder follows the curve too, so the edge width stays the same all along. Switch the girders back to straight chords to see it change.</p>
      )}
      <p>The colour along the edge shows the width: the legend gives it in feet.</p>
    </>
  ),
};
