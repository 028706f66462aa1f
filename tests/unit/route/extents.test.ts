import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { evaluateStep } from '@/lib/thermo';
import { evaluateRoute } from '@/lib/thermo/route';
import { HCL_SYNTHESIS, NH3_SYNTHESIS, NH4CL_FORMATION, ammoniumChlorideTree, chain } from './route-fixtures';

const byId = (r: ReturnType<typeof evaluateRoute>, id: string) => r.steps.find((s) => s.id === id)!;

describe('extents', () => {
  it('divides by each yield along a 2-step chain (yields 0.5): ξ(salt) = 1/0.5 = 2, ξ(NH3) = 2·1/(2·0.5) = 2', () => {
    const r = evaluateRoute(chain('NH4Cl(s)', [NH3_SYNTHESIS, NH4CL_FORMATION], ['NH3(g)'], [{ yield: 0.5 }, { yield: 0.5 }]), { lookup: nbsLookup });
    expect(byId(r, 's2').extent_mol).toBe(2);
    expect(byId(r, 's1').extent_mol).toBe(2);
  });

  it('follows the coefficients: 1 mol NH4Cl needs ½ mol of ammonia synthesis and ½ of HCl synthesis', () => {
    const r = evaluateRoute(ammoniumChlorideTree(), { lookup: nbsLookup });
    expect(byId(r, 'salt').extent_mol).toBe(1);
    expect(byId(r, 'nh3').extent_mol).toBe(0.5);
    expect(byId(r, 'hcl').extent_mol).toBe(0.5);
  });

  it('scales every extent and energy with targetAmount', () => {
    const one = evaluateRoute(ammoniumChlorideTree(), { lookup: nbsLookup });
    const five = evaluateRoute({ ...ammoniumChlorideTree(), targetAmount: '5000 mmol' }, { lookup: nbsLookup });
    for (const s of one.steps) {
      const t = byId(five, s.id);
      expect(t.extent_mol).toBeCloseTo(5 * s.extent_mol!, 12);
      expect(t.deltaG0_kJ).toBeCloseTo(5 * s.deltaG0_kJ!, 9);
    }
    expect(five.overall.deltaG0_kJ).toBeCloseTo(5 * one.overall.deltaG0_kJ, 9);
  });

  it('sums what one step feeds to several consumers (the larger species requirement sets ξ)', () => {
    // s1 feeds H2 to both the NH3 and the HCl step: 3·½ + 1·½ = 2 mol H2 → ξ = 2 (1 mol H2 per mol).
    const r = evaluateRoute({
      ...ammoniumChlorideTree(),
      steps: [...ammoniumChlorideTree().steps, { id: 'h2', equation: 'CH4(g) + 2 H2O(g) -> CO2(g) + 4 H2(g)' }],
      links: [
        ...ammoniumChlorideTree().links!,
        { from: 'h2', to: 'nh3', species: 'H2(g)' },
        { from: 'h2', to: 'hcl', species: 'H2(g)' },
      ],
    }, { lookup: nbsLookup });
    expect(byId(r, 'h2').extent_mol).toBeCloseTo(2 / 4, 12);
  });

  it('gives each step ξ·ΔG, using ΔG at its conditions when they are given', () => {
    const conditions = { pressures: { 'NH3(g)': '0.2 bar', 'HCl(g)': '0.3 bar' } };
    const req = ammoniumChlorideTree();
    req.steps = req.steps.map((s) => (s.id === 'salt' ? { ...s, ...conditions, yield: 0.8 } : s));
    const r = evaluateRoute(req, { lookup: nbsLookup });
    const alone = evaluateStep({ equation: NH4CL_FORMATION, ...conditions }, { lookup: nbsLookup });
    const salt = byId(r, 'salt');
    expect(salt.extent_mol).toBe(1 / 0.8);
    expect(salt.deltaG_kJ).toBeCloseTo(alone.deltaG_kJ! / 0.8, 9);
    expect(salt.deltaG0_kJ).toBeCloseTo(alone.deltaG0_kJ / 0.8, 9);
    expect(salt.deltaG_kJ).not.toBeCloseTo(salt.deltaG0_kJ!, 3);
  });
});

