// Remedy sentences read like a chemist's: multiples in words or powers of ten, never "10^22.8-fold", e-notation or a hyphen for minus.
import { describe, expect, it } from 'vitest';
import { single } from './remedy-helpers';

const E_NOTATION = /\d(\.\d+)?e[+-]?\d/i;
const HYPHEN_MINUS_NUMBER = /(^|[\s(=])-\d/;

describe('conditions remedy sentences', () => {
  it('say how far Q must fall in words when no single change gets there (CaCO3 calcination at 298 K)', () => {
    // ΔG° ≈ +130.4 kJ/mol at 298 K (NBS 1982 tables, as the engine's library holds them): Q must fall about 7 × 10²²-fold.
    const { conditions } = single('CaO(s)', { equation: 'CaCO3(s) -> CaO(s) + CO2(g)' });
    const text = conditions[0]!.summary;
    expect(text).toMatch(/^Q would have to fall \d(\.\d)? × 10²²-fold \(ln Q from 0 to below −52\.6/);
    expect(text).toContain('products ≥ 10⁻⁶ bar or 10⁻⁹ mol/L');
    expect(text).not.toContain('10^');
    expect(text).not.toMatch(E_NOTATION);
    expect(text).not.toMatch(HYPHEN_MINUS_NUMBER);
  });

  it('word an excess as a multiple and a goal with the true minus (N2O4 ⇌ 2 NO2, marginal threshold −17 kJ/mol)', () => {
    const { conditions } = single('NO2(g)', { equation: 'N2O4(g) -> 2 NO2(g)' }, { marginalThreshold_kJ: -17 });
    const excess = conditions.find((c) => c.action === 'reactant-excess');
    for (const c of conditions) {
      expect(c.summary).not.toMatch(E_NOTATION);
      expect(c.summary).not.toMatch(HYPHEN_MINUS_NUMBER);
    }
    if (excess) expect(excess.summary).toMatch(/^Use a [\d.,]+( (million|billion|trillion))?-fold excess of N2O4\(g\)/);
  });
});
