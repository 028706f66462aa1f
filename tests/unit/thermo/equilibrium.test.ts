import { describe, expect, it } from 'vitest';
import { solveEquilibrium, type EquilibriumInput } from '@/lib/thermo/equilibrium';
import { rx } from './reaction-test-species';

function input(species: ReturnType<typeof rx>, initial: Record<string, number>, lnK: number, extra: Partial<EquilibriumInput> = {}): EquilibriumInput {
  return {
    species,
    initial_mol: new Map(Object.entries(initial)),
    unlimited: new Set(),
    inertGas_mol: 0,
    lnK,
    totalPressure_bar: 1,
    standardPressure_bar: 1,
    volume_L: 1,
    fugacityCoefficients: new Map(),
    activityCoefficients: new Map(),
    ...extra,
  };
}

const dimer = rx({ 'N2O4(g)': -1, 'NO2(g)': 2 });

describe('equilibrium extent', () => {
  it('solves N2O4 ⇌ 2 NO2 against the closed form α = sqrt(K/(K + 4P)) (1 mol N2O4, P = 1 bar)', () => {
    const K = 0.15;
    const r = solveEquilibrium(input(dimer, { 'N2O4(g)': 1 }, Math.log(K)));
    expect(r.extent_mol).toBeCloseTo(Math.sqrt(K / (K + 4)), 12);
    expect(r.conversion).toBeCloseTo(r.extent_mol, 12);
    expect(r.limiting).toEqual(['N2O4(g)']);
  });

  it('follows Le Chatelier: higher total pressure or inert gas shifts the dimerisation as expected', () => {
    const K = Math.log(0.15);
    const low = solveEquilibrium(input(dimer, { 'N2O4(g)': 1 }, K)).extent_mol;
    const high = solveEquilibrium(input(dimer, { 'N2O4(g)': 1 }, K, { totalPressure_bar: 10 })).extent_mol;
    const diluted = solveEquilibrium(input(dimer, { 'N2O4(g)': 1 }, K, { inertGas_mol: 5 })).extent_mol;
    expect(high).toBeLessThan(low);
    expect(diluted).toBeGreaterThan(low);
    // closed form at 10 bar: α = sqrt(K/(K + 40))
    expect(high).toBeCloseTo(Math.sqrt(0.15 / 40.15), 12);
  });

  it('runs in reverse from products and reports the limiting product', () => {
    const r = solveEquilibrium(input(dimer, { 'NO2(g)': 2 }, Math.log(0.15)));
    expect(r.runsInReverse).toBe(true);
    expect(r.extent_mol).toBeCloseTo(Math.sqrt(0.15 / 4.15) - 1, 12);
    expect(r.limiting).toEqual(['NO2(g)']);
  });

  it('resolves extreme K: ln K = 600 leaves e^-600 of the reactant to full precision', () => {
    const isomer = rx({ 'C4H10(g)': -1, '(CH3)3CH(g)': 1 });
    const r = solveEquilibrium(input(isomer, { 'C4H10(g)': 1 }, 600));
    expect(r.amounts_mol['(CH3)3CH(g)']).toBe(1);
    expect(Math.log(r.amounts_mol['C4H10(g)']!)).toBeCloseTo(-600, 9);
    // ln K = 2000: e^-2000 underflows a double, so the amount is reported as 0, never NaN
    const extreme = solveEquilibrium(input(isomer, { 'C4H10(g)': 1 }, 2000));
    expect(extreme.amounts_mol['C4H10(g)']).toBe(0);
    expect(extreme.conversion).toBe(1);
    expect(solveEquilibrium(input(isomer, { 'C4H10(g)': 1 }, -2000)).extent_mol).toBe(0);
  });

  it('stops at a bound when a pure solid is used up (CaCO3 ⇌ CaO + CO2 with K > P)', () => {
    const calcite = rx({ 'CaCO3(s)': -1, 'CaO(s)': 1, 'CO2(g)': 1 });
    const r = solveEquilibrium(input(calcite, { 'CaCO3(s)': 1 }, Math.log(2)));
    expect(r.atLimit).toBe(true);
    expect(r.conversion).toBe(1);
    expect(r.amounts_mol['CaCO3(s)']).toBe(0);
    const none = solveEquilibrium(input(calcite, { 'CaCO3(s)': 1 }, Math.log(0.5)));
    expect(none.extent_mol).toBeCloseTo(0, 12);
  });

  it('handles an unlimited solvent: water autoionisation gives [H+] = sqrt(Kw)', () => {
    const water = rx({ 'H2O(l)': -1, 'H+(aq)': 1, 'OH-(aq)': 1 });
    const Kw = 1.0e-14;
    const r = solveEquilibrium(input(water, {}, Math.log(Kw), { unlimited: new Set(['H2O(l)']) }));
    expect(r.amounts_mol['H+(aq)']! / 1e-7).toBeCloseTo(1, 10);
  });

  it('uses c = n/V for solutes', () => {
    const acetic = rx({ 'CH3COOH(aq)': -1, 'CH3COO-(aq)': 1, 'H+(aq)': 1 });
    const Ka = 1.75e-5;
    const r = solveEquilibrium(input(acetic, { 'CH3COOH(aq)': 0.05 }, Math.log(Ka), { volume_L: 0.5 }));
    // c0 = 0.1 M: x²/(c0 − x) = Ka → x = (−Ka + sqrt(Ka² + 4 Ka c0))/2, amount = x·V
    const x = (-Ka + Math.sqrt(Ka * Ka + 4 * Ka * 0.1)) / 2;
    expect(r.amounts_mol['H+(aq)']).toBeCloseTo(x * 0.5, 14);
  });

  it('returns no reaction when nothing can react', () => {
    const r = solveEquilibrium(input(dimer, {}, 0));
    expect(r.extent_mol).toBe(0);
    expect(r.atLimit).toBe(true);
  });
});
