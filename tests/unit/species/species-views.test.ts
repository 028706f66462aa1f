// Server-renders the species table, detail, form, import preview and impact list (no DOM in this suite) to check what each shows.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { SpeciesDetail } from '@/app/(app)/species/[key]/species-detail-client';
import { ImportPreviewTable } from '@/app/(app)/species/_components/import-preview-table';
import { RouteImpactList } from '@/app/(app)/species/_components/route-impact-list';
import { TeamSpeciesFormView } from '@/app/(app)/species/_components/team-species-form';
import { DataTable } from '@/components/tables/data-table';
import { speciesColumns } from '@/components/tables/species-columns';
import type { SpeciesDetailDto } from '@/lib/services/species/get-species';
import type { PreviewRowDto } from '@/lib/services/species/import-preview';
import type { SpeciesRowDto, TeamSpeciesDto } from '@/lib/services/species/species-dto';
import { formationSeries } from '@/lib/species/formation-series';
import { builtinLookup, nbsLookup } from '@/lib/thermo/species-library';

const noop = () => undefined;
const builtinMethanol = builtinLookup.get('CH3OH(g)')!;
const row = (over: Partial<SpeciesRowDto>): SpeciesRowDto => ({
  key: 'CH3OH(g)', formula: 'CH4O', name: 'methanol', phase: 'g', form: null, dfH_kJ: -205, dfG_kJ: -166.3, S_J_per_K: 239.81,
  source: 'Estimated (group additivity)', origin: 'team', overridesBuiltin: true, shadowedByTeam: false, teamSpeciesId: 4, ...over,
});
const TEAM: TeamSpeciesDto = {
  id: 4, key: 'CH3OH(g)', formula: 'CH4O', phase: 'g', form: null, name: 'methanol (team estimate)', aliases: ['methanol (team estimate)'], charge: 0,
  dfH_kJ: -205, dfG_kJ: -166.3, dfGDerived: true, S_J_per_K: 239.81, Cp_J_per_K: null, cpTmin_K: null, cpTmax_K: null,
  sigmaDfH_kJ: 2, sigmaDfG_kJ: null, sigmaS_J_per_K: null, provenance: { kind: 'estimated', method: 'Kestrel Ridge group additivity, sheet 4' },
  importId: null, notes: '', version: 2, overridesBuiltin: true, updatedAt: '2026-12-02T09:00:00.000Z', updatedBy: 'Baptiste Osei',
  smiles: null, inchikey: null,
};

describe('the species table', () => {
  it('marks team rows, overrides and replaced built-ins in words, and links each key encoded', () => {
    const html = renderToStaticMarkup(createElement(DataTable<SpeciesRowDto>, {
      caption: 'species', data: [row({}), row({ origin: 'library', overridesBuiltin: false, shadowedByTeam: true, source: 'NBS 1982', teamSpeciesId: null }), row({ key: 'SO4-2(aq)', origin: 'library', overridesBuiltin: false })],
      columns: speciesColumns(), sorting: [], onSortingChange: noop, getRowId: (r) => `${r.origin}:${r.key}`,
    }));
    expect(html).toContain('overrides built-in');
    expect(html).toContain('replaced by your team’s');
    expect(html).toContain('href="/species/CH3OH(g)"');
    expect(html).toContain('href="/species/SO4-2(aq)"');
    expect(html).toContain('−205.0<');
    expect(html).not.toContain('−205.00');
  });
});

