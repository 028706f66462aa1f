import { describe, expect, it } from 'vitest';
import { evaluateStep } from '@/lib/thermo/evaluate';
import { builtinLookup, layeredLookup, nbsLookup } from '@/lib/thermo/species-library';
import type { SpeciesRecord } from '@/lib/thermo/species-types';

// Invented team values: only the bookkeeping of whose value was used is under test here.
const co2 = builtinLookup.get('CO2(g)')!;
const teamCO2: SpeciesRecord = { ...co2, dfH_kJ: -390, dfG_kJ: -391, source: 'Kestrel Ridge calorimetry run 12', sourceRef: 'team species #1, version 1', flags: [], compilationDifference: null };
const teamNew: SpeciesRecord = { ...co2, key: 'C2O4(g)', formula: 'C2O4', elements: { C: 2, O: 4 }, aliases: ['test dimer'], name: 'test dimer', dfH_kJ: -780, dfG_kJ: -780, source: 'Estimated (test)', sourceRef: 'team species #2, version 1', cp: null, flags: [] };

describe('species provenance in an evaluation', () => {
  it('names the built-in library when no team species is involved', () => {
    const r = evaluateStep({ equation: 'C(s) + O2(g) -> CO2(g)' }, { lookup: nbsLookup });
    expect(r.species.map((s) => [s.key, s.origin, s.override])).toEqual([['C(s)', 'library', false], ['O2(g)', 'library', false], ['CO2(g)', 'library', false]]);
  });

  it('marks a team value that replaces a built-in one as team and override, and warns', () => {
    const r = evaluateStep({ equation: 'C(s) + O2(g) -> CO2(g)' }, { lookup: layeredLookup([teamCO2]) });
    expect(r.deltaG0_kJ).toBe(-391);
    expect(r.species.find((s) => s.key === 'CO2(g)')).toMatchObject({ origin: 'team', override: true, source: 'Kestrel Ridge calorimetry run 12' });
    expect(r.species.find((s) => s.key === 'O2(g)')).toMatchObject({ origin: 'library', override: false });
    expect(r.warnings.find((w) => w.code === 'OVERRIDE')?.message).toMatch(/team value used .* instead of the built-in −?-?394\.359/);
  });

  it('marks a team species of a new key as team without override', () => {
    const r = evaluateStep({ equation: '2 CO2(g) -> C2O4(g)' }, { lookup: layeredLookup([teamNew]) });
    expect(r.species.find((s) => s.key === 'C2O4(g)')).toMatchObject({ origin: 'team', override: false });
    expect(r.warnings.map((w) => w.code)).not.toContain('OVERRIDE');
  });
});
