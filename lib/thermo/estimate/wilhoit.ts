// Wilhoit heat capacity with a fixed scale B (RMG uses B = 1000 K): a smooth form with the right
// low- and high-temperature limits, fitted by linear least squares to tabulated Cp points.
// Cp(T) = Cp0 + (CpInf − Cp0)·y²·[1 + (y − 1)(a0 + a1·y + a2·y² + a3·y³)], y = T/(T + B).
// H(T) − H(298.15) and S(T) − S(298.15) come from Gauss–Legendre quadrature of Cp and Cp/T.
import { T_REF } from '../constants';

export interface WilhoitCp {
  /** J/(mol K) */
  Cp0: number;
  CpInf: number;
  /** K */
  B: number;
  a: [number, number, number, number];
}

export function wilhoitCp(w: WilhoitCp, T_K: number): number {
  const y = T_K / (T_K + w.B);
  const [a0, a1, a2, a3] = w.a;
  return w.Cp0 + (w.CpInf - w.Cp0) * y * y * (1 + (y - 1) * (a0 + y * (a1 + y * (a2 + y * a3))));
}

/** Solves the small dense system A x = b by Gaussian elimination with partial pivoting. */
function solve(A: number[][], b: number[]): number[] {
  const n = b.length;
  const M = A.map((row, i) => [...row, b[i]!]);
  for (let c = 0; c < n; c += 1) {
    let p = c;
    for (let r = c + 1; r < n; r += 1) if (Math.abs(M[r]![c]!) > Math.abs(M[p]![c]!)) p = r;
    [M[c], M[p]] = [M[p]!, M[c]!];
    for (let r = c + 1; r < n; r += 1) {
      const f = M[r]![c]! / M[c]![c]!;
      for (let k = c; k <= n; k += 1) M[r]![k]! -= f * M[c]![k]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r -= 1) {
    let s = M[r]![n]!;
    for (let k = r + 1; k < n; k += 1) s -= M[r]![k]! * x[k]!;
    x[r] = s / M[r]![r]!;
  }
  return x;
}

/** Least-squares a0..a3 through the points (T, Cp) for given limits and B. */
export function fitWilhoit(T_K: readonly number[], Cp: readonly number[], Cp0: number, CpInf: number, B = 1000): WilhoitCp {
  const AtA = [0, 1, 2, 3].map(() => [0, 0, 0, 0]);
  const Atb = [0, 0, 0, 0];
  T_K.forEach((T, i) => {
    const y = T / (T + B);
    const target = (Cp[i]! - Cp0) / (CpInf - Cp0) - y * y;
    const row = [0, 1, 2, 3].map((k) => (y * y * y - y * y) * y ** k);
    for (let r = 0; r < 4; r += 1) {
      Atb[r]! += row[r]! * target;
      for (let c = 0; c < 4; c += 1) AtA[r]![c]! += row[r]! * row[c]!;
    }
  });
  const a = solve(AtA, Atb);
  return { Cp0, CpInf, B, a: [a[0]!, a[1]!, a[2]!, a[3]!] };
}

// 24-point Gauss–Legendre nodes and weights on [-1, 1], by Newton iteration on P_24.
const GL_N = 24;
const GL: { x: number; w: number }[] = (() => {
  const out: { x: number; w: number }[] = [];
  for (let i = 1; i <= GL_N; i += 1) {
    let x = Math.cos((Math.PI * (i - 0.25)) / (GL_N + 0.5));
    let dp = 0;
    for (let it = 0; it < 100; it += 1) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= GL_N; k += 1) [p0, p1] = [p1, ((2 * k - 1) * x * p1 - (k - 1) * p0) / k];
      dp = (GL_N * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-15) break;
    }
    out.push({ x, w: 2 / ((1 - x * x) * dp * dp) });
  }
  return out;
})();

function integrate(f: (T: number) => number, from: number, to: number): number {
  const half = (to - from) / 2;
  const mid = (to + from) / 2;
  let s = 0;
  for (const { x, w } of GL) s += w * f(mid + half * x);
  return s * half;
}

/** Enthalpy and entropy relative to 298.15 K, and Cp, at T (J/mol, J/(mol K)). */
export function wilhoitStateAt(w: WilhoitCp, T_K: number): { dH_J: number; dS_J_per_K: number; Cp_J_per_K: number } {
  return {
    dH_J: integrate((T) => wilhoitCp(w, T), T_REF, T_K),
    dS_J_per_K: integrate((T) => wilhoitCp(w, T) / T, T_REF, T_K),
    Cp_J_per_K: wilhoitCp(w, T_K),
  };
}
