// A species picked in the step editor's search: the text the equation gets and the label the species map binds.
// Structures (PubChem, from memory): ethyl acetate CCOC(C)=O; acetophenone CC(=O)c1ccccc1.
import { describe, expect, it } from 'vitest';
import { addTerm, defaultPhase, insertionFor, labelFor, replaceNamed } from '@/app/(app)/routes/[routeId]/_components/species-insert';
import { StepInput } from '@/lib/schemas/route';

const ethylAcetate = {
  name: 'ethyl acetate',
  smiles: 'CCOC(C)=O',
  phases: [
    { phase: 'g' as const, key: '{XEKOWRVHYACXOJ-UHFFFAOYSA-N}(g)', source: 'ATcT' },
    { phase: 'l' as const, key: '{XEKOWRVHYACXOJ-UHFFFAOYSA-N}(l)', source: 'NIST WebBook' },
  ],
};
const methanol = { name: 'methanol', smiles: 'CO', phases: [{ phase: 'l' as const, key: 'CH3OH(l)', source: 'NBS 1982' }] };

describe('insertionFor', () => {
  it('writes a formula key of the library as it is, with no label', () => {
    expect(insertionFor(methanol, 'l', undefined, '')).toEqual({ term: 'CH3OH(l)', species: undefined });
  });

  it('binds a structure-keyed species to a short label with its SMILES, phase and name', () => {
    const out = insertionFor(ethylAcetate, 'l', undefined, 'CH3COOH(l) + C2H5OH(l) ->');
    expect(out.term).toBe('ethylacetate(l)');
    expect(out.species).toEqual({ 'ethylacetate(l)': { smiles: 'CCOC(C)=O', phase: 'l', name: 'ethyl acetate' } });
    // The step still passes the save schema with the new label.
    expect(StepInput.safeParse({ id: 's1', equation: `CH3COOH(l) + C2H5OH(l) -> ${out.term} + H2O(l)`, species: out.species }).success).toBe(true);
  });

  it('reuses the label the step already has for the same structure and phase, and makes a new one for another phase', () => {
    const species = { EtOAc: { smiles: 'CCOC(C)=O', phase: 'l' as const, name: 'ethyl acetate' } };
    expect(insertionFor(ethylAcetate, 'l', species, 'EtOAc ->').term).toBe('EtOAc');
    const gas = insertionFor(ethylAcetate, 'g', species, 'EtOAc ->');
    expect(gas.term).toBe('ethylacetate(g)');
    expect(Object.keys(gas.species!)).toEqual(['EtOAc', 'ethylacetate(g)']);
  });

  it('gives a compound the library lacks a label too, so a step estimates exactly the structure picked', () => {
    const out = insertionFor({ name: "2'-aminoacetophenone", smiles: 'CC(=O)c1ccccc1N', phases: [] }, 'l', undefined, '');
    expect(out.term).toBe("S2'-aminoacetophenone(l)");
    expect(out.species![out.term]).toEqual({ smiles: 'CC(=O)c1ccccc1N', phase: 'l', name: "2'-aminoacetophenone" });
  });

  it('falls back to name and phase when the hit has neither structure nor data', () => {
    expect(insertionFor({ name: 'Kestrel amide', smiles: null, phases: [] }, 's', undefined, '').term).toBe('Kestrel amide(s)');
  });
});

describe('labelFor', () => {
  it('keeps letters, digits, hyphens and primes, starts with a letter, and never takes a label in use', () => {
    expect(labelFor('1,2-dichloroethane', 'l', new Set())).toBe('S12-dichloroethane(l)');
    expect(labelFor('acetophenone', 'l', new Set(['acetophenone(l)']))).toBe('acetophenone2(l)');
    expect(labelFor('N,N-dimethylformamide', 'l', new Set())).toBe('NN-dimethylformamide(l)');
    expect(labelFor('a very long name of a compound indeed', 'g', new Set()).length).toBeLessThanOrEqual(24 + 3);
  });
});

describe('defaultPhase', () => {
  it('prefers a liquid with data, then gas, and a liquid estimate when nothing has data', () => {
    expect(defaultPhase(ethylAcetate)).toBe('l');
    expect(defaultPhase({ phases: [{ phase: 'g', key: 'CO(g)', source: 'NBS 1982' }] })).toBe('g');
    expect(defaultPhase({ phases: [] })).toBe('l');
  });
});

describe('addTerm', () => {
  it('adds a reactant before the arrow and a product after it', () => {
    expect(addTerm('A(l) -> B(l)', 'reactants', 'C(l)')).toBe('A(l) + C(l) -> B(l)');
    expect(addTerm('A(l) -> B(l)', 'products', 'C(l)')).toBe('A(l) -> B(l) + C(l)');
    expect(addTerm('A(l) = B(l)', 'products', 'C(l)')).toBe('A(l) = B(l) + C(l)');
  });

  it('starts an empty side, and gives an equation without an arrow one for its first product', () => {
    expect(addTerm('', 'reactants', 'A(l)')).toBe('A(l)');
    expect(addTerm('A(l) ->', 'products', 'B(l)')).toBe('A(l) -> B(l)');
    expect(addTerm('-> B(l)', 'reactants', 'A(l)')).toBe('A(l) -> B(l)');
    expect(addTerm('A(l) +', 'reactants', 'B(l)')).toBe('A(l) + B(l)');
    expect(addTerm('A(l)', 'products', 'B(l)')).toBe('A(l) -> B(l)');
  });
});

describe('replaceNamed', () => {
  it('replaces the ambiguous name wherever it is written, in any case and spacing, and nothing else', () => {
    expect(replaceNamed('Xylenol (l) + 2 O2(g) -> xylenol(l)', 'xylenol', 'l', 'dmp(l)')).toBe('dmp(l) + 2 O2(g) -> dmp(l)');
    expect(replaceNamed('methylxylenol(l) -> B(l)', 'xylenol', 'l', 'X')).toBe('methylxylenol(l) -> B(l)');
  });
});
