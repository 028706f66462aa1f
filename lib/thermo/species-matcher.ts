// Finds the equation species a request map key refers to ("H2(g)", "hydrogen(g)", " H2 (g)").
import type { ReactionSpecies } from './reaction-thermo';

/** Turns a species text into its library key (e.g. via parseSpecies), or undefined. */
export type CanonicalKey = (text: string) => string | undefined;

export type SpeciesMatcher = (mapKey: string) => ReactionSpecies | undefined;

const squash = (s: string): string => s.replace(/\s+/g, '');

export function makeSpeciesMatcher(species: readonly ReactionSpecies[], canonicalKey?: CanonicalKey): SpeciesMatcher {
  const byText = new Map<string, ReactionSpecies>();
  for (const s of species) {
    byText.set(s.key, s);
    byText.set(squash(s.key), s);
    byText.set(s.asWritten, s);
    byText.set(squash(s.asWritten), s);
  }
  return (mapKey) => {
    const direct = byText.get(mapKey) ?? byText.get(squash(mapKey));
    if (direct) return direct;
    const key = canonicalKey?.(mapKey);
    return key === undefined ? undefined : byText.get(key);
  };
}
