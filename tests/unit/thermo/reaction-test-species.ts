// Test helper: a reaction as signed library species, e.g. rx({ 'H2(g)': -1, 'H2O(l)': 1 }).
import type { ReactionSpecies } from '@/lib/thermo/reaction-thermo';
import { builtinLookup, type SpeciesLookup } from '@/lib/thermo/species-library';

export function rx(nus: Record<string, number>, lookup: SpeciesLookup = builtinLookup): ReactionSpecies[] {
  return Object.entries(nus).map(([key, nu]) => {
    const record = lookup.get(key);
    if (!record) throw new Error(`not in the library: ${key}`);
    return { key, asWritten: key, nu, record };
  });
}