describe('links and connectivity', () => {
  it('refuses a link across phases by name, with the phase change and its ΔG°, instead of dropping it silently (NBS 1982: ΔfG° CH3OH(g) −161.96, (l) −166.27 kJ/mol)', () => {
    const r = evaluateRoute({
      target: 'CH3OCH3(g)',
      steps: [
        { id: 'make', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)' },
        { id: 'use', equation: '2 CH3OH(l) -> CH3OCH3(g) + H2O(l)' },
      ],
      links: [{ from: 'make', to: 'use', species: 'CH3OH(g)' }],
    }, { lookup: nbsLookup });
    const w = r.warnings.find((x) => x.code === 'LINK_PHASE')!;
    expect(w.steps).toEqual(['make', 'use']);
    expect(w.species).toEqual(['CH3OH(g)', 'CH3OH(l)']);
    expect(w.message).toMatch(/phase change/);
    expect(w.message).toContain(`${(-166.27 - -161.96).toFixed(1)} kJ/mol`);
    expect(r.warnings.some((x) => x.code === 'LINK_SPECIES')).toBe(false);
  });

  it('warns LINK_SPECIES when the link species is not made upstream or not used downstream, and goes on', () => {
    const req = chain('NH4Cl(s)', [NH3_SYNTHESIS, NH4CL_FORMATION], ['N2(g)']);
    const r = evaluateRoute(req, { lookup: nbsLookup });
    const w = r.warnings.find((x) => x.code === 'LINK_SPECIES')!;
    expect(w.steps).toEqual(['s1', 's2']);
    expect(w.species).toEqual(['N2(g)']);
    expect(w.message).toMatch(/s1 does not produce it and s2 does not consume it/);
    expect(byId(r, 's2').extent_mol).toBe(1);
    expect(byId(r, 's1').extent_mol).toBeNull();
  });

  it('warns DISCONNECTED for a step with no path to the final step, evaluates it and leaves it out of the totals', () => {
    const req = ammoniumChlorideTree();
    req.steps.push({ id: 'stray', equation: 'CaCO3(s) -> CaO(s) + CO2(g)' });
    const r = evaluateRoute(req, { lookup: nbsLookup });
    const stray = byId(r, 'stray');
    expect(stray.result).not.toBeNull();
    expect(stray.class).toBe('uphill');
    expect(stray.extent_mol).toBeNull();
    expect(stray.deltaG_kJ).toBeNull();
    expect(r.warnings.find((w) => w.code === 'DISCONNECTED')?.steps).toEqual(['stray']);
    expect(r.overall.deltaG0_kJ).toBeCloseTo(evaluateRoute(ammoniumChlorideTree(), { lookup: nbsLookup }).overall.deltaG0_kJ, 9);
  });

  it('withholds the totals when no step makes the target, or several final steps make it; the steps keep their results', () => {
    const none = evaluateRoute({ ...ammoniumChlorideTree(), target: 'CaO(s)' }, { lookup: nbsLookup });
    expect(none.totalsWithheld?.message).toMatch(/No step makes the target CaO\(s\)/);
    expect(none.totalsWithheld?.field).toBe('target');
    expect(none.steps.map((s) => s.class)).not.toContain('error');
    expect(none.steps.every((s) => s.extent_mol === null && s.deltaG_kJ === null)).toBe(true);
    const two = { target: 'NH3(g)', steps: [{ id: 'a', equation: NH3_SYNTHESIS }, { id: 'b', equation: NH3_SYNTHESIS }] };
    expect(evaluateRoute(two, { lookup: nbsLookup }).totalsWithheld?.message).toMatch(/Several steps make the target NH3\(g\).*a, b/);
    expect(evaluateRoute(ammoniumChlorideTree(), { lookup: nbsLookup }).totalsWithheld).toBeNull();
  });
});

