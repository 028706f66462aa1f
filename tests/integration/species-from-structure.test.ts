// New species from a structure: POST /api/species/team (estimate, entered values, a saved fit), the library and team
// duplicate checks, DELETE /api/species/team/[id] (unused 200, used 409 naming the routes), the molfile path of
// POST /api/species/resolve, and the migration that adds the structure columns.
// The Boc-protected aminoalcohol below (tert-butyl N-(1-hydroxy-2-methylpropan-2-yl)carbamate) is in neither the
// library nor the identifier table (checked in the first test), so only the estimator knows it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { POST as resolvePost } from '@/app/api/species/resolve/route';
import { POST as createFromStructure } from '@/app/api/species/team/route';
import { DELETE as deleteSpecies, GET as getSpecies, PUT as putSpecies } from '@/app/api/species/team/[teamSpeciesId]/route';
import { POST as evaluateSavedRoute } from '@/app/api/routes/[routeId]/evaluate/route';
import { getDb } from '@/db';
import { MIGRATIONS } from '@/db/migrations';
import * as structureMigration from '@/db/migrations/20261206-0011-team-species-structure';
import { createRoute } from '@/lib/services/routes/create-route';
import { saveRoute } from '@/lib/services/routes/save-route';
import { makeFit } from './support/fit-fixtures';
import { GET as exportTeamRoute } from '@/app/api/teams/[teamId]/export/route';
import { POST as importTeamRoute } from '@/app/api/teams/[teamId]/import/route';
import { makeRoleSet, makeTeamWithLead } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let w: Awaited<ReturnType<typeof makeRoleSet>>;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

const BOC_AMP = 'CC(C)(C)OC(=O)NC(C)(C)CO';
const BOC_AMP_KEY = 'SBWYTQQSTIUXOP-UHFFFAOYSA-N';
const AMP_STEP = '2-amino-2-methyl-1-propanol(l) + di-tert-butyl dicarbonate(l) -> tert-butyl 1-hydroxy-2-methylpropan-2-ylcarbamate(l) + tert-butanol(l) + CO2(g)';

interface Made { id: number; key: string; version: number; smiles: string | null; inchikey: string | null; provenance: { kind: string; method?: string; reference?: string; fitId?: number | null }; sigmaDfG_kJ: number | null; dfG_kJ: number; notes: string }

const create = (body: unknown, userId = w.designerId) => callRoute(createFromStructure, { method: 'POST', userId, body });
const remove = (id: number, version: number, userId = w.designerId) =>
  callRoute(deleteSpecies, { method: 'DELETE', userId, params: { teamSpeciesId: String(id) }, path: `/api/species/team/${id}?version=${version}` });

async function routeUsing(name: string, steps: { id: string; equation: string; species?: Record<string, unknown> }[]) {
  const route = await createRoute({ teamId: w.teamId, userId: w.leadId, input: { name, target: 'CO2(g)', targetAmount: '1 mol' } });
  const saved = await saveRoute({
    teamId: w.teamId, userId: w.leadId, routeId: route.id,
    input: {
      version: route.version, name, target: 'CO2(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, links: [],
      steps: steps.map((s, i) => ({ ...s, temperature: '298.15 K', yieldPct: 100, notes: '', position: { x: 300 * i, y: 0 } })),
    } as Parameters<typeof saveRoute>[0]['input'],
  });
  return saved.route;
}

