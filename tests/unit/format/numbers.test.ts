import { describe, expect, it } from 'vitest';
import { countOf, formatConstant, formatFixed, formatFold, formatKelvin, formatKJ, formatScientific, formatSignificant, formatSigned, readableTyped, superscript, withTrueMinus } from '@/lib/format/numbers';
import { formatEnergy, formatEnergyValue, formatTemperature } from '@/lib/format/units';

const MINUS = '\u2212';
const E_NOTATION = /\d(\.\d+)?e[+-]?\d/i;

describe('the minus sign', () => {
  it('is U+2212, never a hyphen, and zero is never signed', () => {
    expect(formatFixed(-235.1, 1)).toBe(`${MINUS}235.1`);
    expect(formatFixed(-0.04, 1)).toBe('0.0');
    expect(formatSigned(-4.25, 1)).toBe(`${MINUS}4.3`);
    expect(formatSigned(4.25, 1)).toBe('+4.3');
    expect(formatSigned(0.01, 1)).toBe('0.0');
    expect(formatSigned(Number.NaN, 1)).toBe('—');
  });

  it('replaces a hyphen-minus that starts a number in prose, and leaves ranges, dates and words alone', () => {
    expect(withTrueMinus('ΔG overall -12.4 → -20.1 kJ')).toBe(`ΔG overall ${MINUS}12.4 → ${MINUS}20.1 kJ`);
    expect(withTrueMinus('threshold (-17 kJ)')).toBe(`threshold (${MINUS}17 kJ)`);
    expect(withTrueMinus('2026-12-04, 300-400 K, s-8ab5, CO2-free')).toBe('2026-12-04, 300-400 K, s-8ab5, CO2-free');
  });
});

describe('precision', () => {
  it('gives kJ to 0.1 and K to 1, keeping the 298.15 K reference as defined', () => {
    expect(formatKJ(-235.1)).toBe(`${MINUS}235.1`);
    expect(formatKJ(-235.1004)).not.toMatch(/235\.100/);
    expect(formatKelvin(602.4)).toBe('602');
    expect(formatKelvin(298.15)).toBe('298.15');
    expect(formatTemperature(892.43, 'K')).toBe('892 K');
    expect(formatTemperature(298.15, 'degC')).toBe('25 °C');
    expect(formatTemperature(200, 'degC')).toBe(`${MINUS}73 °C`);
  });

  it('states energies with a sign and one unit, and table values without a unit', () => {
    expect(formatEnergy(-41.84, 'kcal', { perMol: true })).toBe(`${MINUS}10.0 kcal/mol`);
    expect(formatEnergyValue(-235.1)).toBe(`${MINUS}235.1`);
    expect(formatEnergyValue(null)).toBe('—');
  });
});

describe('large and small numbers', () => {
  it('never uses e-notation; powers of ten are superscripts', () => {
    expect(formatScientific(1.75e6, 2)).toBe('1.8 × 10⁶');
    expect(formatScientific(1e-7, 2)).toBe('10⁻⁷');
    expect(formatSignificant(7.925880991640491e24)).toBe('7.93 × 10²⁴');
    expect(formatSignificant(1.5e-7)).toBe('1.5 × 10⁻⁷');
    expect(formatSignificant(12400)).toBe('12,400');
    expect(formatSignificant(-2.5)).toBe(`${MINUS}2.5`);
    expect(superscript('-12')).toBe('⁻¹²');
    for (const x of [1e-300, 3.2e-12, 0.5, 1, 999999, 1e6, 6.02e23, 1.7e308]) {
      expect(formatSignificant(x)).not.toMatch(E_NOTATION);
      expect(formatConstant(x)).not.toMatch(E_NOTATION);
      expect(formatFold(x)).not.toMatch(E_NOTATION);
    }
  });

  it('writes equilibrium constants plainly near 1 and as powers of ten far from it', () => {
    expect(formatConstant(0.45)).toBe('0.45');
    expect(formatConstant(120)).toBe('120');
    expect(formatConstant(3.2e-5)).toBe('3.2 × 10⁻⁵');
    expect(formatConstant(Number.POSITIVE_INFINITY)).toBe('—');
  });
});

describe('fold changes', () => {
  it('reads in words, never "10^6.24-fold" or "1.75e+6-fold"', () => {
    expect(formatFold(3.24)).toBe('3.2-fold');
    expect(formatFold(240)).toBe('240-fold');
    expect(formatFold(12_345)).toBe('12,000-fold');
    expect(formatFold(10 ** 6.24)).toBe('1.7 million-fold');
    expect(formatFold(1.66e6)).toBe('1.7 million-fold');
    expect(formatFold(999_900)).toBe('1 million-fold');
    expect(formatFold(4.1e9)).toBe('4.1 billion-fold');
    expect(formatFold(2.5e12)).toBe('2.5 trillion-fold');
    expect(formatFold(3.2e18)).toBe('3.2 × 10¹⁸-fold');
    expect(formatFold(0)).toBe('—');
    expect(formatFold(null)).toBe('—');
  });
});

describe('counts', () => {
  it('agrees in number', () => {
    expect(countOf(1, 'step')).toBe('1 step');
    expect(countOf(3, 'step')).toBe('3 steps');
    expect(countOf(1200, 'route')).toBe('1,200 routes');
  });
});

describe('typed text read back', () => {
  it('turns e-notation into powers of ten and a leading hyphen into the minus, leaving other text alone', () => {
    expect(readableTyped('1e-7 bar')).toBe('10⁻⁷ bar');
    expect(readableTyped('-5 K')).toBe(`${MINUS}5 K`);
    expect(readableTyped('2.5E+6 Pa')).toBe('2.5 × 10⁶ Pa');
    expect(readableTyped('CH4(g) + H2O(g) -> CO(g) + 3 H2(g)')).toBe('CH4(g) + H2O(g) -> CO(g) + 3 H2(g)');
    expect(readableTyped('Line 2e proposal')).toBe('Line 2e proposal');
  });
});