describe('a bad step does not break the rest', () => {
  it('marks an unknown-species step as error, keeps its extent from parsing, evaluates the others', () => {
    const req = ammoniumChlorideTree();
    // Liquid chlorine is not in the library: unknown species, but the equation parses.
    req.steps = req.steps.map((s) => (s.id === 'hcl' ? { ...s, equation: 'H2(g) + Cl2(l) -> 2 HCl(g)' } : s));
    const r = evaluateRoute(req, { lookup: nbsLookup });
    const bad = byId(r, 'hcl');
    expect(bad.class).toBe('error');
    expect(bad.result).toBeNull();
    expect(bad.error?.code).toBe('UNKNOWN_SPECIES');
    expect(bad.error?.field).toBe('steps.2.equation'); // input index: salt, nh3, hcl
    expect(bad.extent_mol).toBe(0.5);
    expect(bad.deltaG_kJ).toBeNull();
    expect(byId(r, 'nh3').class).toBe('downhill');
    expect(r.warnings.find((w) => w.code === 'STEP_ERROR')?.steps).toEqual(['hcl']);
    const good = evaluateStep({ equation: NH3_SYNTHESIS }, { lookup: nbsLookup }).deltaG0_kJ * 0.5 + evaluateStep({ equation: NH4CL_FORMATION }, { lookup: nbsLookup }).deltaG0_kJ;
    expect(r.overall.deltaG0_kJ).toBeCloseTo(good, 9);
  });

  it('marks an unbalanced step as error', () => {
    const r = evaluateRoute(chain('NH4Cl(s)', ['N2(g) + H2(g) -> NH3(g)', NH4CL_FORMATION], ['NH3(g)']), { lookup: nbsLookup });
    expect(byId(r, 's1').error?.code).toBe('UNBALANCED');
    expect(byId(r, 's2').class).toBe('downhill');
  });

  it('warns EXTENT_UNKNOWN upstream of a step that cannot be parsed', () => {
    // s2 (two arrows) cannot be parsed; s3 decomposes the salt again and makes the target.
    const req = chain('NH3(g)', [HCL_SYNTHESIS, 'NH3(g) + HCl(g) -> -> NH4Cl(s)', 'NH4Cl(s) -> NH3(g) + HCl(g)'], ['HCl(g)', 'NH4Cl(s)']);
    const r = evaluateRoute(req, { lookup: nbsLookup });
    expect(byId(r, 's2').error?.code).toBe('PARSE_ERROR');
    const unknown = r.warnings.filter((w) => w.code === 'EXTENT_UNKNOWN').flatMap((w) => w.steps);
    expect(unknown).toEqual(expect.arrayContaining(['s1', 's2']));
    expect(byId(r, 's3').extent_mol).toBe(1);
  });
});

describe('limits that keep the extents finite', () => {
  it('refuses a yield below 0.0001 % and a target over 1e9 mol with route errors, not an engine fault', () => {
    const step = { id: 's1', equation: 'H2(g) + 1/2 O2(g) -> H2O(l)' };
    expect(() => evaluateRoute({ target: 'H2O(l)', steps: [{ ...step, yield: 1e-308 }] }, { lookup: nbsLookup })).toThrow(/yield/);
    // An amount out of bounds holds back the totals only; the step keeps its own result.
    const huge = evaluateRoute({ target: 'H2O(l)', targetAmount: '1e300 mol', steps: [step] }, { lookup: nbsLookup });
    expect(huge.totalsWithheld).toMatchObject({ field: 'targetAmount' });
    expect(huge.totalsWithheld!.message).toMatch(/at most/);
    expect(huge.steps[0]!.result).not.toBeNull();
    expect(evaluateRoute({ target: 'H2O(l)', steps: [{ ...step, yield: 1e-6 }] }, { lookup: nbsLookup }).steps[0]!.extent_mol).toBeCloseTo(1e6, 0);
  });
});