describe('POST /api/species/team from a structure', () => {
  let made: Made;

  it('the intermediate is new: the resolver can only estimate it, and reads it from a molfile as from its SMILES', async () => {
    const bySmiles = await callRoute(resolvePost, { method: 'POST', userId: w.reviewerId, body: { smiles: BOC_AMP, phase: 'l' } });
    expect(bySmiles.status, JSON.stringify(bySmiles.body)).toBe(200);
    const answer = bySmiles.body as { origin: string; inchikey: string; name: string; groups: unknown[]; teamSpecies: unknown };
    expect(answer).toMatchObject({ origin: 'estimated', inchikey: BOC_AMP_KEY, teamSpecies: null });
    // Not in the identifier table either: the name it gets is the SMILES itself.
    expect(answer.name).toBe('CC(C)(CO)NC(=O)OC(C)(C)C');
    expect(answer.groups.length).toBeGreaterThan(3);

    const { loadChem } = await import('@/lib/thermo/structure/chem');
    const chem = await loadChem();
    const molfile = chem.withMol(BOC_AMP, (mol) => chem.rdkit.get_mol(mol.add_hs())!.get_molblock());
    const byMolfile = await callRoute(resolvePost, { method: 'POST', userId: w.reviewerId, body: { molfile, phase: 'l' } });
    expect(byMolfile.status, JSON.stringify(byMolfile.body)).toBe(200);
    expect(byMolfile.body).toMatchObject({ inchikey: BOC_AMP_KEY, smiles: 'CC(C)(CO)NC(=O)OC(C)(C)C' });

    const junk = await callRoute(resolvePost, { method: 'POST', userId: w.reviewerId, body: { molfile: 'not a molfile', phase: 'l' } });
    expect(junk.status).toBe(400);
    expect(errorOf(junk.body)).toMatchObject({ code: 'INVALID_STRUCTURE', fields: { molfile: expect.stringMatching(/M {2}END/) } });
  });

  it('saves the estimate with provenance "estimated": method and σ recorded, InChIKey and canonical SMILES stored', async () => {
    const res = await create({ smiles: BOC_AMP, phase: 'l', name: 'tert-butyl 1-hydroxy-2-methylpropan-2-ylcarbamate', source: { kind: 'estimate' } });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    made = res.body as Made;
    expect(made).toMatchObject({ key: `{${BOC_AMP_KEY}}(l)`, inchikey: BOC_AMP_KEY, smiles: 'CC(C)(CO)NC(=O)OC(C)(C)C', provenance: { kind: 'estimated' } });
    expect(made.provenance.method).toMatch(/group additivity/i);
    expect(made.sigmaDfG_kJ).toBeGreaterThan(0);
    expect(made.notes).toMatch(/Groups matched: .*Benson/);
    const row = await getDb().models.TeamSpecies.findByPk(made.id);
    expect(row).toMatchObject({ inchikey: BOC_AMP_KEY, provenanceKind: 'estimated' });
    // The resolver now answers the team's species for this structure, still marked as an estimate.
    const again = await callRoute(resolvePost, { method: 'POST', userId: w.reviewerId, body: { smiles: 'OCC(C)(C)NC(=O)OC(C)(C)C', phase: 'l' } });
    expect(again.body).toMatchObject({ origin: 'estimated', key: made.key, teamSpecies: { id: made.id, name: 'tert-butyl 1-hydroxy-2-methylpropan-2-ylcarbamate' } });
  });

  it('refuses the same InChIKey and phase twice in a team (409, pointing at the one it has), written any way', async () => {
    const res = await create({ smiles: 'OCC(C)(C)NC(=O)OC(C)(C)C', phase: 'l', name: 'Boc-AMP again', source: { kind: 'estimate' } });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ error: { code: 'CONFLICT', details: { teamSpeciesId: made.id }, fields: { smiles: expect.stringContaining('tert-butyl 1-hydroxy-2-methylpropan-2-ylcarbamate') } } });
    // Another phase is another species; another team may have its own.
    expect((await create({ smiles: BOC_AMP, phase: 'g', name: 'Boc-aminomethylpropanol vapour', source: { kind: 'estimate' } })).status).toBe(201);
    expect((await create({ smiles: BOC_AMP, phase: 'l', name: 'Their Boc-AMP', source: { kind: 'estimate' } }, w.foreignId)).status).toBe(201);
  });

  it('points at the library instead of copying a structure it has with sourced data (ethyl acetate, liquid)', async () => {
    const res = await create({ smiles: 'CCOC(C)=O', phase: 'l', name: 'our ethyl acetate', source: { kind: 'estimate' } });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ error: { code: 'CONFLICT', details: { library: { name: 'ethyl acetate', source: expect.stringMatching(/WebBook/) } } } });
    // Even asked to, an estimate never replaces sourced data.
    expect((await create({ smiles: 'CCOC(C)=O', phase: 'l', name: 'our ethyl acetate', source: { kind: 'estimate' }, overrideLibrary: true })).status).toBe(409);
  });

  it('takes measured values over the estimate, with the reference as provenance', async () => {
    // Invented values for an invented measurement (Kestrel Ridge notebook), not a thermodynamic claim.
    const values = { dfH: -700, dfG: null, S: 300, sigmaDfH: 1.5 };
    const res = await create({
      smiles: 'CC(C)(C)OC(=O)NCC(C)(C)O', phase: 's', name: 'Boc-amino-tert-alcohol',
      source: { kind: 'entered', values, provenance: { kind: 'measured', reference: 'Kestrel Ridge calorimetry, notebook KR-31 p. 4' } },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ dfH_kJ: -700, S_J_per_K: 300, sigmaDfH_kJ: 1.5, dfGDerived: true, provenance: { kind: 'measured', reference: 'Kestrel Ridge calorimetry, notebook KR-31 p. 4' } });
    const missing = await create({
      smiles: 'CC(C)(C)OC(=O)NCCC(C)(C)O', phase: 's', name: 'no source', source: { kind: 'entered', values, provenance: { kind: 'citation', citation: '' } },
    });
    expect(missing.status).toBe(400);
  });

  it('refuses a saved fit of another team as if it did not exist (404), and solves from one of its own', async () => {
    const theirs = await makeFit(w.foreignTeamId, w.foreignId);
    const res = await create({ smiles: 'O=[N+]([O-])[N+](=O)[O-]', phase: 'g', name: 'dinitrogen tetroxide (fitted)', overrideLibrary: true, source: { kind: 'fit', fitId: theirs.id, species: 'N2O4(g)' } });
    expect(res.status).toBe(404);
    const ours = await makeFit(w.teamId, w.leadId);
    const wrong = await create({ smiles: 'O=[N+]([O-])[N+](=O)[O-]', phase: 'g', name: 'NO2 by mistake', overrideLibrary: true, source: { kind: 'fit', fitId: ours.id, species: 'NO2(g)' } });
    expect(wrong.status).toBe(400);
    expect(errorOf(wrong.body).fields?.['source.species']).toMatch(/N2O4|NO2/);
    const good = await create({ smiles: 'O=[N+]([O-])[N+](=O)[O-]', phase: 'g', name: 'dinitrogen tetroxide (fitted)', overrideLibrary: true, source: { kind: 'fit', fitId: ours.id, species: 'N2O4(g)' } });
    expect(good.status, JSON.stringify(good.body)).toBe(201);
    expect(good.body).toMatchObject({ provenance: { kind: 'measured', fitId: ours.id } });
  });

  it('answers bad structures in the error shape: unreadable SMILES with its position, a radical, nothing given', async () => {
    const bad = await create({ smiles: 'CC(C', phase: 'l', name: 'broken', source: { kind: 'estimate' } });
    expect(bad.status).toBe(400);
    expect(errorOf(bad.body)).toMatchObject({ code: 'INVALID_STRUCTURE', fields: { smiles: expect.stringMatching(/position|ring|SMILES/) } });
    const radical = await create({ smiles: 'C[CH2]', phase: 'g', name: 'ethyl radical', source: { kind: 'estimate' } });
    expect(radical.status).toBe(400);
    expect(errorOf(radical.body).code).toBe('UNSUPPORTED_STRUCTURE');
    expect((await create({ phase: 'g', name: 'nothing', source: { kind: 'estimate' } })).status).toBe(400);
    expect((await create({ smiles: BOC_AMP, phase: 'l', name: 'reviewer', source: { kind: 'estimate' } }, w.reviewerId)).status).toBe(403);
  });

  it('is used by name in a step, where the board still sees an estimate', async () => {
    const route = await routeUsing('Boc protection of AMP (named)', [{ id: 'p1', equation: AMP_STEP }]);
    const res = await callRoute(evaluateSavedRoute, { method: 'POST', userId: w.reviewerId, params: { routeId: String(route.id) } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const step = (res.body as { evaluation: { steps: { result: { species: { key: string; origin: string; method?: string }[] } | null; error: unknown }[] } }).evaluation.steps[0]!;
    expect(step.error, JSON.stringify(step.error)).toBeNull();
    expect(step.result!.species.find((s) => s.key === made.key)).toMatchObject({ origin: 'estimated', method: expect.stringMatching(/group additivity/i) });
  });
});

