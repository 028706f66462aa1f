// Finds the equation species a request map key refers to ("H2(g)", "hydrogen(g)", " H2 (g)").
import type { ReactionSpecies } from './reaction-thermo';

/** Turns a species text into its library key (e.g. via parseSpecies), or undefined. */
export type CanonicalKey = (text: string) => string | undefined;

export type SpeciesMatcher = (mapKey: string) => ReactionSpecies | undefined;

const squash = (s: string): string => s.replace(/\s+/g, '');

// The text index depends only on the species; frozen arrays (memoised resolutions) keep theirs.
const indexMemo = new WeakMap<readonly ReactionSpecies[], Map<string, ReactionSpecies>>();

function textIndex(species: readonly ReactionSpecies[]): Map<string, ReactionSpecies> {
  const frozen = Object.isFrozen(species);
  const hit = frozen ? indexMemo.get(species) : undefined;
  if (hit) return hit;
  const byText = new Map<string, ReactionSpecies>();
  for (const s of species) {
    byText.set(s.key, s);
    byText.set(squash(s.key), s);
    byText.set(s.asWritten, s);
    byText.set(squash(s.asWritten), s);
  }
  if (frozen) indexMemo.set(species, byText);
  return byText;
}

export function makeSpeciesMatcher(species: readonly ReactionSpecies[], canonicalKey?: CanonicalKey): SpeciesMatcher {
  const byText = textIndex(species);
  return (mapKey) => {
    const direct = byText.get(mapKey) ?? byText.get(squash(mapKey));
    if (direct) return direct;
    const key = canonicalKey?.(mapKey);
    return key === undefined ? undefined : byText.get(key);
  };
}
