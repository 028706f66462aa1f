import { describe, expect, it } from 'vitest';
import { reactionQuotient } from '@/lib/thermo/conditions';
import { makeSpeciesMatcher } from '@/lib/thermo/species-matcher';
import { rx } from './reaction-test-species';
import { thermoErrorOf } from './thermo-error-of';

const shift = rx({ 'CO(g)': -1, 'H2O(g)': -1, 'CO2(g)': 1, 'H2(g)': 1 });
const calcite = rx({ 'CaCO3(s)': -1, 'CaO(s)': 1, 'CO2(g)': 1 });
const acetic = rx({ 'CH3COOH(aq)': -1, 'CH3COO-(aq)': 1, 'H+(aq)': 1 });
const carbonic = rx({ 'CO2(aq)': -1, 'H2O(l)': -1, 'HCO3-(aq)': 1, 'H+(aq)': 1 });
const q = (species: ReturnType<typeof rx>, maps: Parameters<typeof reactionQuotient>[1], p0 = 1) =>
  reactionQuotient(species, maps, makeSpeciesMatcher(species), p0);

describe('reaction quotient', () => {
  it('is null without any pressure or concentration', () => {
    expect(q(shift, {}).lnQ).toBeNull();
  });

  it('uses p/p° for gases: Q = (1·4)/(2·8) bar⁰', () => {
    const r = q(shift, { pressures: { 'CO(g)': '2 bar', 'H2O(g)': '8 bar', 'CO2(g)': '1 bar', 'H2(g)': '4 bar' } });
    expect(r.lnQ).toBeCloseTo(Math.log(4 / 16), 12);
    expect(r.warnings).toEqual([]);
  });

  it('divides by the chosen standard pressure (1 atm)', () => {
    const r = q(calcite, { pressures: { 'CO2(g)': '1.01325 bar' } }, 1.01325);
    expect(r.lnQ).toBeCloseTo(0, 12);
  });

  it('applies fugacity and activity coefficients', () => {
    const g = q(calcite, { pressures: { 'CO2(g)': '10 bar' }, fugacityCoefficients: { 'CO2(g)': 0.9 } });
    expect(g.lnQ).toBeCloseTo(Math.log(9), 12);
    const a = q(acetic, {
      concentrations: { 'CH3COOH(aq)': '0.1 mol/L', 'CH3COO-(aq)': '0.01 M', 'H+(aq)': '1 mmol/L' },
      activityCoefficients: { 'CH3COO-(aq)': 0.9, 'H+(aq)': 0.9 },
    });
    expect(a.lnQ).toBeCloseTo(Math.log((0.009 * 0.0009) / 0.1), 12);
  });

  it('gives pure solids and the solvent water activity 1, and lists defaulted species', () => {
    const r = q(carbonic, { concentrations: { 'CO2(aq)': '0.01 M' } });
    expect(r.activities['H2O(l)']).toBe(1);
    expect(r.lnQ).toBeCloseTo(-Math.log(0.01), 12);
    expect(r.defaulted).toEqual(['HCO3-(aq)', 'H+(aq)']);
    expect(r.warnings[0]?.code).toBe('DEFAULT_ACTIVITY');
    expect(r.warnings[0]?.message).toMatch(/HCO3-\(aq\), H\+\(aq\)/);
  });

  it('matches map keys written with spaces', () => {
    expect(q(calcite, { pressures: { ' CO2 (g) ': '2 bar' } }).lnQ).toBeCloseTo(Math.log(2), 12);
  });

  it('rejects zero activity inside Q with ZERO_ACTIVITY and the field', () => {
    const err = thermoErrorOf(() => q(shift, { pressures: { 'CO2(g)': '0 bar' } }));
    expect(err.code).toBe('ZERO_ACTIVITY');
    expect(err.field).toBe('pressures.CO2(g)');
  });

  it('rejects negative pressures, pressures on solids and species not in the equation', () => {
    expect(thermoErrorOf(() => q(shift, { pressures: { 'CO(g)': '-1 bar' } })).code).toBe('INVALID_VALUE');
    const solid = thermoErrorOf(() => q(calcite, { pressures: { 'CaCO3(s)': '1 bar' } }));
    expect(solid.code).toBe('INVALID_VALUE');
    expect(solid.message).toMatch(/CaCO3\(s\) is a solid/);
    expect(solid.field).toBe('pressures.CaCO3(s)');
    const stranger = thermoErrorOf(() => q(calcite, { pressures: { 'N2(g)': '1 bar' } }));
    expect(stranger.field).toBe('pressures.N2(g)');
  });

  it('rejects a concentration for a gas and a fugacity coefficient without a pressure', () => {
    expect(thermoErrorOf(() => q(calcite, { concentrations: { 'CO2(g)': '1 M' } })).code).toBe('INVALID_VALUE');
    const phi = thermoErrorOf(() => q(shift, { pressures: { 'CO(g)': '1 bar' }, fugacityCoefficients: { 'H2(g)': 1.1 } }));
    expect(phi.field).toBe('fugacityCoefficients.H2(g)');
  });
});
