// A step on fitted ΔH°, ΔS°: ΔG°(T) = ΔH° − TΔS° (ΔCp = 0), multiples and reversals, the warning and the fit's σ.
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { evaluateStep } from '@/lib/thermo';

// Synthetic fitted values (not a measurement), for the reaction as the fit has it.
const override = {
  equation: 'N2O4(g) -> 2 NO2(g)',
  deltaH0_kJ: 60,
  deltaS0_J_per_K: 180,
  source: 'fit #7 “bench set”',
  range_K: [280, 360] as [number, number],
  stderr: { deltaH0_kJ: 1, deltaS0_J_per_K: 3, covariance_HS: 2.9 },
};

describe('evaluateStep with an override', () => {
  it('uses the fitted values, names the source and says ΔCp = 0 and the range', () => {
    const r = evaluateStep({ equation: 'N2O4(g) -> 2 NO2(g)', temperature: '320 K', override }, { lookup: nbsLookup });
    expect(r.deltaH0_kJ).toBe(60);
    expect(r.deltaG0_kJ).toBeCloseTo(60 - (320 * 180) / 1000, 12);
    expect(r.override).toEqual({ source: 'fit #7 “bench set”', factor: 1, deltaH0_kJ: 60, deltaS0_J_per_K: 180, range_K: [280, 360] });
    const w = r.warnings.find((x) => x.code === 'FITTED_VALUES')!;
    expect(w.message).toContain('fit #7 “bench set”');
    expect(w.message).toContain('ΔCp = 0');
    expect(w.message).not.toContain('extrapolation');
    // σ² = 1² + 0.32²·3² − 2·0.32·2.9
    expect(r.uncertainty.deltaG0_kJ).toBeCloseTo(Math.sqrt(1 + 0.1024 * 9 - 2 * 0.32 * 2.9), 12);
    expect(r.crossover_K).toBeCloseTo((60 * 1000) / 180, 9);
  });

  it('scales for a multiple, flips for the reverse, and warns outside the fitted range', () => {
    const half = evaluateStep({ equation: '1/2 N2O4(g) -> NO2(g)', temperature: '300 K', override }, { lookup: nbsLookup });
    expect(half.deltaH0_kJ).toBeCloseTo(30, 12);
    expect(half.override!.factor).toBe(0.5);
    const back = evaluateStep({ equation: '2 NO2(g) -> N2O4(g)', temperature: '500 K', override }, { lookup: nbsLookup });
    expect(back.deltaG0_kJ).toBeCloseTo(-(60 - 0.5 * 180), 12);
    expect(back.warnings.find((x) => x.code === 'FITTED_VALUES')!.message).toContain('500 K is an extrapolation');
  });

  it('refuses a step that is not the fitted reaction', () => {
    expect(() => evaluateStep({ equation: 'N2(g) + 2 O2(g) -> 2 NO2(g)', override }, { lookup: nbsLookup })).toThrow(/not fit #7 “bench set”'s reaction/);
  });

  it('without an override nothing changes: no override field, no FITTED_VALUES', () => {
    const r = evaluateStep({ equation: 'N2O4(g) -> 2 NO2(g)', temperature: '320 K' }, { lookup: nbsLookup });
    expect(r.override).toBeUndefined();
    expect(r.warnings.some((x) => x.code === 'FITTED_VALUES')).toBe(false);
  });
});
