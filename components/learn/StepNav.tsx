'use client';

import type { ReactNode } from 'react';
import type { Step } from './steps';

type Props = {
  steps: readonly Step[];
  index: number;
  go: (i: number) => void;
  big: boolean;
  presenting: boolean;
  onPresent: () => void;
  showControls: boolean;
  onShowControls: () => void;
  /** Shown above the words when the picture is of an older deck. */
  stale: ReactNode;
  children: ReactNode;
};

/** The step's card: the numbered steps, the title, the words, Back / Next and presenter mode. */
export default function StepNav({ steps, index, go, big, presenting, onPresent, showControls, onShowControls, stale, children }: Props) {
  const step = steps[index];
  return (
    <section aria-labelledby="step-title" className={`card min-w-0 space-y-3 p-4 ${big ? 'text-lg' : ''}`} data-testid="walkthrough-step">
      <ol className="flex flex-wrap gap-2" aria-label="Steps">
        {steps.map((s, i) => (
          <li key={s.title}>
            <button
              type="button"
              onClick={() => go(i)}
              aria-current={i === index ? 'step' : undefined}
              aria-label={`Step ${i + 1}: ${s.title}`}
              className={`${big ? 'h-10 w-10' : 'h-8 w-8'} rounded-full text-sm font-semibold ${i === index ? 'bg-brand-600 text-white' : 'bg-concrete-100 text-concrete-700 hover:bg-concrete-200'}`}
            >
              {i + 1}
            </button>
          </li>
        ))}
      </ol>
      <h2 id="step-title" className={`${big ? 'text-3xl' : 'text-xl'} font-bold text-concrete-900`}>
        {step.title}
      </h2>
      {stale}
      <div className="space-y-3 text-concrete-800">{children}</div>
      <div className="flex flex-wrap items-center justify-between gap-2 pt-2">
        <button type="button" className="btn-secondary" onClick={() => go(index - 1)} disabled={index === 0}>
          Back
        </button>
        <span className="text-sm text-concrete-500">Arrow keys move between steps</span>
        <button type="button" className="btn-primary" onClick={() => go(index + 1)} disabled={index === steps.length - 1}>
          Next
        </button>
      </div>
      <div className="flex flex-wrap gap-2 border-t border-concrete-100 pt-3">
        <button type="button" className="btn-secondary" onClick={onPresent}>
          {presenting ? 'Leave presenter mode' : 'Presenter mode'}
        </button>
        {presenting ? (
          <button type="button" className="btn-secondary" aria-expanded={showControls} onClick={onShowControls}>
            {showControls ? 'Hide the sliders' : 'Show the sliders'}
          </button>
        ) : null}
      </div>
    </section>
  );
}
