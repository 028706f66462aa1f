import reactionLibrary from '@/lib/thermo/data/reaction-library.json';
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

// A species as written ("CH3OH(g)", "methanol(g)") matches its library key; a bare start ("CH3") matches keys beginning so.
export function searchLibraryReactions({ species, limit = 30 }: { species?: string; limit?: number }): LibraryReaction[] {
  const wanted = species?.trim();
  if (!wanted) return REACTIONS.slice(0, limit);
  const named = wanted.match(/^(.*)\(([^)]*)\)$/);
  const key = (named && resolveAlias(named[1]!, named[2]!)) ?? wanted;
  const prefix = wanted.toLowerCase();
  const matches = (k: string) => k === key || k.toLowerCase().startsWith(prefix);
  return REACTIONS.filter((r) => r.consumes.some(matches) || r.produces.some(matches)).slice(0, limit);
}
