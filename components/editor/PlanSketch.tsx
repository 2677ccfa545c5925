'use client';

import { useMemo } from 'react';
import PlanSketchSvg from '@/components/editor/PlanSketchSvg';
import { planSketchData } from '@/lib/editor/plan-sketch-data';
import type { BridgeDescription, OffsetTable } from '@/lib/geometry';

/**
 * Plan sketch in SVG for the editor's live preview: laid out again whenever the draft changes, drawn
 * by PlanSketchSvg (alignment, deck outline, bent lines, girders, north arrow, scale bar).
 */
export default function PlanSketch({ bridge, table }: { bridge: BridgeDescription; table: OffsetTable | null }) {
  const s = useMemo(() => planSketchData(bridge, table), [bridge, table]);
  if (!s) {
    return <p className="rounded-md bg-concrete-100 p-4 text-sm text-concrete-700">The plan cannot be drawn until the bents lie on the alignment.</p>;
  }
  return <PlanSketchSvg s={s} name={bridge.name} units={bridge.units} />;
}
