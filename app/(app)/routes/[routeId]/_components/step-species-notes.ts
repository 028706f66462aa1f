// Sentences the step panel adds about its species: which values are estimates and how sure ΔG° is, and a step whose
// sign the data cannot decide. Pure, for the unit tests.
import { formulaPlain } from '@/components/chemistry/formula-parts';
import { energyFromKJ, energyUnitLabel, type EnergyUnit } from '@/components/ladder/energy-format';
import type { EvaluateResponse, SpeciesProvenance } from '@/lib/thermo';
import type { SpeciesDefinition } from '@/lib/thermo/structure/structure-lookup-type';

export const SIGN_UNCERTAIN_SENTENCE = 'The sign of this step is within its uncertainty.';

/** "a", "a and b", "a, b and c" */
export function listWords(items: readonly string[]): string {
  if (items.length <= 1) return items[0] ?? '';
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** A species as a reader knows it: its name when the key is a structure key, else the key as written. */
export function speciesLabel(s: Pick<SpeciesProvenance, 'key' | 'name'>): string {
  return formulaPlain(s.key, { name: s.name });
}

/** "ΔG° uses estimated values for X and Y; σ(ΔrG°) = 6.3 kJ/mol." or null when nothing was estimated. */
export function estimateSentence(engine: Pick<EvaluateResponse, 'species' | 'uncertainty'>, unit: EnergyUnit): string | null {
  const estimated = [...new Set(engine.species.filter((s) => s.origin === 'estimated').map((s) => s.name || speciesLabel(s)))];
  if (estimated.length === 0) return null;
  const sigma = engine.uncertainty.deltaG0_kJ;
  const sigmaText =
    sigma === null || !Number.isFinite(sigma)
      ? 'σ(ΔrG°) is not known'
      : `σ(ΔrG°) = ${energyFromKJ(sigma, unit).toFixed(1)} ${energyUnitLabel(unit)}/mol${engine.uncertainty.upperBound ? ' (an upper bound: estimates on both sides share errors that partly cancel)' : ''}`;
  return `ΔG° uses estimated values for ${listWords(estimated)}; ${sigmaText}.`;
}

/** Engine messages name species by key; a structure key ("{InChIKey}(l)") is written as the species' name instead. */
export function withSpeciesNames(text: string, species: readonly Pick<SpeciesProvenance, 'key' | 'name'>[]): string {
  let out = text;
  for (const s of species) if (s.key.startsWith('{')) out = out.split(s.key).join(speciesLabel(s));
  return out;
}

/** What to carry into "new species from a structure" for an engine error: the structure, name and phase typed, if any. */
export interface MissingSpeciesSeed {
  smiles?: string;
  name?: string;
  phase?: string;
  /** the engine read the structure but no estimation method covers it: values must be entered */
  noEstimate: boolean;
}

const LINKED_CODES = new Set(['UNKNOWN_SPECIES', 'UNSUPPORTED_STRUCTURE']);

/** For "not in the library" (or "no estimate") errors only; null for every other error. */
export function missingSpeciesSeed(
  error: { code: string; message: string; field?: string | null } | null | undefined,
  species?: Readonly<Record<string, SpeciesDefinition>>,
): MissingSpeciesSeed | null {
  if (!error || !LINKED_CODES.has(error.code)) return null;
  const noEstimate = error.code === 'UNSUPPORTED_STRUCTURE';
  // A label's definition, named by the error's field: "species.EtOAc.smiles", "steps.0.species.EtOAc.name".
  const label = /(?:^|\.)species\.(.+)\.(?:smiles|name|key|phase|estimate)$/.exec(error.field ?? '')?.[1];
  const def = label === undefined ? undefined : species?.[label];
  if (def && 'smiles' in def) return { smiles: def.smiles, phase: def.phase, ...(def.name ? { name: def.name } : {}), noEstimate };
  if (def && 'name' in def) return { name: def.name, phase: def.phase, noEstimate };
  // Names written in the equation, as the engine's messages quote them.
  const named = /Unknown species name "([^"]+)\((g|l|s|aq)\)"/.exec(error.message) ?? /covers solids: (.+)\((s)\) needs/.exec(error.message);
  if (named) return { name: named[1]!, phase: named[2]!, noEstimate };
  const compound = /No compound called "([^"]+)"/.exec(error.message);
  if (compound) return { name: compound[1]!, noEstimate };
  const key = /Not in the species library: [^\s;]+?\((g|l|s|aq)\)/.exec(error.message);
  return { ...(key ? { phase: key[1]! } : {}), noEstimate };
}
