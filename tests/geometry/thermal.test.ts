import { describe, it, expect } from 'vitest';
import { CONCRETE_EXPANSION_PER_F, STEEL_EXPANSION_PER_F, thermalBow, thermalBowInches } from '@/lib/geometry';

describe('thermal bow', () => {
  it('α = 6.5e-6 /°F, ΔT = 10 °F, h = 48 in, L = 100 ft → 0.244 in', () => {
    // Gere, Mechanics of Materials, §9.11: δ = α·ΔT·L²/(8h); numbers computed (domain.md).
    expect(Math.abs(thermalBow(6.5e-6, 10, 1200, 48) - 0.244)).toBeLessThan(0.0005);
    expect(Math.abs(thermalBowInches('steel', 10, 100, 48) - 0.244)).toBeLessThan(0.0005);
  });

  it('uses the recalled coefficients and scales with L² and 1/h', () => {
    // Steel 6.5e-6 /°F (AASHTO LRFD 6.4.1, from memory); concrete 6.0e-6 /°F (from memory).
    expect(STEEL_EXPANSION_PER_F).toBeCloseTo(6.5e-6, 12);
    expect(CONCRETE_EXPANSION_PER_F).toBeCloseTo(6.0e-6, 12);
    const base = thermalBowInches('concrete', 10, 100, 48);
    expect(thermalBowInches('concrete', 10, 200, 48) / base).toBeCloseTo(4, 12);
    expect(thermalBowInches('concrete', 10, 100, 96) / base).toBeCloseTo(0.5, 12);
    expect(thermalBowInches('steel', -10, 100, 48)).toBeLessThan(0);
  });
});
