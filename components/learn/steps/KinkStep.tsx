import type { Step } from './step-types';

/** Step 2: the brackets hang square to each span's girder, so the handrail turns a corner at every bent. */
export const kinkStep: Step = {
  title: 'Why the forms kink at every bent',
  view: 'edge',
  exaggeration: 8,
  Body: ({ n }) => (
    <>
      <p>
        Each span&apos;s brackets are fixed to that span&apos;s girder, square to it and all one length. At a bent two straight girders meet at an angle, so the bracket ends, the handrail posts and
        the rail turn a corner there. The line looks peaked even when every grade is right.
      </p>
      {n.layoutIsChord ? (
        <p>
          Here the exterior girder turns <strong className="tabular">{n.turn.toFixed(2)}°</strong> at each pier. Shorter spans on a tighter curve make the corner sharper but spread it over more bents;
          try the span and radius sliders and watch the rail. Heights are drawn ×8 so the corner shows; set the exaggeration slider to 1× to see it true to scale.
        </p>
      ) : (
        <p>Curved girders bend with the deck, so there is no corner at the piers. Switch to straight chords to see the kink.</p>
      )}
      <p>Do not fair the forms to &quot;fix&quot; the look: set every bracket to its own numbers.</p>
    </>
  ),
};
