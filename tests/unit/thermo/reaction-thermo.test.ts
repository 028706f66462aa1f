import { describe, expect, it } from 'vitest';
import { R_GAS } from '@/lib/thermo/constants';
import { gasMoleChange, lnKFromDeltaG, reactionAt298, reactionThermoAt } from '@/lib/thermo/reaction-thermo';
import { rx } from './reaction-test-species';

const co2 = rx({ 'C(s)': -1, 'O2(g)': -1, 'CO2(g)': 1 });
const soda = rx({ 'Na(s)': -2, 'C(s)': -1, 'O2(g)': -1.5, 'Na2CO3(s)': 1 });

describe('reaction thermo', () => {
  it('equals the table sums at 298.15 K (NBS 1982: CO2 −393.509, −394.359; ΔrS° 2.862)', () => {
    const r = reactionThermoAt(co2, 298.15);
    expect(r.deltaH0_kJ).toBe(-393.509);
    expect(r.deltaG0_kJ).toBe(-394.359);
    expect(r.deltaS0_J_per_K).toBeCloseTo(2.862, 12);
  });

  it('measures the G-H-S mismatch of the table (Na2CO3, an NBS "relaxed" row: +2.49 kJ/mol per the data README)', () => {
    expect(reactionAt298(soda).ghsMismatch_kJ).toBeCloseTo(2.49, 2);
    expect(Math.abs(reactionAt298(co2).ghsMismatch_kJ)).toBeLessThan(0.01);
  });

  it('keeps ΔG° continuous with the table at 298.15 K despite the mismatch', () => {
    const at = reactionThermoAt(soda, 298.15).deltaG0_kJ;
    const near = reactionThermoAt(soda, 298.15 + 1e-6).deltaG0_kJ;
    expect(Math.abs(near - at)).toBeLessThan(1e-6);
  });

  it('is Gibbs–Helmholtz consistent: d(ΔG°/T)/dT = −ΔH°/T² (CO2 formation at 900 K)', () => {
    const T = 900;
    const h = 1e-2;
    const gOverT = (t: number): number => reactionThermoAt(co2, t).deltaG0_kJ / t;
    const slope = (gOverT(T + h) - gOverT(T - h)) / (2 * h);
    expect(slope).toBeCloseTo(-reactionThermoAt(co2, T).deltaH0_kJ / (T * T), 9);
  });

  it('with heat capacity off, ΔH° is fixed and ΔG° = ΔH° − T·ΔS°eff, ΔS°eff = (ΔH° − ΔG°)/298.15', () => {
    const r = reactionThermoAt(co2, 1000, { heatCapacity: false });
    expect(r.deltaH0_kJ).toBe(-393.509);
    // hand: ΔS°eff = (−393.509 + 394.359)/298.15 = 2.85091 J/K → ΔG°(1000) = −393.509 − 2.85091 = −396.35991
    expect(r.deltaG0_kJ).toBeCloseTo(-396.35991, 4);
  });

  it('converts to a 1 atm standard state with +Δn_gas·RT·ln(1.01325)', () => {
    const water = rx({ 'H2(g)': -1, 'O2(g)': -0.5, 'H2O(l)': 1 });
    expect(gasMoleChange(water)).toBe(-1.5);
    const bar = reactionThermoAt(water, 298.15);
    const atm = reactionThermoAt(water, 298.15, { standardPressure_bar: 1.01325 });
    expect(atm.deltaG0_kJ - bar.deltaG0_kJ).toBeCloseTo((-1.5 * R_GAS * 298.15 * Math.log(1.01325)) / 1000, 12);
    expect(atm.deltaH0_kJ).toBe(bar.deltaH0_kJ);
    expect(atm.deltaS0_J_per_K - bar.deltaS0_J_per_K).toBeCloseTo(1.5 * R_GAS * Math.log(1.01325), 12);
  });

  it('computes ln K = −ΔG°/(RT) with CODATA 2018 R', () => {
    expect(lnKFromDeltaG(-10, 500)).toBeCloseTo(10000 / (8.314462618 * 500), 12);
  });
});
