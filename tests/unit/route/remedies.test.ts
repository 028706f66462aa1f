// Remedies for uphill and marginal steps. Published values: NBS Tables 1982 (Wagman et al.,
// J. Phys. Chem. Ref. Data 11, Suppl. 2), worked by hand; others marked "from memory".
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { R_GAS, evaluateStep } from '@/lib/thermo';
import { DEFAULT_DRIVERS } from '@/lib/thermo/route';
import { MAX_COUPLING_OPTIONS } from '@/lib/thermo/route/remedy-coupling';
import { single } from './remedy-helpers';

const CALCINATION = 'CaCO3(s) -> CaO(s) + CO2(g)';
const DIMER_SPLIT = 'N2O4(g) -> 2 NO2(g)';
const RT298 = (R_GAS * 298.15) / 1000;

// The temperature remedy aims at the route's downhill threshold (default −17 kJ/mol), not at ΔG = 0: a step moved
// only to its zero crossing stays marginal.
const THRESHOLD = -17;

describe('temperature remedy', () => {
  it('raises T for calcination; with ΔCp = 0, ΔG°(T) = ΔH° − TΔS° reaches −17 kJ/mol at (ΔH° + 17)/ΔS°', () => {
    const { temperature } = single('CaO(s)', { equation: CALCINATION, heatCapacity: false });
    const t = temperature[0]!;
    expect(t.direction).toBe('raise');
    expect(t.goal_kJ).toBe(THRESHOLD);
    // ΔG° crosses zero near 1110 K (from memory, ±40 K); that is no longer the offer.
    expect(Math.abs(t.crossover_K! - 1110)).toBeLessThanOrEqual(40);
    // ΔG° is pinned to the tabulated ΔfG°, so ΔS° = (ΔH° − ΔG°)/298.15 K: 178.321, 130.401 kJ/mol (NBS 1982).
    const dS = (178.321 - 130.401) / 298.15;
    expect(t.target_K!).toBeCloseTo((178.321 - THRESHOLD) / dS, 1);
    expect(t.target_K!).toBeGreaterThan(t.crossover_K! + 100);
  });

  it('with heat capacities, calcination at 1 bar CO2 crosses zero near the measured ~1170 K (≈ 898 °C, from memory, ±40 K) and the offer lies beyond it', () => {
    const { temperature, step } = single('CaO(s)', { equation: CALCINATION });
    const t = temperature[0]!;
    expect(t.crossover_K).toBe(step.result!.crossover_K);
    expect(Math.abs(t.crossover_K! - 1170)).toBeLessThanOrEqual(40);
    expect(t.target_K!).toBeGreaterThan(t.crossover_K!);
  });

  it('offers a temperature that makes the step downhill when re-evaluated (ΔG ≤ threshold), and samples both sides', () => {
    const { temperature } = single('CaO(s)', { equation: CALCINATION });
    const t = temperature[0]!;
    expect(t.suggested_K).toBeGreaterThan(t.target_K!);
    expect(evaluateStep({ equation: CALCINATION, temperature: `${t.suggested_K} K` }, { lookup: nbsLookup }).deltaG0_kJ).toBeLessThan(THRESHOLD);
    expect(t.suggestedDeltaG_kJ!).toBeLessThan(THRESHOLD);
    const again = single('CaO(s)', { equation: CALCINATION, temperature: `${t.suggested_K} K` });
    expect(again.step.class).toBe('downhill');
    const at = (T: number) => t.samples.find((s) => Math.abs(s.T_K - T) < 2e-3)!; // samples closer than 1e-3 K are merged
    expect(at(t.target_K! - 50).deltaG0_kJ).toBeGreaterThan(THRESHOLD);
    expect(at(t.target_K! + 50).deltaG0_kJ).toBeLessThan(THRESHOLD);
    expect(at(t.crossover_K! - 50).deltaG0_kJ).toBeGreaterThan(0);
    expect(at(298.15 + 50).deltaG0_kJ).toBeGreaterThan(0);
    expect(t.summary).toMatch(/^Raise the temperature above 1[23]\d\d K, where ΔG° falls below −?-?17 kJ\/mol, the route’s downhill threshold/);
  });

  it('N2O4 → 2 NO2: raise T past (ΔH° + 17)/ΔS° = (57.20 + 17)/0.17598 ≈ 421.6 K (NBS 1982: ΔH° 57.20, ΔG° 4.73 kJ/mol; ±3 K for ΔCp)', () => {
    const t = single('NO2(g)', { equation: DIMER_SPLIT }).temperature[0]!;
    expect(t.direction).toBe('raise');
    const dS = (57.2 - 4.73) / 298.15;
    expect(Math.abs(t.target_K! - (57.2 - THRESHOLD) / dS)).toBeLessThan(3);
    // The old offer, ΔH°/ΔS° ≈ 325 K, would leave the step marginal: ΔG there is ≈ 0, above −17 kJ/mol.
    expect(t.target_K!).toBeGreaterThan(57.2 / dS + 90);
  });

  it('marginal exothermic step: lower T to reach the threshold (methanol synthesis, ΔS° < 0)', () => {
    const { step, temperature } = single('CH3OH(g)', { equation: 'CO(g) + 2 H2(g) -> CH3OH(g)' }, { marginalThreshold_kJ: -30 });
    expect(step.class).toBe('marginal');
    const t = temperature[0]!;
    expect(t.direction).toBe('lower');
    expect(t.goal_kJ).toBe(-30);
    expect(evaluateStep({ equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: `${t.suggested_K} K` }, { lookup: nbsLookup }).deltaG0_kJ).toBeLessThan(-30);
  });

  it('says so when no temperature in the data range helps (water autoionisation, 273–373 K)', () => {
    const t = single('H+(aq)', { equation: 'H2O(l) -> H+(aq) + OH-(aq)' }).temperature[0]!;
    expect(t.direction).toBeNull();
    expect(t.target_K).toBeNull();
    expect(t.summary).toMatch(/^No temperature in the data range/);
  });
});

