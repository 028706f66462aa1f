// Aliphatic amines: the RMG tree's amine nitrogen groups (Burcat; "RMG fit to thermo libraries") sit next to
// Benson's carbon groups, and the mix leaves S° of simple amines 5–9 J/(mol K) off. For the amine N and every sp3
// carbon bonded to it we take instead the S° that Benson fitted together (S. W. Benson, Thermochemical Kinetics,
// 2nd ed., 1976, as carried in lib/thermo/data/source/estimation/benson/benson_groups.csv): S° only; ΔfH° and Cp
// stay the tree's. Published values as published, not refitted; the reported group names both sources.
// Why amines: on the library's five aliphatic amines (ethanamine, propylamine, isopropylamine, dimethylamine,
// trimethylamine) the tree's S° is off by 5–9 J/(mol K) and Benson's pair by 0.4–2.6; that comparison chose the
// table, so those five molecules are not independent evidence of it (the README says so).
import type { Contribution } from './contribution';
import type { MolGraph } from './mol-graph';

const CAL = 4.184;
/** Benson group S°(298) in cal/(mol K), by the RMG label of the same group. C-(N)(H)3 is Benson's remap to C-(C)(H)3. */
const BENSON_S_CAL: Record<string, { benson: string; S: number }> = {
  'N3s-CsHH': { benson: 'N-(C)(H)2', S: 29.71 },
  'N3s-CsCsH': { benson: 'N-(C)2(H)', S: 8.94 },
  'N3s-CsCsCs': { benson: 'N-(C)3', S: -13.46 },
  'Cs-N3sHHH': { benson: 'C-(N)(H)3 ≡ C-(C)(H)3', S: 30.41 },
  'Cs-N3sCsHH': { benson: 'C-(C)(N)(H)2', S: 9.8 },
  'Cs-N3sCsCsH': { benson: 'C-(C)2(N)(H)', S: -11.7 },
  'Cs-N3sCsCsCs': { benson: 'C-(C)3(N)', S: -34.1 },
};
const NITROGEN = new Set(['N3s-CsHH', 'N3s-CsCsH', 'N3s-CsCsCs']);
export const BENSON_AMINE_SOURCE = 'Benson 1976 (Thermochemical Kinetics) S°; ΔfH° and Cp from the RMG tree';

function withBensonS(c: Contribution): Contribution {
  const b = BENSON_S_CAL[c.label]!;
  return { ...c, values: { ...c.values, S: b.S * CAL }, sourceOverride: `${BENSON_AMINE_SOURCE} (Benson ${b.benson})` };
}

/** The contributions with each aliphatic amine's N and α-carbon entropies taken from Benson; other terms untouched. */
export function bensonAmineEntropies(mol: MolGraph, contributions: readonly Contribution[]): Contribution[] {
  const groupAt = new Map<number, number>();
  contributions.forEach((c, i) => {
    if (c.file === 'group' && c.centres.length === 1) groupAt.set(c.centres[0]!, i);
  });
  const out = [...contributions];
  for (const [atom, i] of groupAt) {
    if (!NITROGEN.has(contributions[i]!.label)) continue;
    const carbons = mol.neighbours[atom]!.filter((n) => mol.isHeavy(n)).map((n) => groupAt.get(n));
    // Only where Benson has every carbon's group too, so the set stays the one he fitted together.
    if (carbons.some((j) => j === undefined || !BENSON_S_CAL[contributions[j]!.label] || NITROGEN.has(contributions[j]!.label))) continue;
    out[i] = withBensonS(contributions[i]!);
    for (const j of carbons) out[j!] = withBensonS(contributions[j!]!);
  }
  return out;
}
