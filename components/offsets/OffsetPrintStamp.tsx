'use client';

import { useEffect, useState } from 'react';
import { dateTimeText } from '@/lib/units';

/** "Printed <date>" for the paper header, refreshed when the browser starts printing. */
export default function OffsetPrintStamp({ initial }: { initial: string }) {
  const [at, setAt] = useState(initial);
  useEffect(() => {
    const update = () => setAt(new Date().toISOString());
    window.addEventListener('beforeprint', update);
    return () => window.removeEventListener('beforeprint', update);
  }, []);
  return <span>Printed {dateTimeText(at)}</span>;
}
