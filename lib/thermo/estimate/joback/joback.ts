// Joback & Reid (1987) for the normal boiling point, critical temperature and vaporisation enthalpy.
// Stepwell uses Joback only for these (its ΔfH° is the weakest of the methods on file); ΔvapH at
// 298.15 K comes from ΔHvap(Tb) by Watson's relation with n = 0.38 (common practice).
import type { Chem } from '../../structure/chem';
import type { MatchedGroup } from '../phase/matched-group';
import { exclusiveCovers } from '../gani/exclusive-cover';
import { jobackGroups, JOBACK_SOURCE, type JobackGroup } from './joback-groups';
import { JOBACK_DVAPH298_SIGMA_KJ } from './joback-accuracy';

export const WATSON_EXPONENT = 0.38;
const T298 = 298.15;

export interface JobackEstimate {
  Tb_K: number;
  /** null when a matched group has no Tc contribution (=NH) */
  Tc_K: number | null;
  dvapH_Tb_kJ: number;
  /** null when 298.15 K is at or above the estimated Tc (no liquid exists) or Tc is unknown */
  dvapH298_kJ: number | null;
  sigma_dvapH298_kJ: number;
  /** Joback's own published average error for Tb (12.9 K over 438 compounds) */
  sigma_Tb_K: number;
  groups: MatchedGroup[];
  /** group counts keyed by Joback group id, for the Cp polynomial and other properties */
  counts: Map<number, number>;
  method: 'group contribution (Joback & Reid 1987)';
  warnings: string[];
}

/** Watson's relation: ΔvapH at T from ΔvapH at Tb (common practice, n = 0.38). */
export function watsonDvapH(dvapH_Tb: number, Tb: number, Tc: number, T: number): number {
  if (T >= Tc) return 0;
  return dvapH_Tb * ((1 - T / Tc) / (1 - Tb / Tc)) ** WATSON_EXPONENT;
}

/** Ties between equally short covers are rare in Joback; take the one whose sorted group ids come first. */
function firstCover(covers: number[][], groupOf: (i: number) => number): number[] {
  const key = (c: number[]): string => c.map(groupOf).sort((a, b) => a - b).map((g) => String(g).padStart(3, '0')).join(',');
  return [...covers].sort((a, b) => (key(a) < key(b) ? -1 : key(a) > key(b) ? 1 : 0))[0]!;
}

function sumOf(counts: Map<number, number>, table: Map<number, JobackGroup>, pick: (g: JobackGroup) => number | null): number | null {
  let total = 0;
  for (const [id, n] of counts) {
    const v = pick(table.get(id)!);
    if (v === null) return null;
    total += n * v;
  }
  return total;
}

export function estimateJoback(chem: Chem, smiles: string): JobackEstimate {
  const groups = jobackGroups();
  const table = new Map(groups.map((g) => [g.id, g]));
  const occurrences = chem.withMol(smiles, (mol) => {
    const { candidates, covers } = exclusiveCovers(chem.rdkit, mol, groups, 'Joback');
    return firstCover(covers, (i) => candidates[i]!.group).map((i) => candidates[i]!);
  });
  const counts = new Map<number, number>();
  const atoms = new Map<number, number[][]>();
  for (const o of occurrences) {
    counts.set(o.group, (counts.get(o.group) ?? 0) + 1);
    atoms.set(o.group, [...(atoms.get(o.group) ?? []), [...o.atoms]]);
  }
  const warnings: string[] = [];
  // Tb and ΔHvap have values for every group in the table.
  const Tb = 198.2 + sumOf(counts, table, (g) => g.Tb)!;
  const dvapH_Tb = 15.3 + sumOf(counts, table, (g) => g.Hvap)!;
  const sumTc = sumOf(counts, table, (g) => g.Tc);
  const Tc = sumTc === null ? null : Tb / (0.584 + 0.965 * sumTc - sumTc * sumTc);
  let dvapH298: number | null = null;
  if (Tc === null) warnings.push('A matched Joback group has no Tc contribution, so ΔvapH cannot be moved from Tb to 298.15 K.');
  else if (Tc <= T298) warnings.push(`The estimated critical temperature (${Tc.toFixed(0)} K) is below 298.15 K: no liquid exists there.`);
  else dvapH298 = watsonDvapH(dvapH_Tb, Tb, Tc, T298);
  if (Tb < T298) warnings.push(`The estimated normal boiling point (${Tb.toFixed(0)} K) is below 298.15 K: a liquid at 298.15 K and 1 bar is hypothetical.`);

  return {
    Tb_K: Tb,
    Tc_K: Tc,
    dvapH_Tb_kJ: dvapH_Tb,
    dvapH298_kJ: dvapH298,
    sigma_dvapH298_kJ: JOBACK_DVAPH298_SIGMA_KJ,
    sigma_Tb_K: 12.9,
    groups: [...counts].sort((a, b) => a[0] - b[0]).map(([id, count]) => ({ label: table.get(id)!.name, count, source: JOBACK_SOURCE, atoms: atoms.get(id)! })),
    counts,
    method: 'group contribution (Joback & Reid 1987)',
    warnings,
  };
}
