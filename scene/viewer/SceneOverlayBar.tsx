'use client';

type Props = {
  framingText: string;
  exaggeration: number;
  /** "Along the edge" or "Crew at a bent": offer the kink exaggeration and the way back. */
  edgeView: boolean;
  kinkExaggeration: number;
  onExaggeration: (v: number) => void;
  large: boolean;
};

/** What the picture shows, written on it: framing and scale, and along the edge the heights note with its toggle. */
export default function SceneOverlayBar({ framingText, exaggeration, edgeView, kinkExaggeration, onExaggeration, large }: Props) {
  const text = large ? 'text-base' : 'text-xs';
  return (
    <>
      <div className={`pointer-events-none absolute left-3 top-3 max-w-[70%] rounded bg-white/85 px-2 py-1 font-semibold text-concrete-800 ${text}`}>
        {framingText}
        {exaggeration > 1 ? ` · heights ×${exaggeration}` : ' · true scale'}
      </div>
      {edgeView ? (
        <div className={`absolute bottom-3 left-3 right-3 flex flex-wrap items-center gap-2 ${text}`} data-testid="kink-note">
          {exaggeration === kinkExaggeration ? (
            <span className="rounded bg-caution-100 px-2 py-1 font-semibold text-caution-700">Heights ×{kinkExaggeration} to show the kink at each bent</span>
          ) : null}
          <button
            type="button"
            className="rounded bg-white/90 px-2 py-1 font-semibold text-brand-800 shadow ring-1 ring-concrete-300"
            onClick={() => onExaggeration(exaggeration === 1 ? kinkExaggeration : 1)}
          >
            {exaggeration === 1 ? `Heights ×${kinkExaggeration}` : 'True scale'}
          </button>
        </div>
      ) : null}
    </>
  );
}
