// Hydroxyl groups on an sp3 carbon: the RMG tree's O2s-CsH (Paraskevas et al. 2013, −165.2 kJ/mol) gives simple
// alcohols a systematic ΔfH° offset of several kJ/mol (rmg-groups README, known weakness 4). For the hydroxyl O and
// its carbon we take instead the pair of values Benson fitted together (S. W. Benson, Thermochemical Kinetics, 2nd
// ed., 1976, as carried in lib/thermo/data/source/estimation/benson/benson_groups.csv): ΔfH° only; S° and Cp stay
// the tree's. Published values as published, not refitted; the reported group names both sources.
import type { Contribution } from './contribution';
import type { MolGraph } from './mol-graph';

const KCAL = 4.184;
/** Benson group H(298) in kcal/mol, by the RMG label of the same group. C(H)3(O) is Benson's remap to C(C)(H)3. */
const BENSON_H_KCAL: Record<string, { benson: string; H: number }> = {
  'O2s-CsH': { benson: 'O-(C)(H)', H: -37.9 },
  'Cs-OsHHH': { benson: 'C-(O)(H)3 ≡ C-(C)(H)3', H: -10.2 },
  'Cs-CsOsHH': { benson: 'C-(C)(O)(H)2', H: -8.1 },
  'Cs-CsCsOsH': { benson: 'C-(C)2(O)(H)', H: -7.2 },
  'Cs-CsCsCsOs': { benson: 'C-(C)3(O)', H: -6.6 },
};
export const BENSON_ALCOHOL_SOURCE = 'Benson 1976 (Thermochemical Kinetics) ΔfH°; S° and Cp from the RMG tree';

function withBensonH(c: Contribution): Contribution {
  const b = BENSON_H_KCAL[c.label]!;
  return { ...c, values: { ...c.values, H: b.H * KCAL }, sourceOverride: `${BENSON_ALCOHOL_SOURCE} (Benson ${b.benson})` };
}

/** The contributions with each alcohol O–C pair's enthalpies taken from Benson; other terms untouched. */
export function bensonAlcoholEnthalpies(mol: MolGraph, contributions: readonly Contribution[]): Contribution[] {
  const groupAt = new Map<number, number>();
  contributions.forEach((c, i) => {
    if (c.file === 'group' && c.centres.length === 1) groupAt.set(c.centres[0]!, i);
  });
  const out = [...contributions];
  for (const [atom, i] of groupAt) {
    if (contributions[i]!.label !== 'O2s-CsH') continue;
    const carbon = mol.neighbours[atom]!.find((n) => mol.isHeavy(n));
    const j = carbon === undefined ? undefined : groupAt.get(carbon);
    // Only where Benson has the carbon's group too, so the pair stays the one he fitted together.
    if (j === undefined || !BENSON_H_KCAL[contributions[j]!.label] || contributions[j]!.label === 'O2s-CsH') continue;
    out[i] = withBensonH(contributions[i]!);
    out[j] = withBensonH(contributions[j]!);
  }
  return out;
}
