// A compared route whose totals wait says why in words, naming steps by their labels, never their ids (issue 19).
import { describe, expect, it } from 'vitest';
import { buildComparison } from '@/lib/compare/build-comparison';
import { nbsLookup } from '@/lib/thermo/species-library';
import { CARBON_BURN, STEAM_REFORMING, WATER_GAS_SHIFT, forComparison, oneStep } from './compare-fixtures';

describe('why a compared route has no totals', () => {
  it('names the steps of a loop of links by their labels', () => {
    const looped = forComparison({
      target: 'CO2(g)',
      steps: [{ id: 's-0a1b2c3d', equation: STEAM_REFORMING }, { id: 's-4e5f6a7b', equation: WATER_GAS_SHIFT }],
      links: [{ from: 's-0a1b2c3d', to: 's-4e5f6a7b', species: 'CO(g)' }, { from: 's-4e5f6a7b', to: 's-0a1b2c3d', species: 'H2O(g)' }],
    });
    const { routes } = buildComparison([looped, forComparison(oneStep('CO2(g)', CARBON_BURN))], {}, nbsLookup);
    const message = routes[0]!.error?.message ?? '';
    expect(message).toMatch(/^The links form a cycle: Step \d \(.+\) → Step \d \(.+\) → Step \d \(.+\)$/);
    expect(message).toContain('Step 1 (steam reforming of methane)');
    expect(message).not.toMatch(/s-[0-9a-f]{8}/);
    expect(routes[1]!.error).toBeNull();
  });

  it('says an unknown target in words, not as a request field', () => {
    const { routes } = buildComparison([forComparison(oneStep('Unobtainium(g)', CARBON_BURN))], {}, nbsLookup);
    expect(routes[0]!.error?.message).toMatch(/^Target: .*Unobtainium/);
  });
});
