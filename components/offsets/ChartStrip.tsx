'use client';

import { useEffect, useId, useRef, useState } from 'react';
import { atMost, LENGTH_TOLERANCE, nearlyZero } from '@/lib/units';

export type ChartPoint = { x: number; y: number; label: string; marked?: boolean };

/** One line of the chart; each segment is drawn as its own polyline so the kink where two meet shows. */
export type ChartSeries = { id: string; name: string; color: string; dash?: string; marker: 'circle' | 'square'; segments: ChartPoint[][] };

export type ChartBent = { name: string; station: number };

/** Round tick values covering [min, max] with about `count` steps of 1, 2 or 5 × 10^k. */
function niceTicks(min: number, max: number, count: number): number[] {
  if (!(max > min)) return [min];
  const raw = (max - min) / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? raw;
  const ticks: number[] = [];
  const noise = step * LENGTH_TOLERANCE;
  for (let v = Math.ceil(min / step - LENGTH_TOLERANCE) * step; atMost(v, max, noise); v += step) ticks.push(nearlyZero(v, noise) ? 0 : v);
  return ticks;
}

/** "Abutment 1" → "A1", "Pier 2" → "P2": for bent labels where the strip is narrow. */
function shortName(name: string): string {
  const words = name.split(/\s+/).filter(Boolean);
  return words.map((w) => (/^\d/.test(w) ? w : w[0].toUpperCase())).join('');
}

function Marker({ kind, x, y, color, size = 3.5 }: { kind: 'circle' | 'square'; x: number; y: number; color: string; size?: number }) {
  return kind === 'circle' ? <circle cx={x} cy={y} r={size} fill={color} /> : <rect x={x - size} y={y - size} width={size * 2} height={size * 2} fill={color} />;
}

/**
 * A strip chart in SVG: x along the bridge in stations, y a length in the bridge's units, one or more
 * series, the bents as labelled vertical lines, axes with units and a legend. Colours come from a
 * colour-blind-safe palette, and every series also differs by marker shape and line dash.
 */
