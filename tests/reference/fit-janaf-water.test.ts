// A van 't Hoff fit of published K(T): log Kf of H2O(g) (H2(g) + 1/2 O2(g) → H2O(g)) from the NIST-JANAF
// Thermochemical Tables, 4th ed. (Chase 1998), 500–1000 K. All table values here are quoted from memory.
import { describe, expect, it } from 'vitest';
import { analyseFit } from '@/lib/fits/analyse-fit';

// T/K, log10 Kf (JANAF H2O(g) table, from memory)
const JANAF_LOG_KF: [number, number][] = [
  [500, 22.884],
  [600, 18.631],
  [700, 15.582],
  [800, 13.287],
  [900, 11.496],
  [1000, 10.06],
];

describe("van 't Hoff fit of JANAF log Kf for H2O(g)", () => {
  const points = JANAF_LOG_KF.map(([T, log]) => ({ T, value: log * Math.LN10, sigma: null, excluded: false, reason: null }));
  const { result, points: analysed } = analyseFit({ points, temperatureUnit: 'K', valueKind: 'lnK' });

  it('gives the mid-range ΔfH°: JANAF lists −245.632 kJ/mol at 700 K (−243.826 at 500 K, −247.857 at 1000 K; from memory)', () => {
    // With ΔCp ≠ 0 the straight line averages ΔH° over the range; a kJ either way is the expected spread.
    expect(Math.abs(result.deltaH0_kJ - -245.632)).toBeLessThan(1);
    expect(result.stderr_deltaH0_kJ).toBeLessThan(0.5);
  });

  it('gives ΔfS° near (ΔfH° − ΔfG°)/T at 700 K: (−245.632 + 208.812)/700 = −52.60 J/(mol K) (JANAF, from memory)', () => {
    expect(Math.abs(result.deltaS0_J_per_K - -52.6)).toBeLessThan(1.5);
  });

  it('fits the table closely: R² > 0.9999, no point past 3σ', () => {
    expect(result.r2).toBeGreaterThan(0.9999);
    expect(analysed.some((p) => p.outlier)).toBe(false);
  });
});
