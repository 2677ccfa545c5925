'use client';

import { STEEL_EXPANSION_PER_C, STEEL_EXPANSION_PER_F, thermalBow } from '@/lib/geometry';
import { lengthText, type Units } from '@/lib/units';

/** Drawn size of the thermal bow: too small to see true size. */
export const THERMAL_DRAWN = 50;

/** Midspan thermal bow (bridge units) of a steel girder `depth` deep over `span`, top warmer by `deltaT` (°F for feet, °C for metres). */
export function viewerThermalBow(units: Units, deltaT: number, span: number, depth: number): number {
  return thermalBow(units === 'm' ? STEEL_EXPANSION_PER_C : STEEL_EXPANSION_PER_F, deltaT, span, depth);
}

type Props = {
  units: Units;
  /** Largest deflection in the table (bridge units); 0 when the bridge has none. */
  maxDeflection: number;
  pour: number;
  onPour: (v: number) => void;
  deltaT: number;
  onDeltaT: (v: number) => void;
  /** Midspan thermal bow for the typical span at `deltaT` (bridge units). */
  bow: number;
};

/**
 * Before and after the pour: with deflections in the targets, the girders (and the forms riding on
 * them) come down from their pre-pour shape to their final one; without, the sun's thermal bow.
 */
export default function PourControl({ units, maxDeflection, pour, onPour, deltaT, onDeltaT, bow }: Props) {
  if (maxDeflection > 0) {
    return (
      <label className="block" data-testid="pour-control">
        <span className="field-label">
          Before and after the pour: <span className="tabular">{pour === 0 ? 'forms set, before the pour' : pour === 1 ? 'after the pour' : `pour ${Math.round(pour * 100)} % placed`}</span>
        </span>
        <input type="range" min={0} max={1} step={0.05} value={pour} onChange={(e) => onPour(Number(e.target.value))} className="mt-2 w-full accent-brand-600" />
        <span className="mt-1 block text-xs text-concrete-600">
          The girders sag by their dead-load deflection (up to <span className="tabular">{lengthText(maxDeflection, units)}</span>) as the deck is placed; the brackets and forms ride down with them,
          from the form target to the edge bottom.
        </span>
      </label>
    );
  }
  const unit = units === 'm' ? '°C' : '°F';
  return (
    <label className="block" data-testid="pour-control">
      <span className="field-label">
        Sun on the girders (no deflections in this bridge): top flange warmer by{' '}
        <span className="tabular">
          {deltaT} {unit}
        </span>
      </span>
      <input type="range" min={0} max={units === 'm' ? 22 : 40} step={1} value={deltaT} onChange={(e) => onDeltaT(Number(e.target.value))} className="mt-2 w-full accent-brand-600" />
      <span className="mt-1 block text-xs text-concrete-600">
        A steel girder of the drawn depth bows up <span className="tabular">{lengthText(bow, units)}</span> at midspan (α × ΔT × span² ÷ 8 × depth), drawn ×{THERMAL_DRAWN}; the form-target line, an
        absolute elevation, stays put.
      </span>
    </label>
  );
}
