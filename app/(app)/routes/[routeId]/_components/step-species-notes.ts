// Sentences the step panel adds about its species: which values are estimates and how sure ΔG° is, and a step whose
// sign the data cannot decide. Pure, for the unit tests.
import { formulaPlain } from '@/components/chemistry/formula-parts';
import { energyFromKJ, energyUnitLabel, type EnergyUnit } from '@/components/ladder/energy-format';
import type { EvaluateResponse, SpeciesProvenance } from '@/lib/thermo';

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