describe('conditions remedy', () => {
  // K = exp(−4.73/RT) for N2O4 ⇌ 2 NO2 (NBS 1982, ΔG° 4.73 kJ/mol).
  const K = Math.exp(-4.73 / RT298);

  it('N2O4 → 2 NO2: keep p(NO2) below √K bar, or a 1/K-fold excess of N2O4; both re-evaluate to ΔG < 0', () => {
    const { conditions } = single('NO2(g)', { equation: DIMER_SPLIT });
    const product = conditions.find((c) => c.action === 'product-pressure')!;
    const excess = conditions.find((c) => c.action === 'reactant-excess')!;
    expect(product.species).toBe('NO2(g)');
    expect(product.value!).toBeLessThanOrEqual(Math.sqrt(K));
    expect(product.value!).toBeGreaterThan(0.99 * Math.sqrt(K));
    expect(excess.species).toBe('N2O4(g)');
    expect(excess.value!).toBeGreaterThanOrEqual(1 / K);
    expect(excess.value!).toBeLessThan(1.01 / K);
    for (const c of [product, excess]) {
      const r = evaluateStep({ equation: DIMER_SPLIT, ...c.conditions }, { lookup: nbsLookup });
      expect(r.deltaG_kJ!).toBeLessThan(0);
      expect(c.checkedDeltaG_kJ).toBeCloseTo(r.deltaG_kJ!, 9);
    }
    expect(product.lnQ_max).toBeCloseTo(Math.log(K), 6);
  });

  it('starts from the step’s own pressures: with p(N2O4) = 2 bar, p(NO2) = 1 bar, the excess is counted from 2 bar', () => {
    const pressures = { 'N2O4(g)': '2 bar', 'NO2(g)': '1 bar' };
    const { conditions } = single('NO2(g)', { equation: DIMER_SPLIT, pressures });
    const excess = conditions.find((c) => c.action === 'reactant-excess')!;
    // ΔG = ΔG° + RT ln(1/2) > 0 still; N2O4 must reach 1/K bar, a (1/K)/2-fold excess.
    expect(excess.value!).toBeGreaterThanOrEqual(1 / K);
    expect(excess.factor!).toBeCloseTo(excess.value! / 2, 9);
    expect(evaluateStep({ equation: DIMER_SPLIT, ...excess.conditions }, { lookup: nbsLookup }).deltaG_kJ!).toBeLessThan(0);
  });

  it('aqueous products: remove H+ or NH3 as they form, or more NH4+; never a pure solid or liquid', () => {
    const concentrations = { 'NH4+(aq)': '0.1 mol/L', 'NH3(aq)': '1e-3 mol/L', 'H+(aq)': '1e-7 mol/L' };
    const eq = 'NH4+(aq) -> NH3(aq) + H+(aq)';
    const { step, conditions } = single('NH3(aq)', { equation: eq, concentrations });
    expect(step.class).toBe('uphill');
    expect(conditions.map((c) => `${c.action} ${c.species}`).sort()).toEqual(['reactant-excess NH4+(aq)', 'remove-product H+(aq)', 'remove-product NH3(aq)']);
    for (const c of conditions) expect(evaluateStep({ equation: eq, ...c.conditions }, { lookup: nbsLookup }).deltaG_kJ!).toBeLessThan(0);
  });

  it('offers no single change beyond practical bounds: calcination at 298 K needs p(CO2) ≈ 10^-22.8 bar', () => {
    const { conditions } = single('CaO(s)', { equation: CALCINATION });
    expect(conditions).toHaveLength(1);
    expect(conditions[0]!.action).toBe('out-of-reach');
    expect(conditions[0]!.lnQ_max).toBeCloseTo(-130.401 / RT298, 6);
  });

  it('aims at the threshold for a marginal step, and the offers get there', () => {
    const eq = 'CO(g) + 2 H2(g) -> CH3OH(g)';
    const { conditions } = single('CH3OH(g)', { equation: eq }, { marginalThreshold_kJ: -30 });
    expect(conditions.length).toBe(3);
    for (const c of conditions) expect(evaluateStep({ equation: eq, ...c.conditions }, { lookup: nbsLookup }).deltaG_kJ!).toBeLessThan(-30);
  });
});

