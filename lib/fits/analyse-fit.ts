// A van 't Hoff fit of a data set's included points, with what the plot needs: residuals of every
// point (excluded ones too), >3σ marks, the covariance of ΔH° and ΔS°, and the 95 % band of the line.
import { R_GAS } from '../thermo/constants';
import { fitVantHoff } from '../thermo/fit';
import type { StoredPoint, TemperatureUnit, ValueKind } from '../schemas/fit-data';
import { toFitPoints } from './read-rows';
import { studentTQuantile } from './student-t';

export const OUTLIER_SIGMAS = 3;
export const BAND_LEVEL = 0.95;
const BAND_SAMPLES = 41;
const Z_975 = 1.959963984540054;

export interface AnalysedPoint {
  index: number;
  T_K: number;
  invT: number;
  lnK: number;
  sigma_lnK: number | null;
  excluded: boolean;
  reason: string | null;
  /** the point's ln K minus the fitted line's at this T */
  residual: number;
  /** residual over σ (the point's own when weighted, else the scatter s); null for an exact fit */
  standardised: number | null;
  outlier: boolean;
}

export interface BandSample {
  invT: number;
  lnK: number;
  lower: number;
  upper: number;
}

export interface FitResult {
  deltaH0_kJ: number;
  deltaS0_J_per_K: number;
  stderr_deltaH0_kJ: number;
  stderr_deltaS0_J_per_K: number;
  /** cov(ΔH°, ΔS°) in kJ·J/(mol² K) */
  covariance_HS: number;
  r2: number;
  n: number;
  weighted: boolean;
  /** temperatures of the included points */
  range_K: [number, number];
  /** ln K = intercept + slope / T */
  slope_K: number;
  intercept: number;
}

export interface FitAnalysis {
  result: FitResult;
  points: AnalysedPoint[];
  band: BandSample[];
  bandLevel: number;
  /** the multiplier of the standard error in the band: z when σ is given, else t(n − 2) */
  bandMultiplier: number;
}

export function analyseFit(args: { points: readonly StoredPoint[]; temperatureUnit: TemperatureUnit; valueKind: ValueKind }): FitAnalysis {
  const all = toFitPoints(args.points, args.temperatureUnit, args.valueKind);
  const used = all.filter((p) => !args.points[p.index]!.excluded);
  const fit = fitVantHoff(used);
  const slope = (-fit.deltaH0_kJ * 1000) / R_GAS;
  const intercept = fit.deltaS0_J_per_K / R_GAS;
  // The same weighted sums fitVantHoff uses, for the covariance and the band.
  const w = used.map((p) => (fit.weighted ? 1 / p.sigma_lnK! ** 2 : 1));
  const x = used.map((p) => 1 / p.temperature_K);
  const sw = w.reduce((a, b) => a + b, 0);
  const xm = x.reduce((a, xi, i) => a + w[i]! * xi, 0) / sw;
  const sxx = x.reduce((a, xi, i) => a + w[i]! * (xi - xm) ** 2, 0);
  const ssr = fit.residuals_lnK.reduce((a, r, i) => a + w[i]! * r * r, 0);
  const scale = fit.weighted ? 1 : ssr / (fit.n - 2);
  const s = Math.sqrt(scale);
  const covAB = (-scale * xm) / sxx;
  const multiplier = fit.weighted ? Z_975 : studentTQuantile(0.5 + BAND_LEVEL / 2, fit.n - 2);

  const points = all.map((p): AnalysedPoint => {
    const stored = args.points[p.index]!;
    const residual = p.lnK - (intercept + slope / p.temperature_K);
    const sigma = fit.weighted ? (p.sigma_lnK ?? null) : s;
    const standardised = sigma !== null && sigma > 0 && !(scale === 0) ? residual / sigma : null;
    return {
      index: p.index,
      T_K: p.temperature_K,
      invT: 1 / p.temperature_K,
      lnK: p.lnK,
      sigma_lnK: p.sigma_lnK ?? null,
      excluded: stored.excluded,
      reason: stored.reason,
      residual,
      standardised,
      outlier: standardised !== null && Math.abs(standardised) > OUTLIER_SIGMAS,
    };
  });

  const temps = used.map((p) => p.temperature_K);
  const range_K: [number, number] = [Math.min(...temps), Math.max(...temps)];
  const xs = all.map((p) => 1 / p.temperature_K);
  const [x0, x1] = [Math.min(...xs), Math.max(...xs)];
  const band = Array.from({ length: BAND_SAMPLES }, (_, i) => {
    const xi = x0 + ((x1 - x0) * i) / (BAND_SAMPLES - 1);
    const y = intercept + slope * xi;
    const half = multiplier * Math.sqrt(scale * (1 / sw + (xi - xm) ** 2 / sxx));
    return { invT: xi, lnK: y, lower: y - half, upper: y + half };
  });

  return {
    result: {
      deltaH0_kJ: fit.deltaH0_kJ,
      deltaS0_J_per_K: fit.deltaS0_J_per_K,
      stderr_deltaH0_kJ: fit.stderr_deltaH0_kJ,
      stderr_deltaS0_J_per_K: fit.stderr_deltaS0_J_per_K,
      // ΔH° = −R·slope/1000 and ΔS° = R·intercept, so cov(ΔH°, ΔS°) = −R²/1000 · cov(intercept, slope).
      covariance_HS: (-(R_GAS * R_GAS) / 1000) * covAB,
      r2: fit.r2,
      n: fit.n,
      weighted: fit.weighted,
      range_K,
      slope_K: slope,
      intercept,
    },
    points,
    band,
    bandLevel: BAND_LEVEL,
    bandMultiplier: multiplier,
  };
}
