// Suggestions that respect chemistry: an unknown formula key is answered with isomers of that formula first, written
// by name in the phase asked for; a name answers with names. (Formulas of the isomers: PubChem, via the identifier table.)
import { beforeAll, describe, expect, it } from 'vitest';
import { evaluateStep } from '@/lib/thermo/evaluate';
import { builtinLookup } from '@/lib/thermo/species-library';
import { loadChem } from '@/lib/thermo/structure/chem';
import { structureLookup, type StructureLookup } from '@/lib/thermo/structure/structure-lookup';
import { thermoErrorOf } from './thermo-error-of';

let lookup: StructureLookup;
beforeAll(async () => {
  lookup = structureLookup(builtinLookup, await loadChem());
});

const suggestionsFor = (equation: string): string[] => {
  const err = thermoErrorOf(() => evaluateStep({ equation }, { lookup }));
  expect(err.code).toBe('UNKNOWN_SPECIES');
  return (err.details!.unknown as { suggestions: string[] }[])[0]!.suggestions;
};

describe('suggestions for an unknown formula key', () => {
  it('offers C7H8O isomers by name in the phase asked for (benzyl alcohol, cresols, anisole), never toluene', () => {
    const s = suggestionsFor('C7H8O(l) -> C7H8O(g)');
    expect(s.length).toBeGreaterThanOrEqual(4);
    expect(s.slice(0, 4).every((x) => x.endsWith('(l)'))).toBe(true);
    expect(s).toContain('benzyl alcohol(l)');
    expect(s.join(' ')).not.toMatch(/toluene|C6H5CH3/);
    for (const name of s.slice(0, 4)) expect(lookup.get(lookup.resolveAlias(name.replace(/\(l\)$/, ''), 'l')!)!.formula).toBe('C7H8O');
  });

  it('offers aniline among the C6H7N isomers, not toluene', () => {
    const s = suggestionsFor('C6H7N(l) + HCl(g) -> C6H8ClN(s)');
    expect(s).toContain('aniline(l)');
    expect(s.join(' ')).not.toMatch(/toluene|C6H5CH3/);
  });

  it('knows aniline by name, so there is nothing to suggest', () => {
    expect(evaluateStep({ equation: 'aniline(l) -> aniline(g)' }, { lookup }).species.map((s) => s.name)).toEqual(['aniline', 'aniline']);
  });
});
