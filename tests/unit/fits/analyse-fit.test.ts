// The data-set fit: exact synthetic data recovered, residuals, >3σ marks, exclusions and the confidence band.
import { describe, expect, it } from 'vitest';
import { analyseFit } from '@/lib/fits/analyse-fit';
import { studentTQuantile } from '@/lib/fits/student-t';
import type { StoredPoint } from '@/lib/schemas/fit-data';

const R = 8.314462618; // CODATA 2018
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const point = (T: number, value: number, sigma: number | null = null): StoredPoint => ({ T, value, sigma, excluded: false, reason: null });

describe('exact synthetic data set', () => {
  // Synthetic (not measured): ΔH° = −92.5 kJ/mol, ΔS° = −198.3 J/(mol K), K given directly, T in °C.
  const dH = -92.5;
  const dS = -198.3;
  const tempsC = [150, 200, 250, 300, 350, 400, 450];
  const points = tempsC.map((t) => point(t, Math.exp((-dH * 1000) / (R * (t + 273.15)) + dS / R)));

  it('recovers ΔH° and ΔS° to 1e-9 relative, with R² = 1 and n = 7', () => {
    const { result } = analyseFit({ points, temperatureUnit: 'degC', valueKind: 'K' });
    expect(rel(result.deltaH0_kJ, dH)).toBeLessThan(1e-9);
    expect(rel(result.deltaS0_J_per_K, dS)).toBeLessThan(1e-9);
    expect(result.r2).toBeCloseTo(1, 12);
    expect(result.n).toBe(7);
    expect(result.weighted).toBe(false);
    expect(result.range_K[0]).toBeCloseTo(423.15, 10);
    expect(result.range_K[1]).toBeCloseTo(723.15, 10);
  });

  it('the same set as ln K with σ gives the same values, weighted', () => {
    const asLn = points.map((p) => ({ ...p, value: Math.log(p.value), sigma: 0.05 }));
    const { result } = analyseFit({ points: asLn, temperatureUnit: 'degC', valueKind: 'lnK' });
    expect(result.weighted).toBe(true);
    expect(rel(result.deltaH0_kJ, dH)).toBeLessThan(1e-9);
    expect(rel(result.deltaS0_J_per_K, dS)).toBeLessThan(1e-9);
  });
});

describe('scatter, marks and exclusions', () => {
  // Synthetic: the noisy four-point set of tests/reference/vant-hoff-fit.test.ts, worked by hand there.
  const base = [point(250, 10.2), point(312.5, 7.1), point(400, 4.9), point(500, 2.8)];

  it('matches the hand-worked estimates and gives each point its residual', () => {
    const a = analyseFit({ points: base, temperatureUnit: 'K', valueKind: 'lnK' });
    expect(a.result.deltaH0_kJ).toBeCloseTo(-30.23274, 4);
    expect(a.points.map((p) => Number(p.residual.toFixed(4)))).toEqual([0.0411, -0.1499, 0.1954, -0.0865]);
    expect(a.points.every((p) => !p.outlier)).toBe(true);
  });

  it('cov(ΔH°, ΔS°) is −R²/1000·cov(intercept, slope) = R²/1000 · s²·x̄/Sxx (hand: x̄ = 0.002925, Sxx = 2.2675e-6, SSR = 0.0698346)', () => {
    const a = analyseFit({ points: base, temperatureUnit: 'K', valueKind: 'lnK' });
    const s2 = 0.0698346 / 2;
    expect(a.result.covariance_HS).toBeCloseTo(((R * R) / 1000) * ((s2 * 0.002925) / 2.2675e-6), 3);
  });

  it('marks a point whose residual is over 3σ of its own σ, and an excluded point is left out of the fit but still shown', () => {
    const dH = 40;
    const dS = 90;
    const temps = [300, 320, 340, 360, 380, 400];
    const pts = temps.map((T) => point(T, (-dH * 1000) / (R * T) + dS / R, 0.01));
    pts[2] = { ...pts[2]!, value: pts[2]!.value + 0.5 };
    const marked = analyseFit({ points: pts, temperatureUnit: 'K', valueKind: 'lnK' });
    expect(marked.points[2]!.outlier).toBe(true);
    expect(Math.abs(marked.points[2]!.standardised!)).toBeGreaterThan(3);

    pts[2] = { ...pts[2]!, excluded: true, reason: 'Bath at the wrong set point.' };
    const left = analyseFit({ points: pts, temperatureUnit: 'K', valueKind: 'lnK' });
    expect(left.result.n).toBe(5);
    expect(rel(left.result.deltaH0_kJ, dH)).toBeLessThan(1e-9);
    expect(left.points[2]).toMatchObject({ excluded: true, reason: 'Bath at the wrong set point.' });
    expect(left.points[2]!.residual).toBeCloseTo(0.5, 9);
  });

  it('the band is widest at the ends, narrowest near the weighted mean of 1/T, and uses t(n − 2) without σ', () => {
    const a = analyseFit({ points: base, temperatureUnit: 'K', valueKind: 'lnK' });
    const widths = a.band.map((b) => b.upper - b.lower);
    const narrowest = widths.indexOf(Math.min(...widths));
    expect(narrowest).toBeGreaterThan(0);
    expect(narrowest).toBeLessThan(widths.length - 1);
    expect(a.bandMultiplier).toBeCloseTo(4.303, 3); // t(0.975, 2); see the t-table check below
    // Half-width at x̄: t·s/sqrt(n) (hand: s = sqrt(0.0698346/2)).
    const xbar = 0.002925;
    const at = a.band.reduce((best, b) => (Math.abs(b.invT - xbar) < Math.abs(best.invT - xbar) ? b : best));
    const expected = 4.302653 * Math.sqrt(0.0698346 / 2) * Math.sqrt(1 / 4 + (at.invT - xbar) ** 2 / 2.2675e-6);
    expect((at.upper - at.lower) / 2).toBeCloseTo(expected, 3);
  });
});

describe("Student's t quantile", () => {
  // Two-sided 95 % critical values, NIST/SEMATECH e-Handbook of Statistical Methods, table 1.3.6.7.2 (from memory).
  it.each([
    [1, 12.706],
    [2, 4.303],
    [5, 2.571],
    [10, 2.228],
    [30, 2.042],
  ])('t(0.975, %i) = %f', (df, t) => {
    expect(studentTQuantile(0.975, df)).toBeCloseTo(t, 3);
  });
});
