// The species page and list for a species known by structure, server-rendered (no DOM in this suite): drawing, typeset
// formula, origin and source, SMILES and InChIKey, and never the structure key itself. Ethyl acetate: SMILES CCOC(C)=O,
// InChIKey XEKOWRVHYACXOJ-UHFFFAOYSA-N, CAS 141-78-6 (PubChem CID 8857), values from the NIST WebBook per the library.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { SpeciesDetail } from '@/app/(app)/species/[key]/species-detail-client';
import { originOfDetail } from '@/app/(app)/species/_components/species-identity';
import { DataTable } from '@/components/tables/data-table';
import { speciesColumns } from '@/components/tables/species-columns';
import type { SpeciesDetailDto } from '@/lib/services/species/get-species';
import type { SpeciesRowDto } from '@/lib/services/species/species-dto';
import { formationSeries } from '@/lib/species/formation-series';
import { builtinLookup } from '@/lib/thermo/species-library';

const KEY = '{XEKOWRVHYACXOJ-UHFFFAOYSA-N}(l)';
const ethylAcetate = builtinLookup.get(KEY)!;
const detail: SpeciesDetailDto = {
  key: KEY, inUse: 'library', team: null, builtin: ethylAcetate, series: formationSeries(ethylAcetate, builtinLookup), builtinSeries: null, routes: [],
};

describe('the species page of a species known by structure', () => {
  const html = renderToStaticMarkup(createElement(SpeciesDetail, { detail, canEdit: false }));

  it('draws it, typesets its formula and names it, never by its structure key', () => {
    expect(ethylAcetate.structure?.smiles).toBe('CCOC(C)=O');
    expect(html).toContain('alt="ethyl acetate (C4H8O2)"');
    expect(html).toContain('src="/api/structures/svg?smiles=CCOC%28C%29%3DO&amp;w=240&amp;h=180"');
    expect(html).toContain('C<sub>4</sub>H<sub>8</sub>O<sub>2</sub>(l)');
    expect(html).toContain('<h1 class="text-xl font-semibold tracking-tight text-ink">ethyl acetate (l)</h1>');
    expect(html).not.toContain('{XEKOWRVHYACXOJ');
    expect(html).toContain('No route of your team uses ethyl acetate (l) yet.');
  });

  it('shows the origin with its source, the SMILES and the InChIKey, and keeps the caution', () => {
    expect(html).toContain('>Library<');
    expect(html).toMatch(/Source<\/dt><dd[^>]*>ΔfH°: NIST WebBook/);
    expect(html).toContain('>CCOC(C)=O<');
    expect(html).toContain('>XEKOWRVHYACXOJ-UHFFFAOYSA-N<');
    expect(html).toContain('>141-78-6<');
    expect(html).toContain('says nothing of rates, runaway or toxicity');
  });

  it('takes σ(ΔfG°) as the library states it, and says nothing of σ when none is stated', () => {
    expect(originOfDetail(detail)).toEqual({ origin: 'library', source: ethylAcetate.source, sigma_kJ: ethylAcetate.uncertainty.dfG_kJ ?? undefined });
  });
});

describe('the species list row of a species known by structure', () => {
  it('typesets the formula in place of the key and labels the link by name', () => {
    const row: SpeciesRowDto = {
      key: KEY, formula: 'C4H8O2', name: 'ethyl acetate', phase: 'l', form: null, dfH_kJ: ethylAcetate.dfH_kJ, dfG_kJ: ethylAcetate.dfG_kJ,
      S_J_per_K: ethylAcetate.S_J_per_K, source: ethylAcetate.source, origin: 'library', overridesBuiltin: false, shadowedByTeam: false, teamSpeciesId: null,
    };
    const html = renderToStaticMarkup(createElement(DataTable<SpeciesRowDto>, {
      caption: 'species', data: [row], columns: speciesColumns(), sorting: [], onSortingChange: () => undefined, getRowId: (r) => r.key,
    }));
    expect(html).toContain('aria-label="ethyl acetate (l): values, plot and routes"');
    expect(html).toContain('C<sub>4</sub>H<sub>8</sub>O<sub>2</sub>(l)');
    expect(html).toContain('title="Published value from ΔfH°: NIST WebBook');
    expect(html).not.toMatch(/>\{XEKOWRVHYACXOJ/);
  });
});
