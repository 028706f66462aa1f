// Step CSVs say where each step's numbers came from, so a spreadsheet never takes an estimate for measured data:
// data_origin (library, team, estimated, mixed), the estimated species and method, the library sources, σ(ΔrG°) and
// whether the sign is within σ — on the board's CSV and on the comparison's. Routes are real evaluations: NBS
// Tables 1982 reactions (tabulated) and an isopropanol-coupled ketone reduction on group-contribution estimates.
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { ORIGIN_COLUMNS, originCells } from '@/components/chemistry/origin-columns';
import { stepOrigin } from '@/components/chemistry/step-origin';
import { COMPARE_STEP_COLUMNS, compareStepsCsv } from '@/components/compare/steps-csv';
import { LADDER_CSV_COLUMNS, ladderStepsCsv } from '@/components/ladder/ladder-csv';
import { buildComparison } from '@/lib/compare/build-comparison';
import { evaluateRoute, type RouteEvaluateResponse } from '@/lib/thermo/route';
import { builtinLookup } from '@/lib/thermo/species-library';
import { loadChem } from '@/lib/thermo/structure/chem';
import { structureLookup } from '@/lib/thermo/structure/structure-lookup';
import { forComparison, oneStep } from '../compare/compare-fixtures';
import { estimatedEvaluation, sampleEvaluation } from '../ladder/ladder-fixture';

type Row = Record<string, string> & { estimated_species: string };
const parse = (csv: string): Row[] => Papa.parse<Row>(csv.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true }).data;

let estimated: RouteEvaluateResponse;
let mixed: RouteEvaluateResponse;
beforeAll(async () => {
  estimated = await estimatedEvaluation();
  // Acetophenone hydrogenated in water: the organics estimated, hydrogen from the library.
  mixed = evaluateRoute({
    target: 'alcohol',
    steps: [{ id: 'h2', equation: 'ketone + H2(g) -> alcohol', species: { ketone: { smiles: 'CC(=O)c1ccccc1', phase: 'aq' }, alcohol: { smiles: 'CC(O)c1ccccc1', phase: 'aq' } }, temperature: '298.15 K' }],
    links: [],
  }, { lookup: structureLookup(builtinLookup, await loadChem()), remedies: false });
});

describe('origin cells', () => {
  it('names each origin, estimated species and method; a step without species was not evaluated', () => {
    expect(originCells([], null, false)).toEqual(['not evaluated', '', '', '', '', '', '', '']);
    const species = mixed.steps[0]!.result!.species;
    const s = stepOrigin(species);
    expect(s.origin).toBe('mixed');
    expect(s.origins).toEqual(['library', 'estimated']);
    expect(s.estimated).toHaveLength(2);
    expect(s.methods.join(' ')).toMatch(/group/i);
    const cells = originCells(species, 12.345, true);
    expect(cells).toHaveLength(ORIGIN_COLUMNS.length);
    expect(cells[0]).toBe('mixed');
    expect(cells[6]).toBe(12.35);
    expect(cells[7]).toBe('yes');
  });
});

describe('the board’s steps CSV', () => {
  it('marks tabulated steps library with their source, and a step the engine could not read as not evaluated', () => {
    const rows = parse(ladderStepsCsv(sampleEvaluation(), { reform: 'Reformer' }));
    expect(Object.keys(rows[0]!)).toEqual([...LADDER_CSV_COLUMNS]);
    const reform = rows.find((r) => r.step_id === 'reform')!;
    expect(reform.label).toBe('Reformer');
    expect(reform.data_origin).toBe('library');
    expect(reform.estimated_species).toBe('');
    expect(reform.library_sources).not.toBe('');
    expect(reform.sign_within_sigma).toBe('no');
    // NBS Tables 1982: ΔG°(298.15 K) of steam reforming ≈ +142 kJ/mol (from memory), far outside any σ.
    expect(Number(reform.dG0_kJ_per_mol)).toBeGreaterThan(130);
    expect(rows.find((r) => r.step_id === 'bad')!.data_origin).toBe('not evaluated');
    expect(rows.at(-1)!.step).toBe('total');
  });

  it('marks the estimated step estimated, names its species, gives σ and says the sign is within it, on the step and the total', () => {
    const rows = parse(ladderStepsCsv(estimated));
    const step = rows.find((r) => r.step_id === 'kred')!;
    expect(step.data_origin).toBe('estimated');
    expect(step.estimated_species.split('; ')).toHaveLength(4);
    expect(step.estimation_method).toMatch(/group/i);
    expect(Number(step.sigma_dG_kJ_per_mol)).toBeGreaterThan(5);
    expect(step.sign_within_sigma).toBe('yes');
    const total = rows.at(-1)!;
    expect(total.data_origin).toBe('estimated');
    expect(total.sign_within_sigma).toBe('yes');
    expect(Number(total.sigma_dG_kJ_per_mol)).toBeGreaterThan(0);
  });

  it('calls a step on library and estimated values mixed and still names the estimates', () => {
    const step = parse(ladderStepsCsv(mixed)).find((r) => r.step_id === 'h2')!;
    expect(step.data_origin).toBe('mixed');
    expect(step.estimated_species.split('; ')).toHaveLength(2);
    expect(step.library_sources).not.toBe('');
  });
});

describe('the comparison’s steps CSV', () => {
  it('has the same origin columns for every compared step', () => {
    const kred = forComparison(oneStep('alcohol', 'ketone + IPA -> alcohol + acetone'), { name: 'KRED', outcome: { evaluation: estimated } });
    const burn = forComparison(oneStep('CO2(g)', 'C(s) + O2(g) -> CO2(g)'), { name: 'Burn' });
    const rows = parse(compareStepsCsv(buildComparison([kred, burn], {}, builtinLookup)));
    expect(Object.keys(rows[0]!)).toEqual([...COMPARE_STEP_COLUMNS]);
    const kredStep = rows.find((r) => r.route === 'KRED' && r.step === '1')!;
    expect(kredStep.data_origin).toBe('estimated');
    expect(kredStep.sign_within_sigma).toBe('yes');
    expect(Number(kredStep.sigma_dG_kJ_per_mol)).toBeGreaterThan(5);
    const burnStep = rows.find((r) => r.route === 'Burn' && r.step === '1')!;
    expect(burnStep.data_origin).toBe('library');
    expect(burnStep.estimated_species).toBe('');
    // NBS Tables 1982: ΔfG°(CO2, g) = −394.4 kJ/mol, so burning carbon is −394.4 kJ per mol of CO2.
    expect(Number(burnStep.dG0_kJ_per_mol_target)).toBeCloseTo(-394.4, 0);
    expect(rows.filter((r) => r.step === 'total').map((r) => r.route)).toEqual(['KRED', 'Burn']);
  });
});
