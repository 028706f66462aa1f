// Gani (2022) GC-simple estimate of ideal-gas ΔfH° and ΔfG° at 298.15 K, the fallback for molecules the
// RMG tree cannot place: f = b1 + Σ N·C (1st) + Σ M·D (2nd) + Σ O·E (3rd), all three levels applied.
// S° follows from the identity with the element entropies. Gani gives no Cp: the caller uses ΔCp = 0
// or Joback's Cp polynomial (joback/joback-cp.ts).
import { T_REF } from '../../constants';
import { ThermoError } from '../../errors';
import type { Chem } from '../../structure/chem';
import type { MatchedGroup } from '../phase/matched-group';
import { elementEntropySum } from './element-entropy';
import { GANI_SIGMA_DFG_KJ, GANI_SIGMA_DFH_KJ, GANI_SIGMA_S_J_PER_K } from './gani-accuracy';
import { ganiFragment } from './gani-fragment';
import { ganiTables, GANI_SOURCE } from './gani-groups';

export interface GaniEstimate {
  dfH_kJ: number;
  dfG_kJ: number;
  S_J_per_K: number;
  sigma_dfH_kJ: number;
  sigma_dfG_kJ: number;
  sigma_S_J_per_K: number;
  groups: (MatchedGroup & { order: 1 | 2 | 3; number: number; dfH_kJ: number; dfG_kJ: number })[];
  method: 'group contribution (Gani 2022)';
  /** Gani has no heat capacity */
  cp: null;
  notes: string[];
}

const NOTES = [
  'Gani (2022) GC-simple: the published ±8 kJ/mol holds on its regression set only; σ here is the error measured on compounds outside it.',
  'S° is derived from ΔfH° and ΔfG° with CODATA element entropies, so its error follows theirs.',
  'No heat capacity from this method: use ΔCp = 0 or the Joback Cp polynomial away from 298.15 K.',
];

export function estimateGani(chem: Chem, smiles: string): GaniEstimate {
  const parsed = chem.parse(smiles);
  if (parsed.charge !== 0 || parsed.radicalElectrons !== 0) {
    throw new ThermoError('UNSUPPORTED_STRUCTURE', 'The Gani (2022) groups describe neutral closed-shell molecules only.', {
      field: 'smiles',
      hint: 'Estimate the neutral parent molecule.',
    });
  }
  if (!parsed.elements.C) {
    throw new ThermoError('UNSUPPORTED_STRUCTURE', 'The Gani (2022) groups describe organic molecules; this structure has no carbon.', {
      field: 'smiles',
      hint: 'Small inorganic molecules need tabulated values.',
    });
  }
  const tables = ganiTables();
  const frag = ganiFragment(chem, smiles);
  // A zero first-order value is a group the regression never saw, not a real zero: refuse rather than sum it.
  const unparameterised = [...frag.counts.keys()].map((n) => tables.byNumber.get(n)!).filter((g) => g.order === 1 && (g.Hf === 0 || g.Gf === 0));
  if (unparameterised.length > 0) {
    throw new ThermoError('UNSUPPORTED_STRUCTURE', `The Gani (2022) table has no ΔfH° or ΔfG° value for group(s) ${unparameterised.map((g) => `"${g.name}"`).join(', ')} (atoms ${unparameterised.map((g) => frag.atoms.get(g.number)!.flat().map((a) => a + 1).join(' ')).join('; ')}).`, {
      field: 'smiles',
      hint: 'No partial estimate is given; the group needs a published value.',
      details: { method: 'Gani 2022', groups: unparameterised.map((g) => g.number) },
    });
  }
  const entropy = elementEntropySum(parsed.elements);
  if ('missing' in entropy) {
    throw new ThermoError('UNSUPPORTED_STRUCTURE', `No reference entropy on file for element ${entropy.missing}.`, { field: 'smiles', hint: 'Only organic elements are covered.' });
  }
  let dfH = tables.b1.Hf;
  let dfG = tables.b1.Gf;
  const groups: GaniEstimate['groups'] = [];
  for (const [number, count] of [...frag.counts].sort((a, b) => a[0] - b[0])) {
    const g = tables.byNumber.get(number)!;
    dfH += count * g.Hf;
    dfG += count * g.Gf;
    groups.push({ label: g.name, count, source: GANI_SOURCE, atoms: frag.atoms.get(number)!, order: g.order, number, dfH_kJ: g.Hf, dfG_kJ: g.Gf });
  }
  return {
    dfH_kJ: dfH,
    dfG_kJ: dfG,
    S_J_per_K: entropy.sum + ((dfH - dfG) * 1000) / T_REF,
    sigma_dfH_kJ: GANI_SIGMA_DFH_KJ,
    sigma_dfG_kJ: GANI_SIGMA_DFG_KJ,
    sigma_S_J_per_K: GANI_SIGMA_S_J_PER_K,
    groups,
    method: 'group contribution (Gani 2022)',
    cp: null,
    notes: NOTES,
  };
}
