// A formula as plain Unicode text ("CH₃OH(g)", "SO₄²⁻(aq)") for places that take a string, not markup: edge labels
// drawn in SVG, titles, option text. Pure; the same runs FormulaText typesets.
import { formulaParts, type FormulaOptions } from './formula-parts';

const SUB: Record<string, string> = { '0': '₀', '1': '₁', '2': '₂', '3': '₃', '4': '₄', '5': '₅', '6': '₆', '7': '₇', '8': '₈', '9': '₉' };
const SUP: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '+': '⁺', '\u2212': '⁻', '-': '⁻' };

const mapped = (text: string, table: Record<string, string>) => [...text].map((c) => table[c] ?? c).join('');

export function formulaUnicode(value: string, options: FormulaOptions = {}): string {
  return formulaParts(value, options)
    .map((p) => (p.kind === 'sub' ? mapped(p.text, SUB) : p.kind === 'sup' ? mapped(p.text, SUP) : p.text))
    .join('');
}
