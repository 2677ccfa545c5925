import { STAGE_LABELS, type Stage } from '@/lib/services/bridge-record';

const TONE: Record<Stage, string> = {
  design: 'border-concrete-300 bg-concrete-100 text-concrete-700',
  forming: 'border-caution-500 bg-caution-100 text-caution-700',
  checked: 'border-brand-300 bg-brand-50 text-brand-800',
  poured: 'border-pass-600 bg-pass-100 text-pass-700',
};

/** The bridge's stage as a small labelled badge. */
export default function StageBadge({ stage }: { stage: Stage }) {
  return <span className={`inline-block rounded-full border px-2 py-0.5 text-xs font-semibold ${TONE[stage]}`}>{STAGE_LABELS[stage]}</span>;
}
