// Uncertainty (1σ) of a group-additivity estimate. Not fitted into the group values: measured on
// the organics library's gas rows (species.csv: ATcT, JANAF, NASA, WebBook, API, CRC) by running
// bench/estimate-accuracy.ts. σ = sqrt(base² + n·perHeavyAtom² + Σ weak²) (errors of n groups add like a random walk), ΔfG combining
// ΔfH and T·S as independent.
import { T_REF } from '../../constants';
import { PER_OCCURRENCE, type WeakKind } from './weak-classes';

interface Widths {
  dH_kJ: number;
  S_J_per_K: number;
}

// Calibration (bench/estimate-accuracy.ts, 245 estimated C2–C20 gas rows): the widths are set so
// that about 90 % of each class falls within 2σ (its 90th-percentile |error| halved, rounded up;
// "σ(90 %)" in the bench output). Classes with one or two rows (nitroarene, conjugated carbonyl,
// ring heuristic), the N-heteroaromatics (no gas row in the library) and copied ring entries take
// the size of error that rmg-groups/README.md ("Known weaknesses") describes: judgement, not
// measurement.
export const SIGMA_MODEL: { base: Widths; perHeavyAtom: Widths; weak: Record<WeakKind, Widths>; calibration: string } = {
  base: { dH_kJ: 3.5, S_J_per_K: 4.5 },
  perHeavyAtom: { dH_kJ: 1, S_J_per_K: 1.2 },
  weak: {
    'n-heteroaromatic': { dH_kJ: 40, S_J_per_K: 10 },
    'conjugated-carbonyl-oxygen': { dH_kJ: 60, S_J_per_K: 25 },
    nitroarene: { dH_kJ: 20, S_J_per_K: 8 },
    'generic-ring': { dH_kJ: 25, S_J_per_K: 60 },
    'generic-group': { dH_kJ: 10, S_J_per_K: 38 },
    'ring-heuristic': { dH_kJ: 40, S_J_per_K: 25 },
    cumulene: { dH_kJ: 8, S_J_per_K: 90 },
    // S° re-measured after the O-ring completions (entropy-completions.ts), parents left out: 19 rows, 90th pct 26.7
    'o-s-ring': { dH_kJ: 13, S_J_per_K: 14 },
    alcohol: { dH_kJ: 6, S_J_per_K: 5 },
    'copied-ring': { dH_kJ: 25, S_J_per_K: 15 },
    nitro: { dH_kJ: 9, S_J_per_K: 25 },
  },
  calibration: 'organics species.csv gas rows, C2–C20, 245 estimated; 90th-percentile |error| / 2 per class',
};

/** σ for a molecule; a per-occurrence class (one offset per N-heteroaromatic ring, ...) counts linearly. */
export function sigmaFor(reasons: readonly { kind: WeakKind; count: number }[], heavyAtoms: number): { dH_kJ: number; S_J_per_K: number; dG_kJ: number } {
  const m = SIGMA_MODEL;
  let h2 = m.base.dH_kJ ** 2 + heavyAtoms * m.perHeavyAtom.dH_kJ ** 2;
  let s2 = m.base.S_J_per_K ** 2 + heavyAtoms * m.perHeavyAtom.S_J_per_K ** 2;
  for (const r of reasons) {
    const times = PER_OCCURRENCE.has(r.kind) ? r.count : 1;
    h2 += (times * m.weak[r.kind].dH_kJ) ** 2;
    s2 += (times * m.weak[r.kind].S_J_per_K) ** 2;
  }
  const dH = Math.sqrt(h2);
  const S = Math.sqrt(s2);
  return { dH_kJ: dH, S_J_per_K: S, dG_kJ: Math.sqrt(h2 + ((T_REF * S) / 1000) ** 2) };
}
