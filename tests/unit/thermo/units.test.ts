import { describe, expect, it } from 'vitest';
import { parseAmount, parseConcentration, parseEnergy, parsePressure, parseTemperature, parseVolume } from '@/lib/thermo/units';
import { thermoErrorOf } from './thermo-error-of';

describe('quantity parsing at the request boundary', () => {
  it.each([
    ['700 K', 700],
    ['25 degC', 298.15],
    ['25 °C', 298.15],
    ['77 degF', 298.15],
  ])('temperature %s → %f K', (text, K) => {
    expect(parseTemperature(text)).toBeCloseTo(K, 9);
  });

  it.each([
    ['2 bar', 2],
    ['1 atm', 1.01325], // 1 atm = 101 325 Pa exactly (definition)
    ['101.325 kPa', 1.01325],
    ['100000 Pa', 1],
    ['1 psi', 0.0689476], // 1 psi = 6894.757 Pa (definition via lbf/in², from memory)
  ])('pressure %s → %f bar', (text, bar) => {
    expect(parsePressure(text)).toBeCloseTo(bar, 6);
  });

  it('reads mmHg (1 mmHg ≈ 133.322 Pa, from memory) to within 1e-5 relative', () => {
    expect(Math.abs(parsePressure('760 mmHg') / 1.01325 - 1)).toBeLessThan(1e-5);
  });

  it.each([
    ['0.1 mol/L', 0.1],
    ['5 mmol/L', 0.005],
    ['2 M', 2],
  ])('concentration %s → %f mol/L', (text, c) => {
    expect(parseConcentration(text)).toBeCloseTo(c, 12);
  });

  it('reads amounts, volumes and energies (1 kcal = 4.184 kJ, thermochemical calorie)', () => {
    expect(parseAmount('2 kmol')).toBe(2000);
    expect(parseAmount('5 mmol')).toBeCloseTo(0.005, 12);
    expect(parseVolume('250 mL')).toBeCloseTo(0.25, 12);
    expect(parseEnergy('1 kcal')).toBeCloseTo(4.184, 12);
    expect(parseEnergy('500 J')).toBeCloseTo(0.5, 12);
  });

  it('rejects a bare number with a hint to add a unit', () => {
    const err = thermoErrorOf(() => parsePressure('2', 'pressures.H2(g)'));
    expect(err.code).toBe('INVALID_UNIT');
    expect(err.field).toBe('pressures.H2(g)');
    expect(err.hint).toMatch(/add a unit/);
  });

  it('rejects unknown units and wrong dimensions with INVALID_UNIT and the field', () => {
    expect(thermoErrorOf(() => parseTemperature('300 furlongs')).code).toBe('INVALID_UNIT');
    const wrong = thermoErrorOf(() => parseTemperature('2 bar'));
    expect(wrong.code).toBe('INVALID_UNIT');
    expect(wrong.field).toBe('temperature');
    expect(thermoErrorOf(() => parseConcentration('1 mol')).code).toBe('INVALID_UNIT');
  });

  it('rejects non-finite values with INVALID_VALUE', () => {
    expect(thermoErrorOf(() => parseTemperature('1e999 K')).code).toBe('INVALID_VALUE');
  });

  it('rejects a value that is not a string', () => {
    expect(thermoErrorOf(() => parseTemperature(300 as unknown as string)).code).toBe('INVALID_UNIT');
  });
});
