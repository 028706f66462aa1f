import { renderToStaticMarkup } from 'react-dom/server';
import { createElement } from 'react';
import { describe, expect, it } from 'vitest';
import { ChemText, chemPieces, chemPlain } from '@/components/chemistry/chem-text';
import { formulaUnicode } from '@/components/chemistry/formula-unicode';

const html = (text: string) => renderToStaticMarkup(createElement(ChemText, { text }));

describe('formulas in prose', () => {
  it('typesets counts as subscripts and charges as superscripts inside sentences', () => {
    expect(html('T of Step 2 (CO(g) + 2 H2(g) -> CH3OH(g)) 500 → 650 K')).toBe(
      '<span>T of Step 2 (CO(g) + 2 <span class="whitespace-nowrap">H<sub>2</sub>(g)</span> → <span class="whitespace-nowrap">CH<sub>3</sub>OH(g)</span>) 500 → 650 K</span>',
    );
    expect(html('Remove SO4-2(aq) as it forms')).toContain('SO<sub>4</sub><sup>2−</sup>(aq)');
  });

  it('leaves words that only look like formulas, dates, ranges and ids alone', () => {
    for (const text of ['In review', 'No changes', 'Step 3 (ethanol dehydrogenation)', 'on 2026-12-04, 300-400 K', 'CO is fine', 'Cp correction on']) {
      expect(chemPieces(text).every((p) => p.kind === 'text')).toBe(true);
      expect(chemPlain(text)).toBe(text);
    }
  });

  it('puts the true minus before numbers and arrows for "->"', () => {
    expect(chemPlain('ΔG overall -12.4 -> -20.1 kJ')).toBe('ΔG overall −12.4 → −20.1 kJ');
  });
});

describe('formulas as plain Unicode (edge labels)', () => {
  it('uses subscript and superscript digits', () => {
    expect(formulaUnicode('CH3OH(g)')).toBe('CH₃OH(g)');
    expect(formulaUnicode('SO4-2(aq)')).toBe('SO₄²⁻(aq)');
    expect(formulaUnicode('ethyl acetate(l)')).toBe('ethyl acetate(l)');
  });
});