export default function ChartStrip({
  title,
  description,
  xLabel,
  yLabel,
  series,
  bents,
  formatX,
  formatY,
  invertY = false,
  markLabel,
  height = 260,
}: {
  title: string;
  description: string;
  xLabel: string;
  yLabel: string;
  series: ChartSeries[];
  bents: ChartBent[];
  formatX: (x: number) => string;
  formatY: (y: number) => string;
  invertY?: boolean;
  markLabel?: string;
  height?: number;
}) {
  const id = useId();
  const box = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(800);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const measure = () => setWidth(Math.max(280, Math.round(el.clientWidth)));
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  const all = series.flatMap((s) => s.segments.flat());
  const xs = [...all.map((p) => p.x), ...bents.map((b) => b.station)];
  const ys = all.map((p) => p.y);
  const narrow = width < 520;
  const margin = { left: narrow ? 50 : 64, right: 14, top: 26, bottom: 40 };
  const plotW = width - margin.left - margin.right;
  const plotH = height - margin.top - margin.bottom;
  let xMin = Math.min(...xs);
  let xMax = Math.max(...xs);
  if (!(xMax > xMin)) [xMin, xMax] = [xMin - 1, xMin + 1];
  let yMin = Math.min(...ys);
  let yMax = Math.max(...ys);
  const pad = Math.max((yMax - yMin) * 0.12, Math.abs(yMax) * 0.02, 0.05);
  yMin -= pad;
  yMax += pad;
  const sx = (x: number) => margin.left + ((x - xMin) / (xMax - xMin)) * plotW;
  const sy = (y: number) => (invertY ? margin.top + ((y - yMin) / (yMax - yMin)) * plotH : margin.top + ((yMax - y) / (yMax - yMin)) * plotH);
  const xTicks = niceTicks(xMin, xMax, narrow ? 3 : 6).filter((t) => t >= xMin && t <= xMax);
  const yTicks = niceTicks(yMin, yMax, 4).filter((t) => t >= yMin && t <= yMax);
  const spacing = all.length > 0 ? plotW / Math.max(1, all.length / Math.max(1, series.length)) : 0;
  const showMarkers = spacing >= 7;
  const bentGap = bents.length > 1 ? Math.min(...bents.slice(1).map((b, i) => sx(b.station) - sx(bents[i].station))) : plotW;
  const shortBents = bentGap < 90;
  const hasMarks = all.some((p) => p.marked);
  const labelOf = (b: ChartBent) => (shortBents ? shortName(b.name) : b.name);
  // Labels near either end of the strip are anchored inward so they are never cut off.
  const anchorOf = (b: ChartBent): 'start' | 'middle' | 'end' => {
    const half = labelOf(b).length * 3.4;
    if (sx(b.station) + half > width - 2) return 'end';
    if (sx(b.station) - half < 2) return 'start';
    return 'middle';
  };

  if (all.length === 0) {
    return <p className="card p-4 text-sm text-concrete-700">{title}: no exterior girder points to draw.</p>;
  }

  return (
    <figure className="card break-inside-avoid p-3 sm:p-4">
      <figcaption id={`${id}-title`} className="font-bold text-concrete-900">
        {title}
      </figcaption>
      <p id={`${id}-desc`} className="mt-0.5 text-sm text-concrete-700">
        {description}
      </p>
      <div ref={box} className="mt-2 w-full">
        <svg role="img" aria-labelledby={`${id}-title ${id}-desc`} width={width} height={height} viewBox={`0 0 ${width} ${height}`} className="block max-w-full">
          <rect x={margin.left} y={margin.top} width={plotW} height={plotH} fill="#ffffff" stroke="#c9c4b9" />
          {yTicks.map((t) => (
            <g key={`y${t}`}>
              <line x1={margin.left} x2={margin.left + plotW} y1={sy(t)} y2={sy(t)} stroke="#e0ddd5" />
              <text x={margin.left - 6} y={sy(t)} dy="0.32em" textAnchor="end" fontSize={11} fill="#524e46" className="tabular">
                {formatY(t)}
              </text>
            </g>
          ))}
          {xTicks.map((t) => (
            <g key={`x${t}`}>
              <line x1={sx(t)} x2={sx(t)} y1={margin.top + plotH} y2={margin.top + plotH + 4} stroke="#878174" />
              <text x={sx(t)} y={margin.top + plotH + 16} textAnchor="middle" fontSize={11} fill="#524e46" className="tabular">
                {formatX(t)}
              </text>
            </g>
          ))}
          <text x={margin.left + plotW / 2} y={height - 4} textAnchor="middle" fontSize={11} fill="#3a3732">
            {xLabel}
          </text>
          <text transform={`translate(12 ${margin.top + plotH / 2}) rotate(-90)`} textAnchor="middle" fontSize={11} fill="#3a3732">
            {yLabel}
          </text>
          {bents.map((b) => (
            <g key={b.name}>
              <line x1={sx(b.station)} x2={sx(b.station)} y1={margin.top - 4} y2={margin.top + plotH} stroke="#6b665b" strokeDasharray="2 3" />
              <text x={sx(b.station)} y={margin.top - 8} textAnchor={anchorOf(b)} fontSize={11} fontWeight={600} fill="#3a3732">
                {labelOf(b)}
              </text>
            </g>
          ))}
          {series.map((s) => (
            <g key={s.id}>
              {s.segments.map((seg, i) => (
                <polyline
                  key={i}
                  points={seg.map((p) => `${sx(p.x).toFixed(1)},${sy(p.y).toFixed(1)}`).join(' ')}
                  fill="none"
                  stroke={s.color}
                  strokeWidth={2}
                  strokeDasharray={s.dash}
                  strokeLinejoin="round"
                />
              ))}
              {s.segments.flat().map((p, i) => (
                <g key={i}>
                  {showMarkers ? <Marker kind={s.marker} x={sx(p.x)} y={sy(p.y)} color={s.color} size={2.5} /> : null}
                  {p.marked ? (
                    <path d={`M ${sx(p.x)} ${sy(p.y) - 7} L ${sx(p.x) + 7} ${sy(p.y)} L ${sx(p.x)} ${sy(p.y) + 7} L ${sx(p.x) - 7} ${sy(p.y)} Z`} fill="none" stroke="#24221f" strokeWidth={1.5} />
                  ) : null}
                  <title>{`${s.name}: ${p.label}`}</title>
                </g>
              ))}
            </g>
          ))}
        </svg>
      </div>
      <ul className="mt-2 flex flex-wrap gap-x-5 gap-y-1 text-sm text-concrete-800" aria-label="Legend">
        {series.map((s) => (
          <li key={s.id} className="inline-flex items-center gap-2">
            <svg width="30" height="12" aria-hidden="true">
              <line x1="1" x2="29" y1="6" y2="6" stroke={s.color} strokeWidth={2} strokeDasharray={s.dash} />
              <Marker kind={s.marker} x={15} y={6} color={s.color} size={3} />
            </svg>
            {s.name}
          </li>
        ))}
        <li className="inline-flex items-center gap-2">
          <svg width="14" height="14" aria-hidden="true">
            <line x1="7" x2="7" y1="0" y2="14" stroke="#6b665b" strokeDasharray="2 3" />
          </svg>
          Bent line at the alignment
        </li>
        {hasMarks && markLabel ? (
          <li className="inline-flex items-center gap-2">
            <svg width="16" height="16" aria-hidden="true">
              <path d="M 8 1 L 15 8 L 8 15 L 1 8 Z" fill="none" stroke="#24221f" strokeWidth={1.5} />
            </svg>
            {markLabel}
          </li>
        ) : null}
      </ul>
    </figure>
  );
}
