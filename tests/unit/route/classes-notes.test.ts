// Step classes (on ΔG per mol of reaction), the threshold edge, totals and safety notes.
// Reaction values: NBS Tables 1982 (Wagman et al.); thresholds −17 kJ/mol and −100 kJ/mol are common practice.
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { evaluateStep } from '@/lib/thermo';
import { evaluateRoute } from '@/lib/thermo/route';
import { classify } from '@/lib/thermo/route/step-notes';
import { NH4CL_FORMATION, ammoniumChlorideTree } from './route-fixtures';
import { single } from './remedy-helpers';

const METHANOL = 'CO(g) + 2 H2(g) -> CH3OH(g)';

describe('classify', () => {
  it.each([
    [0.001, -17, 'uphill'],
    [0, -17, 'marginal'],
    [-16.999, -17, 'marginal'],
    [-17, -17, 'downhill'],
    [-17.001, -17, 'downhill'],
    [0, 0, 'downhill'],
    [1e-12, 0, 'uphill'],
  ] as const)('ΔG %s with threshold %s → %s', (dG, threshold, cls) => {
    expect(classify(dG, threshold)).toBe(cls);
  });
});

describe('classes in a route', () => {
  // Methanol synthesis: ΔG° = −161.96 − (−137.168) = −24.792 kJ/mol (NBS 1982).
  const dG = evaluateStep({ equation: METHANOL }, { lookup: nbsLookup }).deltaG0_kJ;

  it('uses the default −17 kJ/mol threshold (≈ K = 10^3 at 298 K, common practice)', () => {
    expect(dG).toBeCloseTo(-24.792, 3);
    expect(single('CH3OH(g)', { equation: METHANOL }).step.class).toBe('downhill');
  });

  it('is downhill exactly at the threshold and marginal just above it', () => {
    expect(single('CH3OH(g)', { equation: METHANOL }, { marginalThreshold_kJ: dG }).step.class).toBe('downhill');
    expect(single('CH3OH(g)', { equation: METHANOL }, { marginalThreshold_kJ: dG - 1e-6 }).step.class).toBe('marginal');
  });

  it('classes on ΔG at the conditions: NH4Cl formation at 1e-8 bar NH3 and HCl turns uphill (ΔG° −91.12, RT ln Q ≈ +91.3)', () => {
    const { step } = single('NH4Cl(s)', { equation: NH4CL_FORMATION, pressures: { 'NH3(g)': '1e-8 bar', 'HCl(g)': '1e-8 bar' } });
    expect(step.result!.deltaG0_kJ).toBeLessThan(0);
    expect(step.class).toBe('uphill');
    expect(step.remedies.length).toBeGreaterThan(0);
  });

  it('passes the engine’s sign-uncertainty flag through (N2O4 ⇌ 2 NO2 near equilibrium)', () => {
    const near = { equation: 'N2O4(g) -> 2 NO2(g)', pressures: { 'N2O4(g)': '1 bar', 'NO2(g)': '0.5 bar' } };
    const engine = evaluateStep(near, { lookup: nbsLookup });
    expect(engine.uncertainty.signUncertain).toBe(true);
    expect(single('NO2(g)', near).step.signUncertain).toBe(true);
    expect(single('NO2(g)', { equation: 'N2O4(g) -> 2 NO2(g)' }).step.signUncertain).toBe(false);
  });

  it('counts classes, the largest uphill (scaled) and the smallest driving force (per mol of reaction)', () => {
    const req = ammoniumChlorideTree();
    req.steps.push({ id: 'stray', equation: 'N2O4(g) -> 2 NO2(g)' });
    const r = evaluateRoute({ ...req, marginalThreshold_kJ: -50 }, { lookup: nbsLookup });
    // NH3 synthesis −32.90 (marginal at −50), HCl −190.60, NH4Cl −91.12, stray +4.73 (uphill, disconnected).
    expect(r.overall.marginalSteps).toBe(1);
    expect(r.overall.uphillSteps).toBe(1);
    expect(r.overall.largestUphill_kJ).toBeNull();
    expect(r.overall.smallestDrivingForce_kJ).toBeCloseTo(-4.73, 2);
    expect(r.overall.deltaG_kJ).toBe(r.steps[r.steps.length - 1]!.cumulative_kJ);
  });

  it('largestUphill_kJ is the largest positive ξ·ΔG', () => {
    const r = evaluateRoute({ target: 'CaO(s)', targetAmount: '3 mol', steps: [{ id: 'c', equation: 'CaCO3(s) -> CaO(s) + CO2(g)' }] }, { lookup: nbsLookup });
    expect(r.overall.largestUphill_kJ).toBeCloseTo(3 * 130.401, 6);
  });
});

describe('safety notes', () => {
  it('heat-release note below −100 kJ/mol (NH4Cl formation, ΔH° −176.01 kJ/mol), scaled total included', () => {
    const { step } = single('NH4Cl(s)', { equation: NH4CL_FORMATION }, { targetAmount: '2 mol' });
    const note = step.notes.find((n) => n.code === 'HEAT_RELEASE')!;
    expect(note.value).toBeCloseTo(-176.013, 3);
    expect(note.message).toMatch(/process-safety/);
    expect(note.message).toContain('352');
  });

  it('no heat note for methanol synthesis (ΔH° −90.13 kJ/mol), no gas note when gas is consumed', () => {
    expect(single('CH3OH(g)', { equation: METHANOL }).step.notes).toEqual([]);
  });

  it('gas-evolution note when Δn(gas) > 0 (calcination releases 1 mol CO2)', () => {
    const note = single('CaO(s)', { equation: 'CaCO3(s) -> CaO(s) + CO2(g)' }).step.notes.find((n) => n.code === 'GAS_EVOLUTION')!;
    expect(note.value).toBe(1);
    expect(note.message).toMatch(/process-safety/);
  });
});

describe('remedies: false', () => {
  it('gives the same ladder and classes without any remedy', () => {
    const request = {
      target: 'CH3OH(g)',
      steps: [
        { id: 's1', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '700 K' },
        { id: 's2', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K' },
      ],
      links: [{ from: 's1', to: 's2', species: 'CO(g)' }],
    };
    const full = evaluateRoute(request, { lookup: nbsLookup });
    const lean = evaluateRoute(request, { lookup: nbsLookup, remedies: false });
    expect(full.steps.some((s) => s.remedies.length > 0)).toBe(true);
    expect(lean.steps.every((s) => s.remedies.length === 0)).toBe(true);
    expect(lean.steps.map((s) => [s.class, s.cumulative_kJ])).toEqual(full.steps.map((s) => [s.class, s.cumulative_kJ]));
    expect(lean.overall).toEqual(full.overall);
  });
});
