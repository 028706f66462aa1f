// Typesetting formulas and species keys. The conventions checked (counts as right subscripts; an ion's charge as a
// right superscript, size before sign, "SO4^2−"; the state in parentheses after the formula) are IUPAC's, Nomenclature
// of Inorganic Chemistry 2005 (the Red Book), sections IR-3 and IR-4 (from memory).
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { FormulaText, formulaParts, formulaPlain, isStructureKey, splitPhase } from '@/components/chemistry/formula-text';

const MINUS = '\u2212';
const ETHYL_ACETATE_L = '{XEKOWRVHYACXOJ-UHFFFAOYSA-N}(l)';
const runs = (value: string, options = {}) => formulaParts(value, options).map((p) => `${p.kind}:${p.text}`);

describe('formulaParts', () => {
  it('subscripts counts and keeps the phase in plain text: CH3OH(g), C6H12O6(s)', () => {
    expect(runs('CH3OH(g)')).toEqual(['text:CH', 'sub:3', 'text:OH', 'phase:(g)']);
    expect(runs('C6H12O6(s)')).toEqual(['text:C', 'sub:6', 'text:H', 'sub:12', 'text:O', 'sub:6', 'phase:(s)']);
  });

  it('writes a charge as a superscript, size before sign, with a real minus: SO4-2(aq) is SO₄²⁻, Ca+2 is Ca²⁺', () => {
    expect(runs('SO4-2(aq)')).toEqual(['text:SO', 'sub:4', `sup:2${MINUS}`, 'phase:(aq)']);
    expect(runs('Ca+2')).toEqual(['text:Ca', 'sup:2+']);
    expect(runs('H+(aq)')).toEqual(['text:H', 'sup:+', 'phase:(aq)']);
    expect(runs('CH3COO-(aq)')).toEqual(['text:CH', 'sub:3', 'text:COO', `sup:${MINUS}`, 'phase:(aq)']);
    expect(runs('PO4-3(aq)')).toEqual(['text:PO', 'sub:4', `sup:3${MINUS}`, 'phase:(aq)']);
  });

  it('keeps the water count of a hydrate full size after the dot: CuSO4·5H2O(s)', () => {
    expect(runs('CuSO4·5H2O(s)')).toEqual(['text:CuSO', 'sub:4', 'text:·5H', 'sub:2', 'text:O', 'phase:(s)']);
    expect(runs('CaSO4·2H2O(s)')).toEqual(['text:CaSO', 'sub:4', 'text:·2H', 'sub:2', 'text:O', 'phase:(s)']);
  });

  it('subscripts the count of a bracketed group and tells a group from a phase: (NH4)2SO4(s), Ca(OH)2(s), C(diamond)', () => {
    expect(runs('(NH4)2SO4(s)')).toEqual(['text:(NH', 'sub:4', 'text:)', 'sub:2', 'text:SO', 'sub:4', 'phase:(s)']);
    expect(runs('Ca(OH)2(s)')).toEqual(['text:Ca(OH)', 'sub:2', 'phase:(s)']);
    expect(runs('C(diamond)')).toEqual(['text:C', 'phase:(diamond)']);
  });

  it('never shows a structure key: the name stands in, else the typeset formula, else the word structure', () => {
    expect(runs(ETHYL_ACETATE_L, { name: 'ethyl acetate' })).toEqual(['name:ethyl acetate', 'phase: (l)']);
    expect(runs(ETHYL_ACETATE_L, { formula: 'C4H8O2' })).toEqual(['text:C', 'sub:4', 'text:H', 'sub:8', 'text:O', 'sub:2', 'phase:(l)']);
    expect(runs('{XEKOWRVHYACXOJ-UHFFFAOYSA-N|estimate}(g)', { name: 'ethyl acetate' })).toEqual(['name:ethyl acetate', 'phase: (g)']);
    for (const options of [{}, { name: '' }, { name: null, formula: null }]) {
      const text = formulaParts(ETHYL_ACETATE_L, options).map((p) => p.text).join('');
      expect(text).not.toMatch(/[{}]|XEKOWRVHYACXOJ/);
      expect(text).toBe('structure(l)');
    }
  });

  it('leaves names and labels that are not formulas as plain text', () => {
    expect(runs('ethyl acetate(l)')).toEqual(['text:ethyl acetate', 'phase:(l)']);
    expect(runs('Boc anhydride')).toEqual(['text:Boc anhydride']);
    // M is no element, so DMF is a label, not D·M·F
    expect(runs('DMF(l)')).toEqual(['text:DMF', 'phase:(l)']);
    expect(runs('e-')).toEqual(['text:e-']);
  });
});

describe('splitPhase, isStructureKey and formulaPlain', () => {
  it('splits only a lower-case phase or form off the end', () => {
    expect(splitPhase('CO(NH2)2(s)')).toEqual(['CO(NH2)2', '(s)']);
    expect(splitPhase('Mg(OH)2')).toEqual(['Mg(OH)2', '']);
    expect(isStructureKey(ETHYL_ACETATE_L)).toBe(true);
    expect(isStructureKey('CH3OH(g)')).toBe(false);
  });

  it('gives a formula key as written and a structure key by name, for alt text and sentences', () => {
    expect(formulaPlain('SO4-2(aq)')).toBe('SO4-2(aq)');
    expect(formulaPlain(ETHYL_ACETATE_L, { name: 'ethyl acetate' })).toBe('ethyl acetate (l)');
  });
});

describe('FormulaText', () => {
  it('renders sub and sup elements, so the text still reads SO4 2− when copied', () => {
    const html = renderToStaticMarkup(createElement(FormulaText, { value: 'SO4-2(aq)' }));
    expect(html).toBe(`<span class="whitespace-nowrap">SO<sub>4</sub><sup>2${MINUS}</sup>(aq)</span>`);
    expect(renderToStaticMarkup(createElement(FormulaText, { value: ETHYL_ACETATE_L, name: 'ethyl acetate' }))).not.toContain('{');
  });
});