describe('the species detail', () => {
  const detail: SpeciesDetailDto = {
    key: 'CH3OH(g)', inUse: 'team', team: TEAM, builtin: builtinMethanol,
    series: formationSeries(builtinMethanol, nbsLookup), builtinSeries: formationSeries(builtinMethanol, nbsLookup),
    routes: [{ routeId: 7, routeName: 'Methanol from syngas', archived: false, stepKeys: ['s2'], steps: [{ number: 2, equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', label: 'Step 2 (methanol from carbon monoxide)' }] }],
  };

  it('shows team and built-in values with σ and sources, both plots, the routes using it and the caution', () => {
    const html = renderToStaticMarkup(createElement(SpeciesDetail, { detail, canEdit: true }));
    expect(html).toContain('Built-in (not used)');
    expect(html).toContain('± 2<');
    expect(html).toContain('none published');
    expect(html).toContain('Estimated by Kestrel Ridge group additivity, sheet 4');
    expect(html).toContain('NBS 1982');
    expect(html).toContain('team value derived from ΔfH° and S°');
    expect(html.match(/<svg/g)).toHaveLength(2);
    expect(html).toContain('href="/routes/7?step=s2"');
    expect(html).toContain('Step 2 (methanol from carbon monoxide)</span></a>');
    expect(html).not.toContain('>s2<');
    expect(html).toContain('href="/species/team/4/edit"');
    expect(html).toContain('says nothing of rates, runaway or toxicity');
  });

  it('offers no edit to a reader and says when no route uses it', () => {
    const html = renderToStaticMarkup(createElement(SpeciesDetail, { detail: { ...detail, routes: [] }, canEdit: false }));
    expect(html).not.toContain('Edit team values');
    expect(html).toContain('No route of your team uses CH3OH(g) yet.');
  });
});

describe('the team species form', () => {
  it('asks for values with units and for provenance', () => {
    const html = renderToStaticMarkup(createElement(QueryClientProvider, { client: new QueryClient() }, createElement(TeamSpeciesFormView, { existing: TEAM })));
    expect(html).toContain('ΔfH° (kJ/mol)');
    expect(html).toContain('S° (J/(mol K))');
    expect(html).toContain('kcal/mol');
    expect(html).toContain('Leave blank to derive it from ΔfH° and S°.');
    expect(html).toContain('Estimation method');
    expect(html).toContain('Which routes would change?');
  });
});

describe('the import preview', () => {
  const rows: PreviewRowDto[] = [
    { row: 1, key: 'CO2(g)', formula: 'CO2', phase: 'g', name: 'carbon dioxide', dfH_kJ: -393.509, dfG_kJ: -394.359, dfGDerived: false, S_J_per_K: 213.74, Cp_J_per_K: null, source: 'NBS 1982', consistencyDifference_kJ: 0.001, consistency: 'consistent', errors: {}, warnings: [], duplicate: { of: 'library', name: 'carbon dioxide', teamSpeciesId: null, dfG_kJ: -394.359, source: 'NBS 1982' } },
    { row: 2, key: null, formula: 'C2H6', phase: 'g', name: 'bad ethane', dfH_kJ: null, dfG_kJ: null, dfGDerived: false, S_J_per_K: null, Cp_J_per_K: null, source: null, consistencyDifference_kJ: null, consistency: null, errors: { S: '“x” is not a number.' }, warnings: [], duplicate: null },
  ];

  it('shows each row’s errors and a skip/override choice for a duplicate', () => {
    const html = renderToStaticMarkup(createElement(ImportPreviewTable, { rows, choices: {}, onChoice: noop, disabled: false }));
    expect(html).toContain('Error (S):</span> “x” is not a number.');
    expect(html).toContain('Override the built-in for your team');
    expect(html).toContain('Skip this row');
    expect(html).toContain('ΔfG° agrees with ΔfH° − TΔfS°');
  });

  it('lists routes whose ΔG changes, step by step', () => {
    const html = renderToStaticMarkup(createElement(RouteImpactList, {
      impact: [{ routeId: 7, routeName: 'Methanol from syngas', overallBefore_kJ: -20, overallAfter_kJ: -25, steps: [{ stepKey: 's2', label: 'Step 2 (methanol from carbon monoxide)', before_kJ: -20, after_kJ: -25 }] }], done: false,
    }));
    expect(html).toContain('1 route would get different ΔG values');
    expect(html).toContain('route ΔG −20.0 → −25.0 kJ');
    expect(html).toContain('ΔG −20.0 → −25.0 kJ/mol');
    expect(html).toContain('Step 2 (methanol from carbon monoxide)');
    expect(html).not.toContain('>s2<');
    expect(renderToStaticMarkup(createElement(RouteImpactList, { impact: [], done: true }))).toContain('No route of your team changed its ΔG.');
  });
});
