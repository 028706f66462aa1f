// Where a species saved in the board's "new species from a structure" dialog goes: the step that asked, in the place
// it wrote the missing species, or a side the user picks. Structures (PubChem, from memory): tert-butyl
// N-(4-acetamidophenyl)carbamate CC(=O)Nc1ccc(NC(=O)OC(C)(C)C)cc1 (C13H18N2O3); acetic acid CC(=O)O. The InChIKey-style
// keys below are placeholders: the placement copies whatever key the server gave.
import { describe, expect, it } from 'vitest';
import { placeAsked, placeOnSide, receivingStep, type PickedSpecies } from '@/app/(app)/routes/[routeId]/_components/new-species-placement';
import { StepInput } from '@/lib/schemas/route';

const BOC = 'CC(=O)Nc1ccc(NC(=O)OC(C)(C)C)cc1';
const saved: PickedSpecies = { name: 'boc-aminoacetanilide', smiles: BOC, phase: 'l', key: '{TEAMKEY-UHFFFAOYSA-N}(l)' };
const valid = (step: { equation: string; species?: StepInput['species'] }) => StepInput.safeParse({ id: 's1', equation: step.equation, species: step.species, position: { x: 0, y: 0 } }).success;

describe('receivingStep', () => {
  it('is the step that asked while it is on the board', () => {
    expect(receivingStep('a', 'b', ['a', 'b'])).toBe('a');
  });
  it('falls back to the selected step when the asking one was removed, or when the palette asked', () => {
    expect(receivingStep('gone', 'b', ['a', 'b'])).toBe('b');
    expect(receivingStep(null, 'b', ['a', 'b'])).toBe('b');
  });
  it('is none when no step is selected', () => {
    expect(receivingStep(null, null, ['a'])).toBeNull();
    expect(receivingStep(null, 'gone', ['a'])).toBeNull();
  });
});

describe('placeAsked', () => {
  it('puts a label bound to the saved structure where the step wrote the missing name', () => {
    const step = { equation: 'CH3COOH(l) + boc-aminoacetanilide(l) -> CO2(g)', species: undefined };
    const placed = placeAsked(step, { name: 'boc-aminoacetanilide', phase: 'l' }, saved)!;
    // The name's own text is free again once replaced, so the label keeps it rather than taking "…2(l)".
    expect(placed).toMatchObject({ how: 'replaced', term: 'boc-aminoacetanilide(l)', equation: 'CH3COOH(l) + boc-aminoacetanilide(l) -> CO2(g)' });
    expect(placed.species).toEqual({ 'boc-aminoacetanilide(l)': { smiles: BOC, phase: 'l', name: 'boc-aminoacetanilide' } });
    expect(valid(placed)).toBe(true);
  });

  it('replaces every writing of the name, whatever its case and spacing, and keeps the other labels', () => {
    const step = { equation: 'Boc-Aminoacetanilide (l) + X(l) -> boc-aminoacetanilide(l)', species: { 'X(l)': { smiles: 'CC(=O)O', phase: 'l' as const } } };
    const placed = placeAsked(step, { name: 'boc-aminoacetanilide', phase: 'l' }, saved)!;
    expect(placed.equation).toBe('boc-aminoacetanilide(l) + X(l) -> boc-aminoacetanilide(l)');
    expect(Object.keys(placed.species!).sort()).toEqual(['X(l)', 'boc-aminoacetanilide(l)']);
  });

  it('binds the step’s own label for the asked structure to the saved species, leaving the equation as written', () => {
    const step = { equation: 'AcNH(l) + Boc2O(l) -> BocAc(l) + tBuOH(l) + CO2(g)', species: { 'BocAc(l)': { smiles: 'CC(=O)Nc1ccc(NC(=O)OC(C)(C)C)cc1', phase: 'l' as const, estimate: true } } };
    const placed = placeAsked(step, { smiles: 'CC(=O)Nc1ccc(NC(=O)OC(C)(C)C)cc1', phase: 'l' }, saved)!;
    expect(placed).toMatchObject({ how: 'bound', term: 'BocAc(l)', equation: step.equation });
    expect(placed.species!['BocAc(l)']).toEqual({ smiles: BOC, phase: 'l', name: 'boc-aminoacetanilide' });
  });

  it('leaves the choice to the user when the species was saved in another phase than the step wrote', () => {
    expect(placeAsked({ equation: 'boc-aminoacetanilide(s) -> CO2(g)' }, { name: 'boc-aminoacetanilide', phase: 's' }, saved)).toBeNull();
  });

  it('leaves the choice to the user when the step did not write the name, or nothing was carried (the palette)', () => {
    expect(placeAsked({ equation: 'CH3COOH(l) -> CO2(g)' }, { name: 'boc-aminoacetanilide', phase: 'l' }, saved)).toBeNull();
    expect(placeAsked({ equation: 'CH3COOH(l) -> CO2(g)' }, {}, saved)).toBeNull();
  });

  it('writes a library key as it is when the dialog found the species in the library', () => {
    const acetic: PickedSpecies = { name: 'acetic acid', smiles: 'CC(=O)O', phase: 'l', key: 'CH3COOH(l)' };
    const placed = placeAsked({ equation: 'ethanol(l) + vinegar acid(l) -> H2O(l)' }, { name: 'vinegar acid', phase: 'l' }, acetic)!;
    expect(placed).toMatchObject({ how: 'replaced', term: 'CH3COOH(l)', equation: 'ethanol(l) + CH3COOH(l) -> H2O(l)', species: undefined });
  });
});

describe('placeOnSide', () => {
  it('adds the species to the chosen side under a label bound to its structure, as the Add species search does', () => {
    const step = { equation: 'S4-aminoacetanilide(l) + Boc2O(l)', species: undefined };
    const product = placeOnSide(step, saved, 'products');
    expect(product).toMatchObject({ how: 'added', term: 'boc-aminoacetanilide(l)', equation: 'S4-aminoacetanilide(l) + Boc2O(l) -> boc-aminoacetanilide(l)' });
    expect(product.species).toEqual({ 'boc-aminoacetanilide(l)': { smiles: BOC, phase: 'l', name: 'boc-aminoacetanilide' } });
    expect(placeOnSide({ equation: 'A(l) -> B(l)' }, saved, 'reactants').equation).toBe('A(l) + boc-aminoacetanilide(l) -> B(l)');
  });

  it('takes a fresh label when the name’s label is already bound to another structure', () => {
    const step = { equation: 'boc-aminoacetanilide(l) -> CO2(g)', species: { 'boc-aminoacetanilide(l)': { smiles: 'CC(=O)O', phase: 'l' as const } } };
    expect(placeOnSide(step, saved, 'products').term).toBe('boc-aminoacetanilide2(l)');
  });
});
