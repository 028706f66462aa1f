// van 't Hoff fits: recovery of a published ΔH°, ΔS° pair, and a small dataset worked by hand.
import { describe, expect, it } from 'vitest';
import { fitVantHoff, kAtTemperature, runFit } from '@/lib/thermo';

const R = 8.314462618; // CODATA 2018

describe("van 't Hoff fit recovers a published pair", () => {
  // N2O4(g) ⇌ 2 NO2(g) from NBS Tables 1982 (Wagman et al.): ΔrH° = 2(33.18) − 9.16 = 57.20 kJ/mol,
  // ΔrS° = 2(240.06) − 304.29 = 175.83 J/(mol K).
  const dH = 57.2;
  const dS = 175.83;
  const points = [280, 300, 320, 340, 360].map((T) => ({ temperature_K: T, lnK: (-dH * 1000) / (R * T) + dS / R }));

  it('returns ΔH° and ΔS° to 1e-9 with zero residuals and r² = 1', () => {
    const fit = fitVantHoff(points);
    expect(fit.deltaH0_kJ).toBeCloseTo(dH, 9);
    expect(fit.deltaS0_J_per_K).toBeCloseTo(dS, 9);
    expect(Math.max(...fit.residuals_lnK.map(Math.abs))).toBeLessThan(1e-9);
    expect(fit.r2).toBeCloseTo(1, 12);
    expect(fit.n).toBe(5);
  });

  it('kAtTemperature inverts it: K(298.15 K) = exp(−ΔH°/RT + ΔS°/R) = 0.1456…', () => {
    const k = kAtTemperature({ deltaH0_kJ: dH, deltaS0_J_per_K: dS, temperature_K: 298.15 });
    // hand: −57200/(8.314462618 × 298.15) + 175.83/8.314462618 = −23.07422 + 21.14749 = −1.92673
    expect(k.lnK).toBeCloseTo(-1.92673, 4);
    expect(k.K!).toBeCloseTo(Math.exp(-1.92673), 4);
    expect(k.log10K).toBeCloseTo(-1.92673 / Math.LN10, 4);
  });
});

describe("van 't Hoff fit of a noisy synthetic dataset against a hand computation", () => {
  // Synthetic data (not measurements): 1/T = 0.004, 0.0032, 0.0025, 0.002 K⁻¹; ln K = 10.2, 7.1, 4.9, 2.8.
  // By hand: x̄ = 0.002925, ȳ = 6.25, Sxx = 2.2675e-6, Sxy = 0.008245, Syy = 30.05;
  // slope = Sxy/Sxx = 3636.163, intercept = ȳ − slope·x̄ = −4.385777;
  // ΔH° = −R·slope = −30.2327 kJ/mol, ΔS° = R·intercept = −36.4654 J/(mol K);
  // SSR = 0.0698346, s² = SSR/2; se(slope) = sqrt(s²/Sxx) → se(ΔH°) = 1.03177 kJ/mol;
  // se(intercept) = sqrt(s²(1/n + x̄²/Sxx)) → se(ΔS°) = 3.11629 J/(mol K); r² = 1 − SSR/Syy = 0.997676.
  const request = {
    points: [
      { temperature: '250 K', lnK: 10.2 },
      { temperature: '312.5 K', lnK: 7.1 },
      { temperature: '400 K', lnK: 4.9 },
      { temperature: '500 K', lnK: 2.8 },
    ],
  };

  it('matches slope, intercept, standard errors and r²', () => {
    const fit = runFit(request);
    expect(fit.deltaH0_kJ).toBeCloseTo(-30.23274, 4);
    expect(fit.deltaS0_J_per_K).toBeCloseTo(-36.46538, 4);
    expect(fit.stderr_deltaH0_kJ).toBeCloseTo(1.031765, 5);
    expect(fit.stderr_deltaS0_J_per_K).toBeCloseTo(3.11629, 4);
    expect(fit.r2).toBeCloseTo(0.9976761, 6);
    expect(fit.weighted).toBe(false);
    expect(fit.residuals_lnK.map((r) => Number(r.toFixed(4)))).toEqual([0.0411, -0.1499, 0.1954, -0.0865]);
  });

  it('equal sigma_lnK gives the same estimates, with errors from the given σ instead of the scatter', () => {
    const fit = runFit({ points: request.points.map((p) => ({ ...p, sigma_lnK: 0.1 })) });
    expect(fit.weighted).toBe(true);
    expect(fit.deltaH0_kJ).toBeCloseTo(-30.23274, 4);
    // se(slope) = σ/sqrt(Sxx) = 0.1/sqrt(2.2675e-6) = 66.409 → × R = 0.552152 kJ/mol
    expect(fit.stderr_deltaH0_kJ).toBeCloseTo((0.1 / Math.sqrt(2.2675e-6)) * R / 1000, 6);
  });

  it('accepts K and log10K inputs equivalently', () => {
    const viaK = runFit({ points: request.points.map((p) => ({ temperature: p.temperature, K: Math.exp(p.lnK) })) });
    const viaLog = runFit({ points: request.points.map((p) => ({ temperature: p.temperature, log10K: p.lnK / Math.LN10 })) });
    expect(viaK.deltaH0_kJ).toBeCloseTo(-30.232743, 6);
    expect(viaLog.deltaS0_J_per_K).toBeCloseTo(-36.465381, 6);
  });
});
