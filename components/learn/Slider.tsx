'use client';

/** A labelled range input with its value written beside the label. */
export default function Slider(props: { label: string; value: number; text: string; min: number; max: number; step: number; onChange: (v: number) => void }) {
  return (
    <label className="block">
      <span className="field-label">
        {props.label}: <span className="tabular">{props.text}</span>
      </span>
      <input type="range" min={props.min} max={props.max} step={props.step} value={props.value} onChange={(e) => props.onChange(Number(e.target.value))} className="mt-2 w-full accent-brand-600" />
    </label>
  );
}
