// The links into "new species from a structure": what an engine error carries over (typed structure, name, phase),
// and the way back, which only ever leads to a route of this site.
import { describe, expect, it } from 'vitest';
import { fromStructureHref, readSeed, safeReturnPath } from '@/app/(app)/species/_components/from-structure-href';
import { missingSpeciesSeed } from '@/app/(app)/routes/[routeId]/_components/step-species-notes';

describe('missingSpeciesSeed', () => {
  it('carries the SMILES and phase of the label an error names', () => {
    const species = { 'Boc-AMP': { smiles: 'CC(C)(C)OC(=O)NC(C)(C)CO', phase: 'l' as const } };
    const error = { code: 'UNSUPPORTED_STRUCTURE', message: 'No group covers atom 3.', field: 'steps.0.species.Boc-AMP.smiles' };
    expect(missingSpeciesSeed(error, species)).toEqual({ smiles: 'CC(C)(C)OC(=O)NC(C)(C)CO', phase: 'l', noEstimate: true });
  });

  it('reads a name and phase typed in the equation from the engine’s message', () => {
    expect(missingSpeciesSeed({ code: 'UNKNOWN_SPECIES', message: 'Unknown species name "kestrelamine(l)" (closest: …)', field: 'equation' })).toEqual({ name: 'kestrelamine', phase: 'l', noEstimate: false });
    expect(missingSpeciesSeed({ code: 'UNKNOWN_SPECIES', message: 'No compound called "kestrelamine" is known. Give it by SMILES to have it estimated.' })).toEqual({ name: 'kestrelamine', noEstimate: false });
    expect(missingSpeciesSeed({ code: 'UNKNOWN_SPECIES', message: 'Not in the species library: C9H19NO3(l) (closest: C9H20(l))' })).toEqual({ phase: 'l', noEstimate: false });
  });

  it('offers nothing for errors that are not about a missing species', () => {
    expect(missingSpeciesSeed({ code: 'NOT_BALANCED', message: 'Not balanced: C 1 ≠ 2' })).toBeNull();
    expect(missingSpeciesSeed(null)).toBeNull();
  });
});

describe('fromStructureHref and the way back', () => {
  it('puts what was typed and the route to return to in the link', () => {
    const href = fromStructureHref({ smiles: 'CCO', name: 'kestrelamine', phase: 'l', returnTo: '/routes/12' });
    const params = new URL(href, 'http://x').searchParams;
    expect(new URL(href, 'http://x').pathname).toBe('/species/from-structure');
    expect(Object.fromEntries(params)).toEqual({ smiles: 'CCO', name: 'kestrelamine', phase: 'l', return: '/routes/12' });
  });

  it('returns only to a route of this site', () => {
    expect(safeReturnPath('/routes/12?step=s2')).toBe('/routes/12?step=s2');
    for (const bad of ['https://elsewhere.example/routes/1', '//elsewhere.example/routes/1', 'javascript:alert(1)', '/species/x', '/routes/../admin']) {
      expect(safeReturnPath(bad)).toBeNull();
    }
    expect(readSeed({ return: '//evil.example', phase: 'plasma', smiles: 'CCO' })).toEqual({ smiles: 'CCO', name: null, phase: null, returnTo: null });
  });
});
