import type { Units } from '@/lib/units';

/** Grid spacing on the ground: 10 ft squares with a heavier line every 100 ft, or 5 m and 50 m. */
export function groundGridSpacing(units: Units): { cell: number; section: number } {
  return units === 'm' ? { cell: 5, section: 50 } : { cell: 10, section: 100 };
}
