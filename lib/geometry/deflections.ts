/**
 * Dead-load deflections (data contract, "deflections"): per girder and span a table of N + 1 values,
 * value i at fraction i/N of the span, linear between them; positive downward, length units.
 */

/** One deflection entry as described. */
export interface DeflectionEntry {
  girder: string;
  span: number;
  values: readonly number[];
}

/** Key of a girder and span in lookups. */
export function girderSpanKey(girder: string, span: number): string {
  return `${girder}\u0000${span}`;
}

/** Deflection tables of a description keyed by girder and span (the first entry wins; duplicates are refused by the checks). */
export function deflectionTables(entries: readonly DeflectionEntry[] | undefined): Map<string, readonly number[]> {
  const out = new Map<string, readonly number[]>();
  for (const e of entries ?? []) {
    const key = girderSpanKey(e.girder, e.span);
    if (!out.has(key)) out.set(key, e.values);
  }
  return out;
}

/**
 * Deflection at girder point k of n: the table interpolated linearly at fraction k/n (N + 1 values
 * at fractions i/N). Computed in whole numbers where it can be, so table points land exactly.
 * @param values d0..dN (N ≥ 1), positive downward; undefined gives 0 (no entry).
 * @returns deflection in length units, positive downward.
 */
export function deflectionAt(values: readonly number[] | undefined, k: number, n: number): number {
  if (!values || values.length < 2) return 0;
  const N = values.length - 1;
  // Position k·N/n in table spaces: whole part i and the remainder (k·N − i·n)/n, both exact for integers.
  const i = Math.floor((k * N) / n);
  if (i >= N) return values[N];
  const rem = k * N - i * n;
  if (rem === 0) return values[i];
  return values[i] + (rem / n) * (values[i + 1] - values[i]);
}
