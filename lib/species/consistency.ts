// The Gibbs–Helmholtz consistency of one species row at 298.15 K: ΔfG° = ΔfH° − T·ΔfS°, where
// ΔfS° = S° − Σ n·S°(element in its reference state) + (z/2)·S°(H2, g) for an ion of charge z
// (the formation reaction of an ion releases or takes up H2 against H+(aq), whose S° is 0 by convention).
import { T_REF } from '../thermo/constants';
import { builtinSpecies } from '../thermo/species-library';
import type { SpeciesRecord } from '../thermo/species-types';

/** |ΔfG°(given) − (ΔfH° − TΔfS°)| above this, in kJ/mol, fails the check; the engine warns at the same size per reaction. */
export const CONSISTENCY_TOLERANCE_KJ = 0.5;

export interface ElementEntropy {
  /** S° per atom of the element in its reference state, J/(mol K) */
  perAtom_J_per_K: number;
  /** the library key it comes from, e.g. "H2(g)" */
  from: string;
}

/** S° per atom of each element, read from the library's reference-state rows (NBS 1982). */
export function elementEntropies(records: readonly SpeciesRecord[] = builtinSpecies()): Map<string, ElementEntropy> {
  const out = new Map<string, ElementEntropy>();
  for (const r of records) {
    if (!r.flags.includes('elementReference')) continue;
    const symbols = Object.keys(r.elements);
    if (symbols.length !== 1 || r.charge !== 0) continue;
    const el = symbols[0]!;
    out.set(el, { perAtom_J_per_K: r.S_J_per_K / r.elements[el]!, from: r.key });
  }
  return out;
}

const DEFAULT_ENTROPIES = elementEntropies();

export interface FormationEntropy {
  /** ΔfS° in J/(mol K), or null when an element has no reference row */
  dfS_J_per_K: number | null;
  missing: string[];
}

export function formationEntropy(
  elements: Record<string, number>,
  charge: number,
  S_J_per_K: number,
  entropies: ReadonlyMap<string, ElementEntropy> = DEFAULT_ENTROPIES,
): FormationEntropy {
  let sum = 0;
  const missing: string[] = [];
  for (const [el, n] of Object.entries(elements)) {
    const e = entropies.get(el);
    if (!e) missing.push(el);
    else sum += n * e.perAtom_J_per_K;
  }
  // H+ carries the charge; z positive charges release z/2 H2.
  const h2 = entropies.get('H');
  if (charge !== 0) {
    if (!h2) missing.push('H');
    else sum -= charge * h2.perAtom_J_per_K;
  }
  return missing.length ? { dfS_J_per_K: null, missing: [...new Set(missing)].sort() } : { dfS_J_per_K: S_J_per_K - sum, missing: [] };
}

export interface ConsistencyInput {
  elements: Record<string, number>;
  charge: number;
  dfH_kJ: number;
  S_J_per_K: number;
  /** null asks for ΔfG° to be derived */
  dfG_kJ: number | null;
}

export type ConsistencyResult =
  | { status: 'consistent'; expected_kJ: number; difference_kJ: number }
  | { status: 'inconsistent'; expected_kJ: number; difference_kJ: number }
  | { status: 'derived'; expected_kJ: number }
  | { status: 'unchecked'; missing: string[] };

/** Checks a row (or derives ΔfG° when it is missing); `unchecked` when an element has no reference S°. */
export function checkConsistency(input: ConsistencyInput, entropies?: ReadonlyMap<string, ElementEntropy>): ConsistencyResult {
  const f = formationEntropy(input.elements, input.charge, input.S_J_per_K, entropies);
  if (f.dfS_J_per_K === null) return { status: 'unchecked', missing: f.missing };
  const expected_kJ = input.dfH_kJ - (T_REF * f.dfS_J_per_K) / 1000;
  if (input.dfG_kJ === null) return { status: 'derived', expected_kJ };
  const difference_kJ = input.dfG_kJ - expected_kJ;
  return { status: Math.abs(difference_kJ) <= CONSISTENCY_TOLERANCE_KJ ? 'consistent' : 'inconsistent', expected_kJ, difference_kJ };
}
