import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { evaluateStep, layeredLookup, builtinLookup, R_GAS } from '@/lib/thermo';
import type { EvaluateRequest } from '@/lib/schemas/evaluate';
import { thermoErrorOf } from './thermo-error-of';

// Some cases are deliberately outside the schema, as an untyped caller could send them.
const loose = (r: Record<string, unknown>): EvaluateRequest => r as unknown as EvaluateRequest;

const shift = 'CO(g) + H2O(g) <=> CO2(g) + H2(g)';

describe('evaluateStep response', () => {
  it('has every contract field, with energies per mole of reaction as written', () => {
    const r = evaluateStep({ equation: 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)' }, { lookup: nbsLookup });
    expect(r).toMatchObject({
      equation: 'CH4(g) + 2 O2(g) ⇌ CO2(g) + 2 H2O(l)',
      balanced: true,
      temperature_K: 298.15,
      standardPressure_bar: 1,
      lnQ: null,
      deltaG_kJ: null,
      direction: 'forward',
      cellPotential_V: null,
      equilibrium: null,
    });
    expect(r.maxWork_kJ).toBeCloseTo(817.897, 9);
    expect(r.log10K).toBeCloseTo(r.lnK / Math.LN10, 12);
    expect(r.K! / Math.exp(r.lnK)).toBeCloseTo(1, 12); // ln K ≈ 330: K ≈ 2e143 still fits a double
  });

  it('reports K when representable and null beyond the double range', () => {
    const water = evaluateStep({ equation: 'H2(g) + 1/2 O2(g) -> H2O(l)' }, { lookup: nbsLookup });
    expect(water.K! / Math.exp(95.65676095741)).toBeCloseTo(1, 9);
    const glucose = evaluateStep({ equation: 'C6H12O6(s) + 6 O2(g) -> 6 CO2(g) + 6 H2O(l)' }, { lookup: nbsLookup });
    expect(glucose.lnK).toBeGreaterThan(1000);
    expect(glucose.K).toBeNull();
  });

  it('accepts common names as written and reports their library keys', () => {
    const r = evaluateStep({ equation: 'ethanol(l) + 3 oxygen(g) -> 2 CO2(g) + 3 water(l)' }, { lookup: nbsLookup });
    expect(r.equation).toBe('C2H5OH(l) + 3 O2(g) ⇌ 2 CO2(g) + 3 H2O(l)');
    expect(r.species.map((s) => s.as_written)).toEqual(['ethanol(l)', 'oxygen(g)', 'CO2(g)', 'water(l)']);
    expect(r.species[0]).toMatchObject({ key: 'C2H5OH(l)', nu: -1, source: 'NBS 1982', override: false });
  });

  it('computes ΔG = ΔG° + RT ln Q and takes the direction from ΔG', () => {
    const T = 800;
    const r = evaluateStep({
      equation: shift,
      temperature: `${T} K`,
      pressures: { 'CO(g)': '1 bar', 'H2O(g)': '1 bar', 'CO2(g)': '10 bar', 'H2(g)': '10 bar' },
    }, { lookup: nbsLookup });
    expect(r.lnQ).toBeCloseTo(Math.log(100), 12);
    expect(r.deltaG_kJ!).toBeCloseTo(r.deltaG0_kJ + (R_GAS * T * Math.log(100)) / 1000, 9);
    expect(r.deltaG0_kJ).toBeLessThan(0);
    expect(r.deltaG_kJ!).toBeGreaterThan(0);
    expect(r.direction).toBe('reverse');
    expect(r.maxWork_kJ).toBeCloseTo(-r.deltaG_kJ!, 12);
  });

  it('gives the same ΔG under conditions whichever standard pressure is chosen', () => {
    const req = { equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperature: '600 K', pressures: { 'N2(g)': '50 bar', 'H2(g)': '150 bar', 'NH3(g)': '20 bar' } };
    const bar = evaluateStep(req, { lookup: nbsLookup });
    const atm = evaluateStep({ ...req, standardPressure: '1 atm' }, { lookup: nbsLookup });
    expect(atm.deltaG0_kJ).not.toBeCloseTo(bar.deltaG0_kJ, 3);
    expect(atm.deltaG_kJ!).toBeCloseTo(bar.deltaG_kJ!, 9);
  });

  it('says "at equilibrium" when Q = K', () => {
    const first = evaluateStep({ equation: 'CaCO3(s) -> CaO(s) + CO2(g)', temperature: '1100 K' }, { lookup: nbsLookup });
    const r = evaluateStep({ equation: 'CaCO3(s) -> CaO(s) + CO2(g)', temperature: '1100 K', pressures: { 'CO2(g)': `${first.K} bar` } }, { lookup: nbsLookup });
    expect(Math.abs(r.deltaG_kJ!)).toBeLessThan(1e-6);
    expect(r.direction).toBe('at equilibrium');
  });

  it('gives a cell potential E = −ΔG/(nF) when electrons are given', () => {
    const r = evaluateStep({ equation: 'Zn(s) + Cu+2(aq) -> Zn+2(aq) + Cu(s)', electrons: 2 }, { lookup: nbsLookup });
    expect(r.cellPotential_V!).toBeCloseTo(212550 / (2 * 96485.33212), 9);
  });

  it('reports the crossover temperature or null', () => {
    expect(evaluateStep({ equation: shift }, { lookup: nbsLookup }).crossover_K!).toBeGreaterThan(1000);
    expect(evaluateStep({ equation: 'H2(g) + Cl2(g) -> 2 HCl(g)' }, { lookup: nbsLookup }).crossover_K).toBeNull();
  });

  it('computes the equilibrium with amounts keyed as written', () => {
    const r = evaluateStep({
      equation: 'N2(g) + 3 hydrogen(g) <=> 2 NH3(g)',
      temperature: '700 K',
      initial: { 'N2(g)': '1 mol', 'hydrogen(g)': '3 mol', 'Ar(g)': '1 mol' },
      totalPressure: '200 bar',
    }, { lookup: nbsLookup });
    const eq = r.equilibrium!;
    expect(Object.keys(eq.amounts_mol)).toEqual(['N2(g)', 'hydrogen(g)', 'NH3(g)', 'Ar(g)']);
    expect(eq.amounts_mol['NH3(g)']).toBeCloseTo(2 * eq.extent_mol, 12);
    expect(eq.conversion).toBeCloseTo(eq.extent_mol, 12);
    expect(eq.amounts_mol['Ar(g)']).toBe(1);
    expect(r.warnings.map((w) => w.code)).toContain('INERT_SPECIES');
  });

  it('treats water as the solvent in aqueous equilibria and says so', () => {
    const r = evaluateStep({
      equation: 'CO2(aq) + H2O(l) <=> HCO3-(aq) + H+(aq)',
      initial: { 'CO2(aq)': '0.01 mol/L' },
    }, { lookup: nbsLookup });
    expect(r.equilibrium!.amounts_mol['H2O(l)']).toBeUndefined();
    // pKa1 from NBS values 6.366: x² /(0.01 − x) = 10^-6.366
    const Ka = Math.exp(r.lnK);
    const x = (-Ka + Math.sqrt(Ka * Ka + 0.04 * Ka)) / 2;
    expect(r.equilibrium!.amounts_mol['H+(aq)']).toBeCloseTo(x, 12);
    expect(r.warnings.map((w) => w.code)).toContain('SOLVENT_IN_EXCESS');
  });

  it('warns which value was used when a team species overrides a built-in', () => {
    const teamCO2 = { ...builtinLookup.get('CO2(g)')!, dfG_kJ: -394.0, source: 'team calorimetry' };
    const r = evaluateStep({ equation: 'C(s) + O2(g) -> CO2(g)' }, { lookup: layeredLookup([teamCO2]) });
    expect(r.deltaG0_kJ).toBe(-394.0);
    const w = r.warnings.find((x) => x.code === 'OVERRIDE');
    expect(w?.message).toMatch(/team value used.*-394.*-394\.359/);
    expect(r.species.find((s) => s.key === 'CO2(g)')?.override).toBe(true);
  });

  it('names from-memory data in a warning', () => {
    const r = evaluateStep({ equation: 'CH3COCH3(l) -> CH3COCH3(g)' }, { lookup: nbsLookup });
    expect(r.warnings.map((w) => w.code)).toContain('FROM_MEMORY');
  });

  it('gives an uncertainty block, judging the sign of ΔG when conditions are given', () => {
    const std = evaluateStep({ equation: '2 NO2(g) -> N2O4(g)' }, { lookup: nbsLookup });
    expect(std.uncertainty.deltaG0_kJ!).toBeCloseTo(2.81, 2); // sqrt((2·1.01)² + 1.95²), data README table
    expect(std.uncertainty.signUncertain).toBe(false); // |ΔG°| = 4.73 kJ/mol > σ
    const near = evaluateStep({ equation: '2 NO2(g) -> N2O4(g)', pressures: { 'NO2(g)': '1 bar', 'N2O4(g)': '8.25 bar' } }, { lookup: nbsLookup });
    expect(Math.abs(near.deltaG_kJ!)).toBeLessThan(1);
    expect(near.uncertainty.signUncertain).toBe(true);
  });
});

describe('evaluateStep errors', () => {
  it('names an unknown species and suggests the closest library species', () => {
    const err = thermoErrorOf(() => evaluateStep({ equation: 'C2H5OH(s) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)' }, { lookup: nbsLookup }));
    expect(err.code).toBe('UNKNOWN_SPECIES');
    expect(err.field).toBe('equation');
    expect(err.message).toMatch(/C2H5OH\(s\).*C2H5OH\(l\)/);
  });

  it('lists each element surplus and offers the balanced form', () => {
    const err = thermoErrorOf(() => evaluateStep({ equation: 'H2(g) + O2(g) -> H2O(l)' }, { lookup: nbsLookup }));
    expect(err.code).toBe('UNBALANCED');
    expect(err.message).toMatch(/O: 1 more on the left/);
    expect(err.details?.balanced).toBe('2 H2(g) + O2(g) ⇌ 2 H2O(l)');
  });

  it.each([
    [{ temperature: '0 K' }, 'INVALID_VALUE', 'temperature'],
    [{ temperature: '-300 degC' }, 'INVALID_VALUE', 'temperature'],
    [{ temperature: '300' }, 'INVALID_UNIT', 'temperature'],
    [{ temperature: '1e7 K' }, 'OUT_OF_RANGE', 'temperature'],
    [{ standardPressure: '2 bar' }, 'INVALID_VALUE', 'standardPressure'],
    [{ pressures: { 'H2(g)': '-1 bar' } }, 'INVALID_VALUE', 'pressures.H2(g)'],
    [{ pressures: { 'H2O(l)': '1 bar' } }, 'INVALID_VALUE', 'pressures.H2O(l)'],
    [{ pressures: { 'O2(g)': '0 atm' } }, 'ZERO_ACTIVITY', 'pressures.O2(g)'],
    [{ pressures: { 'O2(g)': '1 parsec' } }, 'INVALID_UNIT', 'pressures.O2(g)'],
    [{ initial: { 'H2(g)': '1 mol/L' } }, 'INVALID_UNIT', 'initial.H2(g)'],
    [{ initial: { 'Xx(g)': '1 mol' } }, 'INVALID_VALUE', 'initial.Xx(g)'],
    [{ initial: { 'H2(g)': '1 mol' }, totalPressure: '0 bar' }, 'INVALID_VALUE', 'totalPressure'],
  ] as const)('%j → %s on %s', (extra, code, field) => {
    const err = thermoErrorOf(() => evaluateStep(loose({ equation: 'H2(g) + 1/2 O2(g) -> H2O(l)', ...extra }), { lookup: nbsLookup }));
    expect(err.code).toBe(code);
    expect(err.field).toBe(field);
  });

  it('turns a parse error into a field error on the equation', () => {
    const err = thermoErrorOf(() => evaluateStep({ equation: 'H2 + O2 -> H2O' }, { lookup: nbsLookup }));
    expect(err.code).toBe('PARSE_ERROR');
    expect(err.field).toBe('equation');
  });
});
