import { formatLength } from '@/lib/geometry';
import Slider from '../Slider';
import { inches, SPAN } from '../walkthrough-numbers';
import { SAG_DRAWN, type Step } from './step-types';

/** Step 5: the girders sag under the wet deck, so the forms and the screed are set above grade by the plans' deflection. */
export const aboveGradeStep: Step = {
  title: 'Why the forms are set above grade',
  view: 'side',
  exaggeration: 1,
  noDeck: false,
  pour: true,
  Body: ({ n, c }) => {
    const m = n.midspan;
    const d = m?.deflection ?? 0;
    return (
      <>
        <p>
          The girders carry the wet deck concrete only once it is placed, and they sag under it. The plans give that dead-load deflection at the tenth points; the forms and the screed are set{' '}
          <strong>high</strong> by it before the pour, so that the girders, the forms and the finished deck come down to grade together.
        </p>
        {m && m.form_target !== null && m.edge_bottom !== null ? (
          <p>
            At midspan of span {SPAN} the outside girder will still come down <strong className="tabular">{inches(d * 12)}</strong>. So the form edge is set at{' '}
            <strong className="tabular">{formatLength(m.form_target, 'ft')}</strong>: the edge bottom {formatLength(m.edge_bottom, 'ft')}, plus the form settlement, plus that deflection; and the
            screed over the girder strikes <strong className="tabular">{formatLength(m.screed_grade ?? m.top_of_deck + d, 'ft')}</strong> where the finished deck will be{' '}
            {formatLength(m.top_of_deck, 'ft')}.
          </p>
        ) : null}
        <Slider
          label="Deck poured"
          value={c.pour}
          text={c.pour === 0 ? 'not yet (forms set)' : c.pour === 1 ? 'all of it' : `${Math.round(c.pour * 100)} %`}
          min={0}
          max={1}
          step={0.05}
          onChange={c.setPour}
        />
        <div className="flex flex-wrap items-center gap-2 text-sm">
          <span>Sag drawn {c.sagDrawn > 1 ? `${c.sagDrawn}× its size, so you can see it` : 'true to scale'}.</span>
          <button type="button" className="btn-secondary" onClick={() => c.setSagDrawn(c.sagDrawn > 1 ? 1 : SAG_DRAWN)}>
            {c.sagDrawn > 1 ? 'Show it true to scale' : `Magnify it ${SAG_DRAWN}×`}
          </button>
        </div>
        <p>
          Move the slider: the girders, the brackets and the form edge ride down together. Check targets that include deflection against the plans&apos; table; a form set to the finished grade ends
          low by exactly the sag.
        </p>
      </>
    );
  },
};
