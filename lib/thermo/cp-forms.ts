// Heat capacity from the published Cp(T) forms the organic library carries, and from the Wilhoit form of an
// estimate. Only increments from 298.15 K are used (H(T) − H(298.15), S(T) − S(298.15)); the row's own ΔfH°
// and S° anchor them, as for the NASA-9 records. Integrals by Gauss–Legendre quadrature, split at the form's
// own segment boundaries so each piece is smooth.
import { R_GAS, T_REF } from './constants';
import { wilhoitCp } from './estimate/wilhoit';
import type { CpForm, FormCp } from './species-types';

// 16-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz & Stegun, Table 25.4).
const GL_X = [
  -0.9894009349916499, -0.9445750230732326, -0.8656312023878318, -0.755404408355003,
  -0.6178762444026438, -0.45801677765722737, -0.2816035507792589, -0.09501250983763744,
  0.09501250983763744, 0.2816035507792589, 0.45801677765722737, 0.6178762444026438,
  0.755404408355003, 0.8656312023878318, 0.9445750230732326, 0.9894009349916499,
];
const GL_W = [
  0.027152459411754096, 0.062253523938647894, 0.09515851168249279, 0.12462897125553388,
  0.14959598881657674, 0.16915651939500254, 0.18260341504492358, 0.1894506104550685,
  0.1894506104550685, 0.18260341504492358, 0.16915651939500254, 0.14959598881657674,
  0.12462897125553388, 0.09515851168249279, 0.062253523938647894, 0.027152459411754096,
];

function segmentOf<T extends { Tmin: number; Tmax: number }>(segments: readonly T[], T: number): T {
  for (const s of segments) if (T <= s.Tmax) return s;
  return segments[segments.length - 1]!;
}

/** Cp in J/(mol K) at T from one published form (outside its range the nearest piece is extended). */
export function cpFromForm(form: CpForm, T: number): number {
  switch (form.form) {
    case 'NASA7': {
      const a = form.segments ? segmentOf(form.segments, T).coeffs : form.high && form.Tmid !== undefined && T > form.Tmid ? form.high : form.low;
      return R_GAS * (a[0]! + T * (a[1]! + T * (a[2]! + T * (a[3]! + T * a[4]!))));
    }
    case 'Shomate': {
      const [A, B, C, D, E] = segmentOf(form.ranges, T).coeffs as [number, number, number, number, number];
      return A + B * T + C * T * T + D * T * T * T + E / (T * T);
    }
    case 'TRC': {
      const [a0, a1, a2, a3, a4, a5, a6, a7] = form.coeffs as [number, number, number, number, number, number, number, number];
      const y = T > a7 ? (T - a7) / (T + a6) : 0;
      return R_GAS * (a0 + (a1 / (T * T)) * Math.exp(-a2 / T) + a3 * y * y + (a4 - a5 / ((T - a7) * (T - a7))) * y ** 8);
    }
    case 'Poling': {
      const c = form.coeffs;
      return R_GAS * (c[0]! + T * (c[1]! + T * (c[2]! + T * (c[3]! + T * c[4]!))));
    }
    case 'JANAF_table': {
      const { T: xs, Cp: ys } = form;
      if (T <= xs[0]!) return ys[0]!;
      for (let i = 1; i < xs.length; i++) {
        if (T <= xs[i]!) return ys[i - 1]! + ((ys[i]! - ys[i - 1]!) * (T - xs[i - 1]!)) / (xs[i]! - xs[i - 1]!);
      }
      return ys[ys.length - 1]!;
    }
    case 'Zabransky_spline': {
      const [A1, A2, A3, A4] = segmentOf(form.segments, T).coeffs as [number, number, number, number];
      const t = T / 100;
      return R_GAS * (A1 + A2 * t + A3 * t * t + A4 * t * t * t);
    }
    case 'Zabransky_quasipolynomial': {
      const [A1, A2, A3, A4, A5, A6] = form.coeffs as [number, number, number, number, number, number];
      const Tr = Math.min(T / form.Tc, 0.999);
      return R_GAS * (A1 * Math.log(1 - Tr) + A2 / (1 - Tr) + A3 + A4 * Tr + A5 * Tr * Tr + A6 * Tr * Tr * Tr);
    }
    case 'DIPPR100_Perry': {
      const c = form.coeffs;
      return (c[0]! + T * (c[1]! + T * (c[2]! + T * (c[3]! + T * c[4]!)))) / 1000;
    }
    case 'Wilhoit':
      return wilhoitCp(form, T);
  }
}

/** Temperatures where the form changes piece: integrals are split there. */
function breakpoints(form: CpForm): number[] {
  switch (form.form) {
    case 'NASA7':
      return form.segments ? form.segments.slice(0, -1).map((s) => s.Tmax) : form.Tmid !== undefined && form.high ? [form.Tmid] : [];
    case 'Shomate':
      return form.ranges.slice(0, -1).map((r) => r.Tmax);
    case 'Zabransky_spline':
      return form.segments.slice(0, -1).map((s) => s.Tmax);
    case 'JANAF_table':
      return form.T.slice(1, -1);
    default:
      return [];
  }
}

const incrementCache = new WeakMap<FormCp, Map<number, { dH_J: number; dS_J_per_K: number }>>();

function integrate(form: CpForm, from: number, to: number): { dH_J: number; dS_J_per_K: number } {
  const lo = Math.min(from, to);
  const hi = Math.max(from, to);
  const cuts = [lo, ...breakpoints(form).filter((b) => b > lo && b < hi), hi];
  let dH = 0;
  let dS = 0;
  for (let i = 1; i < cuts.length; i++) {
    const a = cuts[i - 1]!;
    const b = cuts[i]!;
    const half = (b - a) / 2;
    const mid = (a + b) / 2;
    for (let k = 0; k < GL_X.length; k++) {
      const T = mid + half * GL_X[k]!;
      const cp = cpFromForm(form, T);
      dH += GL_W[k]! * half * cp;
      dS += (GL_W[k]! * half * cp) / T;
    }
  }
  const sign = to >= from ? 1 : -1;
  return { dH_J: sign * dH, dS_J_per_K: sign * dS };
}

/** H(T) − H(298.15 K) in J/mol and S(T) − S(298.15 K) in J/(mol K); memoised per model and temperature. */
export function formIncrements(cp: FormCp, T: number): { dH_J: number; dS_J_per_K: number } {
  if (T === T_REF) return { dH_J: 0, dS_J_per_K: 0 };
  let memo = incrementCache.get(cp);
  if (!memo) {
    memo = new Map();
    incrementCache.set(cp, memo);
  }
  let hit = memo.get(T);
  if (!hit) {
    hit = integrate(cp.model, T_REF, T);
    // Bounded: a crossover search visits ~100 temperatures per species.
    if (memo.size > 512) memo.clear();
    memo.set(T, hit);
  }
  return hit;
}
