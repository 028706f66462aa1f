import reactionLibrary from '../../../db/data/reaction-library.json';
import { parseEquation } from '../../thermo/equation';
import { builtinLookup } from '../../thermo/species-library';

export interface LibraryReaction {
  id: string;
  name: string;
  equation: string;
  consumes: string[];
  produces: string[];
}

const resolveAlias = (name: string, phase: string) => builtinLookup.resolveAlias(name, phase);

// Parsed once per process: species keys on each side, so a search is a set lookup.
const REACTIONS: LibraryReaction[] = reactionLibrary.reactions.map((r) => {
  const parsed = parseEquation(r.equation, { resolveAlias });
  return { ...r, consumes: parsed.reactants.map((t) => t.species.key), produces: parsed.products.map((t) => t.species.key) };
});

export function searchLibraryReactions({ species, limit = 30 }: { species?: string; limit?: number }): LibraryReaction[] {
  const wanted = species?.trim();
  if (!wanted) return REACTIONS.slice(0, limit);
  const needle = wanted.toLowerCase();
  const key = builtinLookup.resolveAlias(needle.replace(/\(.*$/, ''), needle.match(/\(([^)]*)\)$/)?.[1] ?? '') ?? wanted;
  const matches = (k: string) => k === key || k.toLowerCase().startsWith(needle);
  return REACTIONS.filter((r) => r.consumes.some(matches) || r.produces.some(matches)).slice(0, limit);
}
