'use client';

import { useId, useState } from 'react';
import type { DisplayStyle, Units } from '@/lib/units';

type Paper = 'letter' | 'a4';

/**
 * Download of the offset table as PDF in the style shown on screen, on letter or A4 paper (letter for
 * a feet bridge and A4 for a metric one unless changed here).
 */
export default function OffsetPdfDownload({ bridgeId, units, style }: { bridgeId: number; units: Units; style: DisplayStyle }) {
  const id = useId();
  const [paper, setPaper] = useState<Paper>(units === 'm' ? 'a4' : 'letter');
  const pdfStyle = units === 'm' ? 'metric' : style === 'feet-inches' ? 'feet-inches' : 'decimal-feet';
  return (
    <span className="inline-flex items-stretch gap-1">
      <a href={`/api/bridges/${bridgeId}/offsets.pdf?style=${pdfStyle}&paper=${paper}`} className="btn-secondary min-h-11" download>
        Download PDF ({pdfStyle === 'metric' ? 'metric' : pdfStyle === 'feet-inches' ? 'feet-inches' : 'decimal feet'})
      </a>
      <label htmlFor={`${id}-paper`} className="sr-only">
        Paper size of the PDF
      </label>
      <select id={`${id}-paper`} value={paper} onChange={(e) => setPaper(e.target.value as Paper)} className="field-input min-h-11 w-auto py-0 text-sm" title="Paper size of the PDF">
        <option value="letter">Letter</option>
        <option value="a4">A4</option>
      </select>
    </span>
  );
}
