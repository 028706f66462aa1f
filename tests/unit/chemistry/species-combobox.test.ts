// The species search field and the ambiguous-name pick list, server-rendered (no DOM): ARIA wiring, the words each
// match carries, and how an AMBIGUOUS_NAME answer is read. Methyl crotonate's two isomers (E and unspecified) are
// PubChem's, as the identifier table carries them (CAS 623-43-8 and 4358-59-2).
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { ambiguityOf } from '@/app/(app)/routes/[routeId]/_components/ambiguous-name-choices';
import { hitOrigin, hitPhases, SpeciesCombobox } from '@/components/chemistry/species-combobox';

function render(): string {
  const client = new QueryClient();
  return renderToStaticMarkup(createElement(QueryClientProvider, { client }, createElement(SpeciesCombobox, { label: 'Add species', onPick: () => {} })));
}

describe('SpeciesCombobox', () => {
  it('is a labelled combobox that controls a listbox, closed until the user types', () => {
    const html = render();
    const input = /<input[^>]*role="combobox"[^>]*>/.exec(html)?.[0] ?? '';
    expect(input).toMatch(/aria-expanded="false"/);
    expect(input).toMatch(/aria-autocomplete="list"/);
    const inputId = /id="([^"]+)"/.exec(input)![1];
    const listId = /aria-controls="([^"]+)"/.exec(input)![1];
    expect(html).toContain(`<label for="${inputId}"`);
    expect(html).toMatch(new RegExp(`<ul id="${listId}" role="listbox"`));
    expect(html).toMatch(/role="status"/);
    expect(input).not.toMatch(/aria-activedescendant/);
  });
});

describe('hitOrigin and hitPhases', () => {
  it('name the library source, the team provenance, or that a step would estimate the compound', () => {
    const phases = [
      { phase: 'g' as const, key: 'C2H5OH(g)', source: 'ATcT' },
      { phase: 'l' as const, key: 'C2H5OH(l)', source: 'ATcT' },
    ];
    expect(hitOrigin({ origin: 'library', phases })).toEqual({ origin: 'library', source: 'ATcT' });
    expect(hitPhases({ phases })).toBe('gas, liquid');
    expect(hitOrigin({ origin: 'estimated', phases: [] })).toMatchObject({ origin: 'estimated' });
    expect(hitPhases({ phases: [] })).toBe('no data: would be estimated');
  });
});

describe('ambiguityOf', () => {
  const choices = [
    { name: 'methyl crotonate', smiles: 'CC=CC(=O)OC', formula: 'C5H8O2', inchikey: 'MCVVUJPXSBQTRZ-UHFFFAOYSA-N', cas: '4358-59-2' },
    { name: 'methyl crotonate', smiles: 'C/C=C/C(=O)OC', formula: 'C5H8O2', inchikey: 'MCVVUJPXSBQTRZ-ONEGZZNKSA-N', cas: '623-43-8' },
  ];

  it('reads the name, phase and choices of an AMBIGUOUS_NAME answer', () => {
    const answer = { error: { code: 'AMBIGUOUS_NAME', message: '…', position: null, details: { name: 'methyl crotonate', phase: 'l', choices } } };
    expect(ambiguityOf(answer)).toEqual({ name: 'methyl crotonate', phase: 'l', choices });
  });

  it('is null for a balanced answer, another error, or details it cannot use', () => {
    expect(ambiguityOf({ equation: 'A', isBalanced: true, message: 'Balanced.', balanced: 'A' })).toBeNull();
    expect(ambiguityOf({ error: { code: 'UNKNOWN_SPECIES', message: '…', position: 0 } })).toBeNull();
    expect(ambiguityOf({ error: { code: 'AMBIGUOUS_NAME', message: '…', details: { name: 'x', phase: 'plasma', choices } } })).toBeNull();
    expect(ambiguityOf({ error: { code: 'AMBIGUOUS_NAME', message: '…', details: { name: 'x', phase: 'l', choices: [] } } })).toBeNull();
    expect(ambiguityOf(undefined)).toBeNull();
  });
});