describe('editing and deleting a team species known by structure', () => {
  it('edits the structure: a SMILES of another formula is refused on the formula field, removing it keeps the values', async () => {
    const made = (await create({ smiles: 'CC(C)(C)OC(=O)NC1CCC(O)CC1', phase: 'l', name: 'Boc-aminocyclohexanol', source: { kind: 'estimate' } })).body as Made;
    const current = (await callRoute(getSpecies, { userId: w.reviewerId, params: { teamSpeciesId: String(made.id) } })).body as Made & { formula: string; S_J_per_K: number; dfH_kJ: number };
    const species = { formula: 'C11H21NO3', phase: 'l', name: 'Boc-aminocyclohexanol', dfH: current.dfH_kJ, dfG: null, S: current.S_J_per_K, provenance: current.provenance };
    const wrong = await callRoute(putSpecies, { method: 'PUT', userId: w.designerId, params: { teamSpeciesId: String(made.id) }, body: { version: made.version, species, smiles: 'CCO' } });
    expect(wrong.status).toBe(400);
    expect(errorOf(wrong.body).fields?.formula).toMatch(/C2H6O/);
    const plain = await callRoute(putSpecies, { method: 'PUT', userId: w.designerId, params: { teamSpeciesId: String(made.id) }, body: { version: made.version, species, smiles: null } });
    expect(plain.status, JSON.stringify(plain.body)).toBe(200);
    expect((plain.body as { species: Made }).species).toMatchObject({ key: 'C11H21NO3(l)', smiles: null, inchikey: null });
  });

  it('deletes a species no route uses (200), checking the version first (409 when stale)', async () => {
    const made = (await create({ smiles: 'CC(C)(C)OC(=O)NCCCCO', phase: 'g', name: 'Boc-aminobutanol vapour', source: { kind: 'estimate' } })).body as Made;
    expect((await remove(made.id, made.version + 1)).status).toBe(409);
    expect((await remove(made.id, made.version, w.reviewerId)).status).toBe(403);
    expect((await remove(made.id, made.version, w.foreignId)).status).toBe(404);
    const ok = await remove(made.id, made.version);
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(await getDb().models.TeamSpecies.findByPk(made.id)).toBeNull();
    expect((await remove(made.id, made.version)).status).toBe(404);
  });

  it('refuses to delete a used species (409) and names the routes and steps, by name or through a SMILES label', async () => {
    const made = (await create({ smiles: 'CC(C)(C)OC(=O)NCC(C)(C)CO', phase: 'l', name: 'tert-butyl 3-hydroxy-2,2-dimethylpropylcarbamate', source: { kind: 'estimate' } })).body as Made;
    await routeUsing('Kestrel Ridge neopentyl series', [
      { id: 'a1', equation: 'CO2(g) + H2(g) -> CO(g) + H2O(g)' },
      { id: 'a2', equation: 'tert-butyl 3-hydroxy-2,2-dimethylpropylcarbamate(l) + H2O(l) -> CO2(g) + tert-butanol(l) + 3-amino-2,2-dimethylpropan-1-ol(l)' },
    ]);
    await routeUsing('Kestrel Ridge labelled route', [
      { id: 'b1', equation: 'BocX + H2O(l) -> CO2(g) + tert-butanol(l) + 3-amino-2,2-dimethylpropan-1-ol(l)', species: { BocX: { smiles: 'OCC(C)(C)CNC(=O)OC(C)(C)C', phase: 'l' } } },
    ]);
    const res = await remove(made.id, made.version);
    expect(res.status).toBe(409);
    const error = (res.body as { error: { message: string; details: { routes: { routeName: string; href: string; steps: { number: number }[] }[] } } }).error;
    expect(error.message).toContain('Kestrel Ridge neopentyl series');
    expect(error.message).not.toMatch(/#\d|id \d/);
    expect(error.details.routes.map((r) => [r.routeName, r.steps.map((s) => s.number)])).toEqual(
      expect.arrayContaining([['Kestrel Ridge neopentyl series', [2]], ['Kestrel Ridge labelled route', [1]]]),
    );
    expect(await getDb().models.TeamSpecies.findByPk(made.id)).not.toBeNull();
  });
});

describe('team export and import', () => {
  it('carry the structure columns, and refuse a file whose InChIKey is not one', async () => {
    const source = await makeTeamWithLead('structure-export');
    expect((await create({ smiles: BOC_AMP, phase: 'l', name: 'exported Boc-AMP', source: { kind: 'estimate' } }, source.leadId)).status).toBe(201);
    const exported = await callRoute(exportTeamRoute, { userId: source.leadId, params: { teamId: String(source.teamId) } });
    expect(exported.status).toBe(200);
    const target = await makeTeamWithLead('structure-import');
    const imported = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body: exported.body });
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    expect(await getDb().models.TeamSpecies.findOne({ where: { teamId: target.teamId } })).toMatchObject({ inchikey: BOC_AMP_KEY, smiles: 'CC(C)(CO)NC(=O)OC(C)(C)C', key: `{${BOC_AMP_KEY}}(l)` });

    const broken = JSON.parse(JSON.stringify(exported.body).replaceAll(BOC_AMP_KEY, 'NOT-AN-INCHIKEY')) as unknown;
    const other = await makeTeamWithLead('structure-import-bad');
    const refused = await callRoute(importTeamRoute, { method: 'POST', userId: other.leadId, params: { teamId: String(other.teamId) }, body: broken });
    expect(refused.status).toBe(400);
    expect(JSON.stringify(refused.body)).toMatch(/InChIKey/);
  });
});

describe('migration 20261206-0011-team-species-structure', () => {
  it('is listed once and goes down and up again, taking the columns and the index with it', async () => {
    expect(MIGRATIONS.filter((m) => m.name === '20261206-0011-team-species-structure')).toHaveLength(1);
    const qi = getDb().sequelize.getQueryInterface();
    const columns = async () => Object.keys(await qi.describeTable('team_species'));
    expect(await columns()).toEqual(expect.arrayContaining(['smiles', 'inchikey']));
    await structureMigration.down({ context: qi });
    expect(await columns()).not.toContain('inchikey');
    expect(await columns()).not.toContain('smiles');
    await structureMigration.up({ context: qi });
    expect(await columns()).toEqual(expect.arrayContaining(['smiles', 'inchikey']));
    const indexes = (await qi.showIndex('team_species')) as { name: string }[];
    expect(indexes.map((i) => i.name)).toContain('team_species_team_inchikey');
    // Rows written before the migration read back with no structure.
    const [row] = await getDb().sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM team_species WHERE inchikey IS NULL', { type: QueryTypes.SELECT });
    expect(Number(row?.n)).toBeGreaterThan(0);
  });
});
