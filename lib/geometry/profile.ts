/**
 * Profile grade line: straight grades between PVIs joined by symmetric parabolic vertical curves.
 * Stations and elevations in the bridge's length unit; grades as rise/run (0.02 = 2 %).
 */

/** A point of vertical intersection; `curve_length` L carries a curve from station − L/2 to + L/2. */
export interface PviInput {
  station: number;
  elevation: number;
  curve_length?: number;
}

/** A vertical curve as laid out, with its turning (high or low) point when it lies on the curve. */
export interface VerticalCurve {
  /** Index of the PVI that carries the curve. */
  pvi: number;
  /** Beginning of vertical curve: station and elevation. */
  bvcStation: number;
  bvcElevation: number;
  /** End of vertical curve: station and elevation. */
  evcStation: number;
  evcElevation: number;
  length: number;
  /** Grade in and grade out (rise/run). */
  gradeIn: number;
  gradeOut: number;
  /** High point (crest) or low point (sag) on the curve; null when the grade does not change sign. */
  turningPoint: { kind: 'high' | 'low'; station: number; elevation: number } | null;
}

/**
 * Evaluated profile. Build once per bridge with {@link createProfile}.
 */
export class Profile {
  private readonly stations: number[];
  private readonly elevations: number[];
  private readonly grades: number[];
  /** Vertical curves in station order. */
  readonly curves: VerticalCurve[];

  constructor(pvis: readonly PviInput[]) {
    this.stations = pvis.map((p) => p.station);
    this.elevations = pvis.map((p) => p.elevation);
    this.grades = [];
    for (let i = 0; i + 1 < pvis.length; i++) {
      this.grades.push((this.elevations[i + 1] - this.elevations[i]) / (this.stations[i + 1] - this.stations[i]));
    }
    this.curves = [];
    for (let i = 1; i + 1 < pvis.length; i++) {
      const L = pvis[i].curve_length ?? 0;
      if (!(L > 0)) continue;
      const g1 = this.grades[i - 1];
      const g2 = this.grades[i];
      const bvcStation = this.stations[i] - L / 2;
      const bvcElevation = this.elevations[i] - (g1 * L) / 2;
      const evcStation = this.stations[i] + L / 2;
      const evcElevation = this.elevations[i] + (g2 * L) / 2;
      let turningPoint: VerticalCurve['turningPoint'] = null;
      if (g1 !== g2) {
        // Grade g1 + (g2 − g1)·x/L is zero at x = −g1·L/(g2 − g1).
        const x = (-g1 * L) / (g2 - g1);
        if (x >= 0 && x <= L) {
          turningPoint = {
            kind: g2 < g1 ? 'high' : 'low',
            station: bvcStation + x,
            elevation: bvcElevation + g1 * x + ((g2 - g1) * x * x) / (2 * L),
          };
        }
      }
      this.curves.push({ pvi: i, bvcStation, bvcElevation, evcStation, evcElevation, length: L, gradeIn: g1, gradeOut: g2, turningPoint });
    }
  }

  private tangentSegment(station: number): number {
    // Index i of the grade between PVI i and i+1 that governs this station (first/last extended).
    const n = this.stations.length;
    if (n < 2) return -1;
    let lo = 0;
    let hi = n - 2;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (this.stations[mid] <= station) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  }

  private curveAt(station: number): VerticalCurve | null {
    let lo = 0;
    let hi = this.curves.length - 1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      const c = this.curves[mid];
      if (station < c.bvcStation) hi = mid - 1;
      else if (station > c.evcStation) lo = mid + 1;
      else return c;
    }
    return null;
  }

  /**
   * Profile grade elevation at a station (length units). Beyond the first and last PVI the first and
   * last grades are extended; a single PVI gives a level profile.
   */
  elevationAt(station: number): number {
    const c = this.curveAt(station);
    if (c) {
      const x = station - c.bvcStation;
      return c.bvcElevation + c.gradeIn * x + ((c.gradeOut - c.gradeIn) * x * x) / (2 * c.length);
    }
    const i = this.tangentSegment(station);
    if (i < 0) return this.elevations[0];
    return this.elevations[i] + this.grades[i] * (station - this.stations[i]);
  }

  /** Grade (rise/run, positive rising up-station) at a station; first/last grades extended. */
  gradeAt(station: number): number {
    const c = this.curveAt(station);
    if (c) return c.gradeIn + ((c.gradeOut - c.gradeIn) * (station - c.bvcStation)) / c.length;
    const i = this.tangentSegment(station);
    return i < 0 ? 0 : this.grades[i];
  }
}

/**
 * Lay out a profile from PVIs in increasing station order (at least one). The first and last PVI
 * carry no curve; curves must not overlap (checked by validateGeometry, not here).
 */
export function createProfile(pvis: readonly PviInput[]): Profile {
  return new Profile(pvis);
}
