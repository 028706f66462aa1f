// Joback's ideal-gas heat capacity, Cp = (Σa − 37.93) + (Σb + 0.210)T + (Σc − 3.91e-4)T² + (Σd + 2.06e-7)T³
// in J/(mol K). Offered for estimates that have no Cp of their own (Gani gives none). Joback & Reid fitted
// it over roughly 280–1100 K (from memory); outside that range it is refused.
import { ThermoError } from '../../errors';
import { jobackGroups } from './joback-groups';

export const JOBACK_CP_RANGE_K: readonly [number, number] = [280, 1100];

export interface JobackCp {
  /** coefficients of a + bT + cT² + dT³, J/(mol K) */
  a: number;
  b: number;
  c: number;
  d: number;
  range_K: readonly [number, number];
  cp(T: number): number;
}

/** Cp polynomial from Joback group counts (as returned by estimateJoback); null if a group lacks Cp data. */
export function jobackCp(counts: ReadonlyMap<number, number>): JobackCp | null {
  const table = new Map(jobackGroups().map((g) => [g.id, g]));
  const sum = [0, 0, 0, 0];
  for (const [id, n] of counts) {
    const cp = table.get(id)?.Cp;
    if (!cp) return null;
    cp.forEach((v, k) => (sum[k]! += n * v));
  }
  const a = sum[0]! - 37.93;
  const b = sum[1]! + 0.21;
  const c = sum[2]! - 3.91e-4;
  const d = sum[3]! + 2.06e-7;
  return {
    a,
    b,
    c,
    d,
    range_K: JOBACK_CP_RANGE_K,
    cp(T: number): number {
      if (!(T >= JOBACK_CP_RANGE_K[0] && T <= JOBACK_CP_RANGE_K[1])) {
        throw new ThermoError('OUT_OF_RANGE', `Joback's Cp polynomial is used only between ${JOBACK_CP_RANGE_K[0]} and ${JOBACK_CP_RANGE_K[1]} K; ${T} K is outside.`, {
          field: 'T',
          hint: 'Use ΔCp = 0 outside this range, or a measured Cp.',
        });
      }
      return a + b * T + c * T * T + d * T * T * T;
    },
  };
}
