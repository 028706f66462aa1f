import { describe, expect, it } from 'vitest';
import { phaseWarnings } from '@/lib/thermo/phase-checks';
import { builtinLookup } from '@/lib/thermo/species-library';
import { rx } from './reaction-test-species';

const codes = (species: ReturnType<typeof rx>, T: number, p?: Map<string, number>) =>
  phaseWarnings(species, T, builtinLookup, p).map((w) => `${w.code} ${w.species?.join(',') ?? ''}`);

describe('phase and range warnings', () => {
  const vaporise = rx({ 'H2O(l)': -1, 'H2O(g)': 1 });

  it('says nothing for liquid water at 350 K, and PHASE_CHANGE above its boiling point', () => {
    expect(codes(vaporise, 350)).toEqual(['PHASE_CHANGE H2O(g)']);
    const hot = phaseWarnings(vaporise, 400, builtinLookup);
    const liquid = hot.find((w) => w.species?.[0] === 'H2O(l)');
    expect(liquid?.code).toBe('PHASE_CHANGE');
    expect(liquid?.message).toMatch(/373\.\d+ K/);
  });

  it('does not warn about water vapour below its vapour pressure (0.01 bar at 298.15 K; p_vap ≈ 0.0317 bar)', () => {
    const w = codes(rx({ 'H2(g)': -1, 'O2(g)': -0.5, 'H2O(g)': 1 }), 298.15, new Map([['H2O(g)', 0.01]]));
    expect(w).toEqual([]);
    expect(codes(rx({ 'H2(g)': -1, 'O2(g)': -0.5, 'H2O(g)': 1 }), 298.15)).toEqual(['PHASE_CHANGE H2O(g)']);
  });

  it('warns out of range and of melting past the end of a solid record (Al(s) above 933.61 K)', () => {
    expect(codes(rx({ 'Al(s)': -2, 'O2(g)': -1.5, 'Al2O3(s)': 1 }), 1200)).toEqual([
      'T_OUT_OF_RANGE Al(s)',
      'PHASE_CHANGE Al(s)',
    ]);
  });

  it('chains the α/γ records of iron without any warning at 1300 K', () => {
    expect(codes(rx({ 'Fe(s)': -1 }), 1300)).toEqual([]);
  });

  it('warns CONSTANT_CP for species without a polynomial away from 298.15 K only', () => {
    const zinc = rx({ 'ZnO(s)': -1, 'C(s)': -1, 'Zn(s)': 1, 'CO(g)': 1 });
    expect(codes(zinc, 298.15)).toEqual([]);
    expect(codes(zinc, 350)).toEqual(['CONSTANT_CP ZnO(s)']);
    expect(codes(zinc, 600)).toEqual(['T_OUT_OF_RANGE ZnO(s)', 'CONSTANT_CP ZnO(s)']);
  });

  it('warns that water freezes below its liquid record (273.15 K)', () => {
    expect(codes(rx({ 'H2O(l)': -1 }), 260)).toEqual(['T_OUT_OF_RANGE H2O(l)', 'PHASE_CHANGE H2O(l)']);
  });
});
