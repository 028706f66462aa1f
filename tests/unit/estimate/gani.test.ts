// Gani (2022) GC-simple fallback: fragmentation rules, the published equation and refusals. Group values
// are read from the committed tables (lib/thermo/data/source/estimation/gani); "authors' vector" and
// "authors' prediction" refer to the paper's supporting information as carried in
// agani_authors_fragmentation_hf.csv / _gf.csv.
import { beforeAll, describe, expect, it } from 'vitest';
import { loadChem, type Chem } from '@/lib/thermo/structure/chem';
import { elementEntropySum, estimateGani, exactCovers, ganiFragment } from '@/lib/thermo/estimate/gani';
import { expandLinkNode } from '@/lib/thermo/estimate/gani/link-nodes';
import { expectThermoError } from '../thermo/expect-thermo-error';

let chem: Chem;
beforeAll(async () => {
  chem = await loadChem();
});

const vector = (smiles: string): string =>
  [...ganiFragment(chem, smiles).counts]
    .sort((a, b) => a[0] - b[0])
    .map(([g, c]) => `${g}:${c}`)
    .join(';');

describe('exact cover with the fewest groups', () => {
  it('prefers fewer, larger groups and returns every tie', () => {
    // atoms 0..3; {0,1},{2,3} beats four singles; {0,1},{2},{3} is longer
    const singles = [0, 1, 2, 3].map((a) => ({ group: 1, atoms: [a] }));
    const r = exactCovers(4, [...singles, { group: 2, atoms: [0, 1] }, { group: 3, atoms: [2, 3] }, { group: 4, atoms: [1, 2] }]);
    expect(r.covers).toHaveLength(1);
    expect(r.covers[0]!.map((i) => i).sort()).toEqual([4, 5]);
    const tie = exactCovers(3, [{ group: 1, atoms: [0, 1] }, { group: 2, atoms: [1, 2] }, { group: 3, atoms: [0] }, { group: 4, atoms: [2] }]);
    expect(tie.covers).toHaveLength(2);
  });

  it('reports atoms nothing covers', () => {
    expect(exactCovers(3, [{ group: 1, atoms: [0, 1] }]).uncovered).toEqual([2]);
  });
});

describe('Gani fragmentation (authors’ vectors from the SI)', () => {
  it('reproduces the authors’ vectors for common molecules', () => {
    expect(vector('CCO')).toBe('1:1;2:1;29:1');
    expect(vector('OCC(O)CO')).toBe('2:2;3:1;29:3;241:2');
    expect(vector('CC(C)CC(N)C(=O)O')).toBe('1:2;2:1;3:1;31:1;55:1;221:1;246:1');
    expect(vector('O=C(N)c1ccccc1')).toBe('15:5;94:1');
  });

  it('breaks the pinacolone tie as the authors do: 3 CH3 + C + CH3CO, not 4 CH3 + CCO', () => {
    expect(vector('CC(=O)C(C)(C)C')).toMatch(/^1:3;4:1;33:1;/);
    expect(ganiFragment(chem, 'CC(=O)C(C)(C)C').tiedCovers).toBe(2);
  });

  it('puts substituents on aromatic carbons in aC-X groups (anisole, N-methylaniline: authors’ vectors)', () => {
    expect(vector('COc1ccccc1')).toBe('1:1;15:5;53:1');
    expect(vector('CNc1ccccc1')).toBe('1:1;15:5;63:1');
  });

  it('uses the authors’ aromaticity: benzene and pyridine rings aromatic, furan and pyrrole not', () => {
    expect(vector('c1ccncc1')).toBe('15:5;19:1');
    expect(vector('c1ccoc1')).toBe('171:2;179:1');
    expect(vector('c1cc[nH]c1')).toBe('171:2;175:1');
    // indole: the benzene ring stays aromatic, the pyrrole ring is matched in its Kekulé form
    expect(vector('c1ccc2[nH]ccc2c1')).toContain('17:2');
  });

  it('counts link-node groups on the shortest chain that matches (adipic acid yes, hexanoic acid no)', () => {
    expect(vector('OC(=O)CCCCC(=O)O')).toContain('351:1');
    expect(vector('CCCCCC(=O)O')).not.toContain('351:');
  });

  it('expands a link node in a chain of bracket atoms', () => {
    expect(expandLinkNode('[NH2][CX4H2;!R][OH]', 1, 3)).toBe('[NH2][CX4H2;!R][CX4H2;!R][CX4H2;!R][OH]');
    expect(expandLinkNode('[NX1H0]#[CH0][CX4H2;!R][CH0]#[NX1H0]', 2, 2)).toBe('[NX1H0]#[CH0][CX4H2;!R][CX4H2;!R][CH0]#[NX1H0]');
  });
});

describe('estimateGani', () => {
  it('ethanol: equals the authors’ GC-simple prediction and the ATcT value within σ', () => {
    const e = estimateGani(chem, 'CCO');
    expect(e.dfH_kJ).toBeCloseTo(-234.956277705096, 4); // authors' prediction (SI); the table rounds their values at ~1e-6
    expect(Math.abs(e.dfH_kJ - -234.57)).toBeLessThan(e.sigma_dfH_kJ); // ATcT 1.112 via organics/species.csv
    expect(e.method).toBe('group contribution (Gani 2022)');
    expect(e.groups.map((g) => g.label)).toEqual(['CH3', 'CH2', 'OH']);
    expect(e.groups.every((g) => g.source.includes('Gani'))).toBe(true);
  });

  it('S° follows from ΔfH° and ΔfG° with the CODATA element entropies (published identity)', () => {
    const e = estimateGani(chem, 'CCO');
    const elements = (elementEntropySum({ C: 2, H: 6, O: 1 }) as { sum: number }).sum;
    expect(elements).toBeCloseTo(2 * 5.74 + 3 * 130.68 + 205.152 / 2, 9);
    expect(e.S_J_per_K).toBeCloseTo(elements + ((e.dfH_kJ - e.dfG_kJ) * 1000) / 298.15, 9);
  });

  it('carries σ for molecules outside the regression set, and no Cp', () => {
    const e = estimateGani(chem, 'c1ccncc1');
    expect(e.sigma_dfH_kJ).toBeGreaterThanOrEqual(25);
    expect(e.sigma_dfG_kJ).toBeGreaterThanOrEqual(35);
    expect(e.cp).toBeNull();
    expect(e.notes.join(' ')).toMatch(/Joback Cp/);
  });

  it('refuses instead of summing partial or missing groups', () => {
    expect(expectThermoError(() => estimateGani(chem, 'C'), 'UNSUPPORTED_STRUCTURE').message).toContain('C1');
    expectThermoError(() => estimateGani(chem, 'CC(=O)[O-]'), 'UNSUPPORTED_STRUCTURE');
    expectThermoError(() => estimateGani(chem, 'OCl'), 'UNSUPPORTED_STRUCTURE');
    // CH=N has no published value (0 in the table): no estimate from the rest of the molecule
    expect(expectThermoError(() => estimateGani(chem, 'CC=NC'), 'UNSUPPORTED_STRUCTURE').message).toContain('CH=N');
  });
});
