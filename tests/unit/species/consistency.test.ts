import { describe, expect, it } from 'vitest';
import { checkConsistency, CONSISTENCY_TOLERANCE_KJ, elementEntropies, formationEntropy } from '@/lib/species/consistency';
import { builtinLookup, builtinSpecies } from '@/lib/thermo/species-library';

// Rows of the NBS tables (Wagman et al., J. Phys. Chem. Ref. Data 11, Suppl. 2, 1982), as carried in lib/thermo/data/species-library.json.
const nbs = (key: string) => {
  const r = builtinLookup.get(key)!;
  expect(r.source).toBe('NBS 1982');
  return r;
};

describe('ΔfG° = ΔfH° − T·ΔfS° against NBS 1982 rows', () => {
  it('reads S° per atom of the elements from the reference-state rows', () => {
    const s = elementEntropies();
    // NBS 1982: S°(H2, g) = 130.684, S°(O2, g) = 205.138, S°(C, graphite) = 5.740 J/(mol K).
    expect(s.get('H')).toEqual({ perAtom_J_per_K: 130.684 / 2, from: 'H2(g)' });
    expect(s.get('O')!.perAtom_J_per_K).toBeCloseTo(205.138 / 2, 12);
    expect(s.get('C')).toEqual({ perAtom_J_per_K: 5.74, from: 'C(s)' });
  });

  it('H2O(l): ΔfS° = 69.91 − 130.684 − 205.138/2 and ΔfG° −237.129 kJ/mol within 0.01', () => {
    const r = nbs('H2O(l)');
    const f = formationEntropy(r.elements, 0, r.S_J_per_K);
    expect(f.dfS_J_per_K).toBeCloseTo(69.91 - 130.684 - 102.569, 9);
    const c = checkConsistency({ elements: r.elements, charge: 0, dfH_kJ: -285.83, S_J_per_K: 69.91, dfG_kJ: -237.129 });
    expect(c.status).toBe('consistent');
    if (c.status === 'consistent') expect(Math.abs(c.difference_kJ)).toBeLessThan(0.01);
  });

  it('an ion is formed against H+(aq) and H2(g): Na+(aq) ΔfH° −240.12, ΔfG° −261.905, S° 59.0', () => {
    const c = checkConsistency({ elements: { Na: 1 }, charge: 1, dfH_kJ: -240.12, S_J_per_K: 59.0, dfG_kJ: -261.905 });
    expect(c.status).toBe('consistent');
    // Without the ½ S°(H2) per charge the same row is off by 298.15·65.342 J ≈ 19.5 kJ/mol.
    const wrong = checkConsistency({ elements: { Na: 1 }, charge: 0, dfH_kJ: -240.12, S_J_per_K: 59.0, dfG_kJ: -261.905 });
    expect(wrong.status).toBe('inconsistent');
  });

  it('passes every NBS 1982 row of the library', () => {
    const rows = builtinSpecies().filter((r) => r.source === 'NBS 1982');
    expect(rows.length).toBeGreaterThan(100);
    const failing = rows.filter((r) => {
      const c = checkConsistency({ elements: r.elements, charge: r.charge, dfH_kJ: r.dfH_kJ, S_J_per_K: r.S_J_per_K, dfG_kJ: r.dfG_kJ });
      return c.status !== 'consistent';
    });
    expect(failing.map((r) => r.key)).toEqual([]);
  });

  it('fails a row whose ΔfG° is off by more than the tolerance, and derives a missing one', () => {
    const off = checkConsistency({ elements: { C: 1, O: 2 }, charge: 0, dfH_kJ: -393.509, S_J_per_K: 213.74, dfG_kJ: -394.359 + 2 * CONSISTENCY_TOLERANCE_KJ });
    expect(off.status).toBe('inconsistent');
    const derived = checkConsistency({ elements: { C: 1, O: 2 }, charge: 0, dfH_kJ: -393.509, S_J_per_K: 213.74, dfG_kJ: null });
    expect(derived.status).toBe('derived');
    // NBS 1982 CO2(g): ΔfG° −394.359 kJ/mol.
    if (derived.status === 'derived') expect(derived.expected_kJ).toBeCloseTo(-394.359, 1);
  });

  it('cannot check an element the library has no reference row for', () => {
    const c = checkConsistency({ elements: { U: 1, O: 2 }, charge: 0, dfH_kJ: -1085, S_J_per_K: 77, dfG_kJ: -1031.8 });
    expect(c).toEqual({ status: 'unchecked', missing: ['U'] });
  });
});
