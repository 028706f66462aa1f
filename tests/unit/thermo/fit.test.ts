import { describe, expect, it } from 'vitest';
import { fitVantHoff, kAtTemperature, kFromLnK } from '@/lib/thermo/fit';
import { runFit } from '@/lib/thermo/fit-request';
import { thermoErrorOf } from './thermo-error-of';

describe("van 't Hoff fit input checks", () => {
  it('needs at least 3 points', () => {
    const err = thermoErrorOf(() => fitVantHoff([{ temperature_K: 300, lnK: 1 }, { temperature_K: 400, lnK: 0 }]));
    expect(err.code).toBe('INVALID_VALUE');
    expect(err.field).toBe('points');
  });

  it('rejects points all at one temperature', () => {
    const pts = [1, 2, 3].map((lnK) => ({ temperature_K: 350, lnK }));
    expect(thermoErrorOf(() => fitVantHoff(pts)).message).toMatch(/same temperature/);
  });

  it('rejects K ≤ 0 naming the point', () => {
    const err = thermoErrorOf(() =>
      runFit({ points: [{ temperature: '300 K', K: 2 }, { temperature: '350 K', K: 0 }, { temperature: '400 K', K: 1 }] }),
    );
    expect(err.code).toBe('INVALID_VALUE');
    expect(err.field).toBe('points.1.K');
  });

  it('rejects sigma on some points only', () => {
    const pts = [
      { temperature_K: 300, lnK: 1, sigma_lnK: 0.1 },
      { temperature_K: 350, lnK: 0.5 },
      { temperature_K: 400, lnK: 0.2 },
    ];
    expect(thermoErrorOf(() => fitVantHoff(pts)).code).toBe('INVALID_VALUE');
  });

  it('reads temperatures as quantities and rejects bare numbers', () => {
    const err = thermoErrorOf(() =>
      runFit({ points: [{ temperature: '300', lnK: 1 }, { temperature: '350 K', lnK: 0 }, { temperature: '400 K', lnK: -1 }] }),
    );
    expect(err.code).toBe('INVALID_UNIT');
    expect(err.field).toBe('points.0.temperature');
  });

  it('weights points by 1/σ²: a point with huge σ barely moves the line', () => {
    const exact = [300, 350, 400].map((T) => ({ temperature_K: T, lnK: 1000 / T, sigma_lnK: 0.01 }));
    const withOutlier = [...exact, { temperature_K: 450, lnK: 50, sigma_lnK: 1e6 }];
    expect(fitVantHoff(withOutlier).deltaH0_kJ).toBeCloseTo(fitVantHoff(exact).deltaH0_kJ, 6);
  });

  it('predicts K at requested temperatures', () => {
    const pts = [300, 350, 400].map((T) => ({ temperature: `${T} K`, lnK: 1000 / T - 2 }));
    const r = runFit({ points: pts, predictAt: ['500 K'] });
    expect(r.predictions[0]!.lnK).toBeCloseTo(1000 / 500 - 2, 9);
  });
});

describe('K from ln K', () => {
  it('gives null for K outside the double range but keeps ln K and log10 K', () => {
    expect(kFromLnK(800).K).toBeNull();
    expect(kFromLnK(-800).K).toBeNull();
    expect(kFromLnK(-800).log10K).toBeCloseTo(-800 / Math.LN10, 9);
    expect(kFromLnK(2).K).toBeCloseTo(Math.exp(2), 12);
  });

  it('rejects T ≤ 0 in kAtTemperature', () => {
    expect(thermoErrorOf(() => kAtTemperature({ deltaH0_kJ: 1, deltaS0_J_per_K: 1, temperature_K: 0 })).code).toBe('INVALID_VALUE');
  });
});
