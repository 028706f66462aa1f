// Which values of a step are estimates, in a shape the board can say in words. Pure and import-free at run time
// (types only), so the ladder, canvas and comparison can use it without shipping the engine to the browser.
import type { EvaluateResponse, SpeciesProvenance } from '../evaluate';

export interface EstimatedSpecies {
  /** how a reader knows it: the name, or the label as written when the name is only a SMILES or a CAS number */
  label: string;
  method: string;
  sigma_dfG_kJ: number | null;
}

export interface StepEstimates {
  species: EstimatedSpecies[];
  /** the short methods, each once, e.g. "Benson-type group additivity, then hydration" */
  methods: string[];
  /** σ(ΔrG°) of the step, kJ/mol; null when none is known */
  sigma_kJ: number | null;
  upperBound: boolean;
}

type Species = Pick<SpeciesProvenance, 'as_written' | 'name' | 'smiles' | 'origin' | 'method' | 'sigma_dfG_kJ'>;
type Result = { species: readonly Species[]; uncertainty: Pick<EvaluateResponse['uncertainty'], 'deltaG0_kJ' | 'upperBound'> };

const CAS = /^\d{2,7}-\d{2}-\d$/;

/** "Benson-type group additivity (RMG-database group tree), then hydration (…)" → without the parentheses. */
export function shortMethod(method: string): string {
  let out = method;
  // Nested parentheses: strip the innermost until none are left.
  for (let i = 0; i < 4 && /\([^()]*\)/.test(out); i++) out = out.replace(/\s*\([^()]*\)/g, '');
  return out.replace(/\s+,/g, ',').replace(/\s{2,}/g, ' ').trim() || method;
}

function readerLabel(s: Species): string {
  const name = s.name?.trim();
  if (!name || name === s.smiles || CAS.test(name)) return s.as_written;
  return name;
}

/** The step's estimated species, or null when every value it uses is tabulated (or it has no result). */
export function stepEstimates(result: Result | null | undefined): StepEstimates | null {
  if (!result) return null;
  const estimated = result.species.filter((s) => s.origin === 'estimated');
  if (estimated.length === 0) return null;
  const species = estimated.map((s) => ({ label: readerLabel(s), method: shortMethod(s.method ?? 'estimated'), sigma_dfG_kJ: s.sigma_dfG_kJ }));
  return {
    species,
    methods: [...new Set(species.map((s) => s.method))],
    sigma_kJ: result.uncertainty.deltaG0_kJ,
    upperBound: result.uncertainty.upperBound === true,
  };
}

/** Steps whose result uses at least one estimated species. */
export function countEstimatedSteps(steps: readonly { result: Result | null }[]): number {
  return steps.filter((s) => stepEstimates(s.result) !== null).length;
}
