import { describe, expect, it } from 'vitest';
import {
  KELVIN_AT_ZERO_CELSIUS,
  KJ_PER_KCAL,
  energyFromKJ,
  energyToKJ,
  formatEnergy,
  formatNumber,
  formatSigned,
  formatTemperature,
  temperatureFromK,
  temperatureQuantity,
  temperatureToK,
} from '@/components/ladder/energy-format';

describe('energy units', () => {
  it('uses the thermochemical calorie, 4.184 J exactly (by definition)', () => {
    expect(KJ_PER_KCAL).toBe(4.184);
    expect(energyFromKJ(4.184, 'kcal')).toBe(1);
    expect(energyFromKJ(-41.84, 'kcal')).toBeCloseTo(-10, 12);
    expect(energyFromKJ(12.5, 'kJ')).toBe(12.5);
    expect(energyToKJ(energyFromKJ(123.456, 'kcal'), 'kcal')).toBeCloseTo(123.456, 12);
  });

  it('formats with a sign, one decimal and the unit', () => {
    expect(formatEnergy(12.34, 'kJ')).toBe('+12.3 kJ');
    expect(formatEnergy(-4.25, 'kJ')).toBe('−4.3 kJ');
    expect(formatEnergy(-41.84, 'kcal')).toBe('−10.0 kcal');
    expect(formatEnergy(41.84, 'kcal', { perMol: true })).toBe('+10.0 kcal/mol');
  });

  it('never prints a signed zero and says "—" for a missing value', () => {
    expect(formatEnergy(0, 'kJ')).toBe('0.0 kJ');
    expect(formatEnergy(-0.04, 'kJ')).toBe('0.0 kJ');
    expect(formatEnergy(0.04, 'kJ')).toBe('0.0 kJ');
    expect(formatEnergy(null, 'kJ')).toBe('—');
    expect(formatEnergy(Number.NaN, 'kcal')).toBe('—');
    expect(formatSigned(2, 0, { plus: false })).toBe('2');
  });
});

describe('temperature units', () => {
  it('offsets by 273.15 K exactly (by definition of the Celsius scale)', () => {
    expect(KELVIN_AT_ZERO_CELSIUS).toBe(273.15);
    expect(temperatureFromK(273.15, 'degC')).toBe(0);
    expect(temperatureToK(0, 'degC')).toBe(273.15);
    expect(temperatureFromK(350, 'K')).toBe(350);
  });

  it('formats to the kelvin (or degree) with the unit, keeping the 298.15 K reference as defined', () => {
    expect(formatTemperature(298.15, 'degC')).toBe('25 °C');
    expect(formatTemperature(298.15, 'K')).toBe('298.15 K');
    expect(formatTemperature(273.15, 'degC')).toBe('0 °C');
    expect(formatTemperature(200, 'degC')).toBe('−73 °C');
    expect(formatTemperature(892.4304016763211, 'K')).toBe('892 K');
    expect(formatTemperature(null, 'K')).toBe('—');
  });

  it('writes the engine quantity string in kelvin', () => {
    expect(temperatureQuantity(298.15)).toBe('298.15 K');
    expect(temperatureQuantity(893)).toBe('893 K');
  });
});

describe('formatNumber', () => {
  it('keeps three significant figures and writes extremes as powers of ten, never e-notation', () => {
    expect(formatNumber(0.5)).toBe('0.5');
    expect(formatNumber(1.23456)).toBe('1.23');
    expect(formatNumber(-2.5)).toBe('−2.5');
    expect(formatNumber(7.925880991640491e24)).toBe('7.93 × 10²⁴');
    expect(formatNumber(1.5e-7)).toBe('1.5 × 10⁻⁷');
    expect(formatNumber(null)).toBe('—');
  });
});
