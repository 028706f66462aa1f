// How equation and species text is read against one lookup: names through its aliases, structure keys and the
// request's labels through its records. Every parse that consults a lookup goes through here.
import type { ParseEquationOptions } from './equation';
import type { SpeciesLookup } from './species-library';

export function lookupParseOptions(lookup: SpeciesLookup, withSuggestions = false): ParseEquationOptions {
  return {
    resolveAlias: (name, phase) => lookup.resolveAlias(name, phase),
    ...(withSuggestions ? { suggestNames: (name: string, phase: string) => lookup.suggestName?.(name, phase, 5) ?? [] } : {}),
    describeKey: (key) => {
      const r = lookup.get(key);
      return r ? { formula: r.formula, phase: r.phase, charge: r.charge, elements: r.elements } : undefined;
    },
    ...(lookup.resolveLabel ? { resolveLabel: (label: string) => lookup.resolveLabel!(label) } : {}),
  };
}
