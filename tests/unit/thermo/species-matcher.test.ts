import { describe, expect, it } from 'vitest';
import { editDistance } from '@/lib/thermo/edit-distance';
import { makeSpeciesMatcher } from '@/lib/thermo/species-matcher';
import { rx } from './reaction-test-species';

describe('species matcher for request maps', () => {
  const species = rx({ 'C2H5OH(l)': -1, 'O2(g)': -3, 'CO2(g)': 2, 'H2O(l)': 3 });
  species[0]!.asWritten = 'ethanol(l)';
  const match = makeSpeciesMatcher(species, (t) => (t === 'ethyl alcohol(l)' ? 'C2H5OH(l)' : undefined));

  it('matches by text as written, by key, ignoring spaces, and through the canonical-key resolver', () => {
    expect(match('ethanol(l)')?.key).toBe('C2H5OH(l)');
    expect(match('C2H5OH(l)')?.key).toBe('C2H5OH(l)');
    expect(match(' CO2 (g)')?.key).toBe('CO2(g)');
    expect(match('ethyl alcohol(l)')?.key).toBe('C2H5OH(l)');
  });

  it('returns undefined for species not in the equation', () => {
    expect(match('N2(g)')).toBeUndefined();
  });
});

describe('edit distance', () => {
  it.each([
    ['', '', 0],
    ['abc', '', 3],
    ['kitten', 'sitting', 3],
    ['C2H5OH(s)', 'C2H5OH(l)', 1],
  ])('%s → %s = %i', (a, b, d) => {
    expect(editDistance(a, b)).toBe(d);
    expect(editDistance(b, a)).toBe(d);
  });
});