describe('coupling remedy', () => {
  it('each combined ΔG is evaluateStep of the combined equation and step ΔG° + m·driver ΔG° (Hess); m is the smallest half multiple', () => {
    const { coupling, step } = single('CaO(s)', { equation: CALCINATION });
    expect(coupling.length).toBeGreaterThan(3);
    for (const c of coupling) {
      const direct = evaluateStep({ equation: c.combinedEquation }, { lookup: nbsLookup });
      expect(c.combinedDeltaG_kJ).toBeCloseTo(direct.deltaG0_kJ, 9);
      const driver = evaluateStep({ equation: c.driverEquation }, { lookup: nbsLookup }).deltaG0_kJ;
      expect(c.combinedDeltaG_kJ).toBeCloseTo(step.result!.deltaG0_kJ + c.multiple * driver, 9);
      expect(c.combinedDeltaG_kJ).toBeLessThan(0);
      if (c.multiple > 0.5) expect(step.result!.deltaG0_kJ + (c.multiple - 0.5) * driver).toBeGreaterThanOrEqual(0);
      expect(c.note).toMatch(/^Coupling is bookkeeping/);
    }
    // Ranked by how plausible a partner each driver is (coupling-partners.test.ts), never by the biggest push alone.
    const scores = coupling.map((c) => c.partnerScore);
    expect(scores).toEqual([...scores].sort((a, b) => b - a));
  });

  it('carbon combustion drives calcination at ½ mol: 130.401 − ½·394.359 = −66.78 kJ (NBS 1982)', () => {
    const carbon = DEFAULT_DRIVERS.filter((d) => d.id === 'carbon-combustion');
    const c = single('CaO(s)', { equation: CALCINATION }, {}, [...carbon]).coupling.find((x) => x.driverId === 'carbon-combustion')!;
    expect(c.multiple).toBe(0.5);
    expect(c.combinedDeltaG_kJ).toBeCloseTo(130.401 - 0.5 * 394.359, 2);
  });

  it('never offers the reverse of the step itself (quicklime carbonation undoes calcination)', () => {
    const ids = single('CaO(s)', { equation: CALCINATION }, {}, [...DEFAULT_DRIVERS]).coupling.map((c) => c.driverId);
    expect(ids).not.toContain('quicklime-carbonation');
  });

  it('evaluates drivers at the step temperature and keeps the step’s conditions in the combined equation', () => {
    const { coupling } = single('CaO(s)', { equation: CALCINATION, temperature: '1000 K', pressures: { 'CO2(g)': '0.5 bar' } });
    expect(coupling.length).toBeGreaterThan(0);
    for (const c of coupling) {
      const r = evaluateStep({ equation: c.combinedEquation, temperature: '1000 K', ...c.conditions }, { lookup: nbsLookup });
      expect(c.combinedDeltaG_kJ).toBeCloseTo(r.deltaG_kJ ?? r.deltaG0_kJ, 9);
      expect(c.combinedDeltaG_kJ).toBeLessThan(0);
    }
    // Liquid water is outside its data at 1000 K, so that driver is not used.
    expect(coupling.map((c) => c.driverId)).not.toContain('hydrogen-to-liquid-water');
  });

  it('uses the drivers given, and warns about one it cannot read', () => {
    const drivers = [
      { id: 'mine', name: 'My driver', equation: 'H2(g) + Cl2(g) -> 2 HCl(g)', basis: 'common practice' },
      { id: 'broken', name: 'Broken', equation: 'H2(g) + -> HCl(g)', basis: 'common practice' },
    ];
    const { coupling, route } = single('CaO(s)', { equation: CALCINATION }, {}, drivers);
    expect(coupling.map((c) => c.driverId)).toEqual(['mine']);
    expect(route.warnings.find((w) => w.code === 'DRIVER_INVALID')?.message).toContain('broken');
  });

  it('computes no remedies for downhill steps', () => {
    expect(single('NH4Cl(s)', { equation: 'NH3(g) + HCl(g) -> NH4Cl(s)' }).step.remedies).toEqual([]);
  });
});

describe('coupling list size', () => {
  it('works out at most MAX_COUPLING_OPTIONS drivers, the most plausible partners first', () => {
    const { coupling } = single('CaO(s)', { equation: CALCINATION }, {}, [...DEFAULT_DRIVERS]);
    expect(coupling.length).toBeGreaterThan(0);
    expect(coupling.length).toBeLessThanOrEqual(MAX_COUPLING_OPTIONS);
    const sorted = [...coupling].sort((a, b) => b.partnerScore - a.partnerScore);
    expect(coupling.map((c) => c.partnerScore)).toEqual(sorted.map((c) => c.partnerScore));
  });
});
