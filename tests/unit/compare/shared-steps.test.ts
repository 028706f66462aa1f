import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { buildComparison } from '@/lib/compare/build-comparison';
import { normaliseEquation, sharedEquations } from '@/lib/compare/shared-steps';
import { CARBON_BURN, WATER_GAS_SHIFT, forComparison, oneStep, reformingThenShift } from './compare-fixtures';

describe('normaliseEquation', () => {
  it('ignores spacing, term order and the arrow used', () => {
    const key = normaliseEquation(WATER_GAS_SHIFT, nbsLookup);
    expect(key).not.toBeNull();
    expect(normaliseEquation('H2O(g)+CO(g) = H2(g) + CO2(g)', nbsLookup)).toBe(key);
    expect(normaliseEquation('CO(g)  +  H2O(g) ⇌ CO2(g) + H2(g)', nbsLookup)).toBe(key);
  });

  it('keeps the coefficients as written and the direction', () => {
    expect(normaliseEquation('2 CO(g) + 2 H2O(g) -> 2 CO2(g) + 2 H2(g)', nbsLookup)).not.toBe(normaliseEquation(WATER_GAS_SHIFT, nbsLookup));
    expect(normaliseEquation('CO2(g) + H2(g) -> CO(g) + H2O(g)', nbsLookup)).not.toBe(normaliseEquation(WATER_GAS_SHIFT, nbsLookup));
    expect(normaliseEquation('CO(g) + 2 H2(g) -> CH3OH(g)', nbsLookup)).toBe('CO(g) + 2 H2(g) -> CH3OH(g)');
  });

  it('is null for an equation that cannot be read', () => {
    expect(normaliseEquation('CO(g) + H2O(g)', nbsLookup)).toBeNull();
    expect(normaliseEquation('', nbsLookup)).toBeNull();
  });
});

describe('sharedEquations', () => {
  it('lists equations found in two or more routes, with the steps holding them', () => {
    const a = forComparison(reformingThenShift(), { id: 10 });
    const b = forComparison({ target: 'CO2(g)', steps: [{ id: 'shift', equation: 'H2O(g) + CO(g) -> H2(g) + CO2(g)' }] }, { id: 11 });
    const c = forComparison(oneStep('CO2(g)', CARBON_BURN), { id: 12 });
    const { sharedEquations: shared } = buildComparison([a, b, c], {}, nbsLookup);
    expect(shared).toEqual([{ equation: normaliseEquation(WATER_GAS_SHIFT, nbsLookup), routes: [{ routeId: 10, stepIds: ['s2'] }, { routeId: 11, stepIds: ['shift'] }] }]);
  });

  it('does not call a step shared when it repeats within one route only', () => {
    const key = normaliseEquation(CARBON_BURN, nbsLookup);
    expect(sharedEquations([{ routeId: 1, steps: [{ id: 'a', equationKey: key }, { id: 'b', equationKey: key }] }, { routeId: 2, steps: [{ id: 'c', equationKey: null }] }])).toEqual([]);
  });
});
