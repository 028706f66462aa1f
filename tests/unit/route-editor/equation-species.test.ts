import { describe, expect, it } from 'vitest';
import { equationSpecies, sameSpecies, speciesPhase } from '@/lib/route-editor/equation-species';

describe('equationSpecies', () => {
  it('splits on the arrow and " + ", dropping coefficients', () => {
    expect(equationSpecies('CH4(g) + H2O(g) -> CO(g) + 3 H2(g)')).toEqual({ reactants: ['CH4(g)', 'H2O(g)'], products: ['CO(g)', 'H2(g)'] });
    expect(equationSpecies('CH4(g) + 1/2 O2(g) → CO(g) + 2 H2(g)').reactants).toEqual(['CH4(g)', 'O2(g)']);
    expect(equationSpecies('2 CH3OH(g) <=> CH3OCH3(g) + H2O(g)').reactants).toEqual(['CH3OH(g)']);
    expect(equationSpecies('0.5 N2(g) + 1.5 H2(g) = NH3(g)').reactants).toEqual(['N2(g)', 'H2(g)']);
  });

  it('keeps charges and parenthesised groups intact', () => {
    expect(equationSpecies('CH3COOH(aq) <=> CH3COO-(aq) + H+(aq)').products).toEqual(['CH3COO-(aq)', 'H+(aq)']);
    expect(equationSpecies('C2H4(g) + 1/2 O2(g) -> (CH2)2O(g)').products).toEqual(['(CH2)2O(g)']);
  });

  it('reads an unfinished equation without throwing', () => {
    expect(equationSpecies('')).toEqual({ reactants: [], products: [] });
    expect(equationSpecies('CO(g) + ')).toEqual({ reactants: ['CO(g)'], products: [] });
    expect(equationSpecies('CO(g) +')).toEqual({ reactants: ['CO(g)'], products: [] });
    expect(equationSpecies('CO(g) ->')).toEqual({ reactants: ['CO(g)'], products: [] });
  });

  it('compares species without spaces and reads the phase', () => {
    expect(sameSpecies('H2 (g)', 'H2(g)')).toBe(true);
    expect(sameSpecies('H2(g)', 'H2O(g)')).toBe(false);
    expect(speciesPhase('NH3(aq)')).toBe('aq');
    expect(speciesPhase('C(cr)')).toBe('s');
    expect(speciesPhase('CH3OH')).toBe('unknown');
  });
});
