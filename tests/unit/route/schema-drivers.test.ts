import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { builtinLookup, evaluateStep, parseEquation } from '@/lib/thermo';
import { DEFAULT_DRIVERS, RouteEvaluateRequestSchema } from '@/lib/thermo/route';
import { speciesKey } from '@/lib/thermo/route/stoichiometry';

const valid = {
  target: 'CH3OH(g)',
  targetAmount: '1 mol',
  steps: [{ id: 's1', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K', pressures: { 'H2(g)': '50 bar' }, yield: 0.9 }],
  links: [],
  marginalThreshold_kJ: -17,
};

describe('RouteEvaluateRequestSchema', () => {
  it('accepts a full request', () => {
    expect(RouteEvaluateRequestSchema.safeParse(valid).success).toBe(true);
  });

  it.each([
    ['empty steps', { ...valid, steps: [] }],
    ['yield 0', { ...valid, steps: [{ ...valid.steps[0], yield: 0 }] }],
    ['yield above 1', { ...valid, steps: [{ ...valid.steps[0], yield: 1.01 }] }],
    ['positive threshold', { ...valid, marginalThreshold_kJ: 5 }],
    ['id too long', { ...valid, steps: [{ ...valid.steps[0], id: 'x'.repeat(65) }] }],
    ['empty id', { ...valid, steps: [{ ...valid.steps[0], id: '' }] }],
    ['unknown step field', { ...valid, steps: [{ ...valid.steps[0], colour: 'red' }] }],
    ['unknown top-level field', { ...valid, extra: 1 }],
    ['link without species', { ...valid, links: [{ from: 's1', to: 's1' }] }],
  ])('rejects %s', (_, body) => {
    expect(RouteEvaluateRequestSchema.safeParse(body).success).toBe(false);
  });
});

describe('DEFAULT_DRIVERS (lib/thermo/data/driver-reactions.json)', () => {
  it('has 8–12 drivers with unique ids, basis "common practice"', () => {
    expect(DEFAULT_DRIVERS.length).toBeGreaterThanOrEqual(8);
    expect(DEFAULT_DRIVERS.length).toBeLessThanOrEqual(12);
    expect(new Set(DEFAULT_DRIVERS.map((d) => d.id)).size).toBe(DEFAULT_DRIVERS.length);
    for (const d of DEFAULT_DRIVERS) expect(d.basis).toBe('common practice');
  });

  it.each(DEFAULT_DRIVERS.map((d) => [d.id, d.equation]))('%s: every species is in the library, and it is strongly downhill at 298.15 K', (_, equation) => {
    const eq = parseEquation(equation!);
    for (const t of [...eq.reactants, ...eq.products]) expect(builtinLookup.get(speciesKey(t.species.raw, builtinLookup))).toBeDefined();
    expect(evaluateStep({ equation: equation! }, { lookup: nbsLookup }).deltaG0_kJ).toBeLessThan(-50);
  });
});
