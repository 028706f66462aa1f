// One unknown species solved from a fitted reaction and the library values of the others.
import { describe, expect, it } from 'vitest';
import type { FitResult } from '@/lib/fits/analyse-fit';
import { solveSpeciesFromFit } from '@/lib/fits/species-from-fit';
import { nbsLookup } from '@/lib/thermo/species-library';

// N2O4(g) ⇌ 2 NO2(g) with the NBS 1982 reaction values (Wagman et al.): ΔrH° = 2(33.18) − 9.16 = 57.20 kJ/mol,
// ΔrS° = 2(240.06) − 304.29 = 175.83 J/(mol K). Solving for NO2(g) must give back the NBS row of NO2(g).
const fit: FitResult = {
  deltaH0_kJ: 57.2, deltaS0_J_per_K: 175.83, stderr_deltaH0_kJ: 0.4, stderr_deltaS0_J_per_K: 1.2, covariance_HS: 0.45,
  r2: 1, n: 5, weighted: false, range_K: [280, 360], slope_K: 0, intercept: 0,
};

describe('solveSpeciesFromFit', () => {
  it('gives NO2(g) ΔfH° = 33.18 kJ/mol and S° = 240.06 J/(mol K) (NBS 1982), ΔfG° from ΔrH° − 298.15·ΔrS°', () => {
    const s = solveSpeciesFromFit({ equation: 'N2O4(g) -> 2 NO2(g)', species: 'NO2(g)', fit, lookup: nbsLookup });
    const n2o4 = nbsLookup.get('N2O4(g)')!;
    expect(s.nu).toBe(2);
    expect(s.dfH_kJ).toBeCloseTo((57.2 + n2o4.dfH_kJ) / 2, 10);
    expect(s.dfH_kJ).toBeCloseTo(33.18, 2);
    expect(s.S_J_per_K).toBeCloseTo(240.06, 2);
    expect(s.dfG_kJ).toBeCloseTo((57.2 - (298.15 * 175.83) / 1000 + n2o4.dfG_kJ) / 2, 10);
    expect(s.sigma_dfH_kJ).toBeCloseTo(0.2, 12);
    expect(s.shadows).toBe(true);
    expect(s.others.map((o) => o.key)).toEqual(['N2O4(g)']);
  });

  it('solves a reactant with a negative ν, and refuses two unknowns or a species not in the equation', () => {
    const s = solveSpeciesFromFit({ equation: 'N2O4(g) -> 2 NO2(g)', species: 'N2O4(g)', fit, lookup: nbsLookup });
    expect(s.nu).toBe(-1);
    expect(s.dfH_kJ).toBeCloseTo(2 * nbsLookup.get('NO2(g)')!.dfH_kJ - 57.2, 10);
    expect(() => solveSpeciesFromFit({ equation: 'N2O4(g) -> 2 NO2(g)', species: 'CO(g)', fit, lookup: nbsLookup })).toThrow(/not a species/);
    expect(() => solveSpeciesFromFit({ equation: 'C7H6O3(s) -> C6H6O(s) + CO2(g)', species: 'CO2(g)', fit, lookup: nbsLookup })).toThrow(/only one species/);
  });
});
