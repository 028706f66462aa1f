// van 't Hoff fit: ln K = −ΔH°/(R T) + ΔS°/R, by (weighted) least squares in 1/T.
// With sigma_lnK on every point the weights are 1/σ² and the standard errors come from the
// covariance matrix as is; without, errors are scaled by the residual variance (n − 2 dof).
import { R_GAS } from './constants';
import { ThermoError } from './errors';

export interface FitPoint {
  temperature_K: number;
  lnK: number;
  sigma_lnK?: number | undefined;
}

export interface VantHoffFit {
  deltaH0_kJ: number;
  deltaS0_J_per_K: number;
  stderr_deltaH0_kJ: number;
  stderr_deltaS0_J_per_K: number;
  r2: number;
  n: number;
  weighted: boolean;
  residuals_lnK: number[];
}

export interface KValue {
  lnK: number;
  log10K: number;
  /** null when e^lnK is outside the double range */
  K: number | null;
}

export function fitVantHoff(points: readonly FitPoint[]): VantHoffFit {
  const n = points.length;
  if (n < 3) {
    throw new ThermoError('INVALID_VALUE', `A van 't Hoff fit needs at least 3 points; got ${n}`, { field: 'points' });
  }
  const withSigma = points.filter((p) => p.sigma_lnK !== undefined).length;
  if (withSigma !== 0 && withSigma !== n) {
    throw new ThermoError('INVALID_VALUE', 'Give sigma_lnK on every point or on none', { field: 'points' });
  }
  points.forEach((p, i) => {
    if (!(p.temperature_K > 0) || !Number.isFinite(p.temperature_K)) {
      throw new ThermoError('INVALID_VALUE', `points[${i}].temperature must be above 0 K`, { field: `points.${i}.temperature` });
    }
    if (!Number.isFinite(p.lnK)) throw new ThermoError('INVALID_VALUE', `points[${i}]: ln K must be finite`, { field: `points.${i}` });
    if (p.sigma_lnK !== undefined && !(p.sigma_lnK > 0 && Number.isFinite(p.sigma_lnK))) {
      throw new ThermoError('INVALID_VALUE', `points[${i}].sigma_lnK must be positive`, { field: `points.${i}.sigma_lnK` });
    }
  });
  const weighted = withSigma === n;
  const x = points.map((p) => 1 / p.temperature_K);
  const y = points.map((p) => p.lnK);
  const w = points.map((p) => (weighted ? 1 / (p.sigma_lnK! * p.sigma_lnK!) : 1));
  let sw = 0;
  let swx = 0;
  let swy = 0;
  for (let i = 0; i < n; i++) {
    sw += w[i]!;
    swx += w[i]! * x[i]!;
    swy += w[i]! * y[i]!;
  }
  const xm = swx / sw;
  const ym = swy / sw;
  // Centred sums avoid the cancellation that 1/T values (all ≈ 1e-3) would cause.
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i]! - xm;
    const dy = y[i]! - ym;
    sxx += w[i]! * dx * dx;
    sxy += w[i]! * dx * dy;
    syy += w[i]! * dy * dy;
  }
  if (!(sxx > 0) || sxx <= 1e-30 * sw * xm * xm) {
    throw new ThermoError('INVALID_VALUE', 'All points are at the same temperature; a slope cannot be fitted', { field: 'points' });
  }
  const slope = sxy / sxx;
  const intercept = ym - slope * xm;
  const residuals_lnK = y.map((yi, i) => yi - (intercept + slope * x[i]!));
  const ssr = residuals_lnK.reduce((acc, r, i) => acc + w[i]! * r * r, 0);
  const scale = weighted ? 1 : ssr / (n - 2);
  const varSlope = scale / sxx;
  const varIntercept = scale * (1 / sw + (xm * xm) / sxx);
  return {
    deltaH0_kJ: (-slope * R_GAS) / 1000,
    deltaS0_J_per_K: intercept * R_GAS,
    stderr_deltaH0_kJ: (Math.sqrt(varSlope) * R_GAS) / 1000,
    stderr_deltaS0_J_per_K: Math.sqrt(varIntercept) * R_GAS,
    r2: syy > 0 ? 1 - ssr / syy : 1,
    n,
    weighted,
    residuals_lnK,
  };
}

const LN_MIN_NORMAL = Math.log(2.2250738585072014e-308);

export function kFromLnK(lnK: number): KValue {
  const K = Math.exp(lnK);
  // Below e^-708.39 doubles are subnormal (precision lost); treat as out of range too.
  return { lnK, log10K: lnK / Math.LN10, K: Number.isFinite(K) && lnK > LN_MIN_NORMAL ? K : null };
}

export function kAtTemperature(args: { deltaH0_kJ: number; deltaS0_J_per_K: number; temperature_K: number }): KValue {
  const { deltaH0_kJ, deltaS0_J_per_K, temperature_K: T } = args;
  if (!(T > 0) || !Number.isFinite(T)) {
    throw new ThermoError('INVALID_VALUE', 'Temperature must be above 0 K', { field: 'temperature' });
  }
  return kFromLnK((-deltaH0_kJ * 1000) / (R_GAS * T) + deltaS0_J_per_K / R_GAS);
}
