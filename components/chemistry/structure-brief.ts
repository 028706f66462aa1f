// One species as the compact drawings need it (key, readable name, formula, SMILES, origin), and which species are
// worth a drawing: small inorganics and one- or two-atom skeletons (H2, H2O, O2, CO2, CH3OH) read better as
// typeset formulas. Pure, so the node, the palette service and the comparison agree.
import type { ValueOrigin } from './origin-text';
import { speciesReaderName, type StepSpeciesFacts } from './step-origin';

export interface StructureBrief {
  /** the engine's species key, or the term as written when it has none */
  key: string;
  /** the term as written in the equation (a label, name or formula) */
  asWritten: string;
  /** how a reader knows it */
  name: string;
  /** Hill formula (charge appended), "" when unknown */
  formula: string;
  /** canonical SMILES, for species known by structure */
  smiles: string | null;
  origin?: ValueOrigin;
}

const MIN_HEAVY_ATOMS = 3;
// Salts and metal compounds (CaCO3, NaHCO3) read better as formulas even when they contain carbon.
const ORGANIC_ELEMENTS = new Set(['C', 'H', 'D', 'T', 'N', 'O', 'S', 'P', 'F', 'Cl', 'Br', 'I', 'B', 'Si', 'Se']);

/** Heavy (non-hydrogen) atoms of a Hill formula ("C2H6O" → 3), its carbons, whether it has hydrogen, and whether only organic elements. */
export function formulaSkeleton(formula: string): { heavyAtoms: number; carbons: number; hasHydrogen: boolean; isOrganic: boolean } {
  let heavyAtoms = 0;
  let carbons = 0;
  let hasHydrogen = false;
  let isOrganic = true;
  for (const m of formula.replace(/[+-]\d*$/, '').matchAll(/([A-Z][a-z]?)(\d*)/g)) {
    const element = m[1]!;
    const count = m[2] ? Number(m[2]) : 1;
    if (element === 'C') carbons += count;
    if (element === 'H' || element === 'D' || element === 'T') hasHydrogen = true;
    if (!ORGANIC_ELEMENTS.has(element)) isOrganic = false;
    if (element !== 'H' && element !== 'D' && element !== 'T') heavyAtoms += count;
  }
  return { heavyAtoms, carbons, hasHydrogen, isOrganic };
}

/** A drawing says more than the formula: an organic skeleton of three or more heavy atoms, known by structure. */
export function isDrawable(s: Pick<StructureBrief, 'smiles' | 'formula'>): s is Pick<StructureBrief, 'formula'> & { smiles: string } {
  if (!s.smiles) return false;
  const { heavyAtoms, carbons, hasHydrogen, isOrganic } = formulaSkeleton(s.formula);
  // One carbon and no hydrogen (CO2, CS2, COCl2) is an inorganic small molecule; its formula says it.
  return isOrganic && heavyAtoms >= MIN_HEAVY_ATOMS && (carbons >= 2 || (carbons === 1 && hasHydrogen));
}

/** Reactants and products of a step, each species once, in equation order. */
export interface StepStructures {
  reactants: StructureBrief[];
  products: StructureBrief[];
}

/** A stable text of the briefs, so memoised nodes can tell whether their drawings changed. */
export function structuresKey(s: StepStructures | null): string {
  if (!s) return '';
  const one = (b: StructureBrief) => `${b.key}\u0000${b.smiles ?? ''}\u0000${b.name}\u0000${b.origin ?? ''}`;
  return `${s.reactants.map(one).join('\u0001')}>${s.products.map(one).join('\u0001')}`;
}

/** The engine's species of a step as briefs: consumed (ν < 0) then made, each key once. */
export function structuresFromSpecies(species: readonly StepSpeciesFacts[]): StepStructures {
  const out: StepStructures = { reactants: [], products: [] };
  const seen = new Set<string>();
  for (const s of species) {
    if (seen.has(s.key)) continue;
    seen.add(s.key);
    const brief: StructureBrief = { key: s.key, asWritten: s.as_written || s.key, name: speciesReaderName(s), formula: s.formula, smiles: s.smiles, origin: s.origin };
    (s.nu < 0 ? out.reactants : out.products).push(brief);
  }
  return out;
}

/** True when at least one species of the step gets a drawing (else the typeset equation says it all). */
export function hasDrawing(s: StepStructures | null | undefined): s is StepStructures {
  return !!s && [...s.reactants, ...s.products].some((b) => isDrawable(b));
}

/** Term as written → reader's name, for typesetting an equation whose terms are structure keys. */
export function namesOf(s: StepStructures | null | undefined): Map<string, string> {
  return new Map([...(s?.reactants ?? []), ...(s?.products ?? [])].map((b) => [b.asWritten, b.name]));
}
