/**
 * The training sandbox must be a buildable bridge across its sliders and behave like the trade
 * says: with straight chords the outside overhang is widest at midspan, the inside narrowest, and
 * the swing is about the chord's middle ordinate c²/(8R) (Schofield & Breach, Engineering
 * Surveying, §10.1; the approximation from memory of precast-bridge design manuals).
 */
import { describe, expect, it } from 'vitest';
import { computeOffsetTable } from '@/lib/geometry';
import { DEFAULT_SANDBOX, SANDBOX_LIMITS, sandboxBridge } from '@/lib/scene-data/sandbox';

describe('training sandbox', () => {
  it('computes at the default settings with the widths the sliders ask for', () => {
    const t = computeOffsetTable(sandboxBridge(DEFAULT_SANDBOX));
    const s2 = t.span_summaries.filter((s) => s.span === 2);
    expect(s2.length).toBe(2);
    const outside = s2.find((s) => s.side === 'left')!; // the curve turns right: left is outside
    const inside = s2.find((s) => s.side === 'right')!;
    const c = DEFAULT_SANDBOX.spanLength;
    // Girder chord on radius R − offset; edge on R ± (16 + overhang). Swing ≈ c²/(8R) on each side.
    const m = (c * c) / (8 * DEFAULT_SANDBOX.radius);
    expect(Math.abs(outside.max_edge_width - outside.min_edge_width - m)).toBeLessThan(0.15 * m);
    expect(Math.abs(inside.max_edge_width - inside.min_edge_width - m)).toBeLessThan(0.15 * m);
    // At the bents the width is about the overhang setting (square to a chord, not the radius).
    const endRow = t.points.find((p) => p.span === 2 && p.side === 'left' && p.point === 0)!;
    expect(Math.abs(endRow.edge_width! - DEFAULT_SANDBOX.overhang)).toBeLessThan(0.1);
    const mid = t.points.find((p) => p.span === 2 && p.side === 'left' && p.point === 10)!;
    expect(mid.edge_width!).toBeCloseTo(outside.max_edge_width, 6);
  });

  it('keeps a constant overhang with curved girders', () => {
    const t = computeOffsetTable(sandboxBridge({ ...DEFAULT_SANDBOX, layout: 'curved' }));
    for (const s of t.span_summaries) {
      expect(Math.abs(s.max_edge_width - DEFAULT_SANDBOX.overhang)).toBeLessThan(1e-6);
      expect(Math.abs(s.min_edge_width - DEFAULT_SANDBOX.overhang)).toBeLessThan(1e-6);
    }
  });

  it('banks down to the inside (right) when banked and falls both ways with a crown', () => {
    const banked = sandboxBridge({ ...DEFAULT_SANDBOX, section: 'banked' });
    expect(banked.cross_slopes[0].left).toBeGreaterThan(0);
    expect(banked.cross_slopes[0].right).toBeLessThan(0);
    const crown = sandboxBridge({ ...DEFAULT_SANDBOX, section: 'crown' });
    expect(crown.cross_slopes[0].left).toBeLessThan(0);
    expect(crown.cross_slopes[0].right).toBeLessThan(0);
  });

  it('builds at the slider corners that keep a positive inside overhang', () => {
    for (const radius of [SANDBOX_LIMITS.radius.min, SANDBOX_LIMITS.radius.max]) {
      for (const spanLength of [SANDBOX_LIMITS.spanLength.min, 100]) {
        for (const layout of ['chord', 'curved'] as const) {
          const t = computeOffsetTable(sandboxBridge({ ...DEFAULT_SANDBOX, radius, spanLength, layout }));
          expect(t.span_summaries.length).toBe(6);
        }
      }
    }
  });
});
