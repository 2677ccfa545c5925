'use client';

import { useId, useState } from 'react';
import type { Units } from '@/lib/units';

type Paper = 'letter' | 'a4';

/**
 * Download of the field sheet as PDF (the spans shown, with each span's sign-off state), on letter or
 * A4 paper: letter for a feet bridge and A4 for a metric one unless changed here.
 */
export default function SheetPdfDownload({ bridgeId, units, span }: { bridgeId: number; units: Units; span: number | null }) {
  const id = useId();
  const [paper, setPaper] = useState<Paper>(units === 'm' ? 'a4' : 'letter');
  const href = `/api/bridges/${bridgeId}/field-sheet.pdf?${span ? `span=${span}&` : ''}paper=${paper}`;
  return (
    <span className="inline-flex items-stretch gap-1">
      <a href={href} className="btn-secondary" download>
        Download PDF
      </a>
      <label htmlFor={`${id}-paper`} className="sr-only">
        Paper size of the PDF
      </label>
      <select id={`${id}-paper`} value={paper} onChange={(e) => setPaper(e.target.value as Paper)} className="field-input w-auto py-0 text-sm" title="Paper size of the PDF">
        <option value="letter">Letter</option>
        <option value="a4">A4</option>
      </select>
    </span>
  );
}
