// GET /api/species/search: the step editor's typeahead over the identifier table, the library and the team's species.
// Identities checked against PubChem (from memory): ethanol CAS 64-17-5; ethyl acetate InChIKey
// XEKOWRVHYACXOJ-UHFFFAOYSA-N, SMILES CCOC(C)=O; propan-2-ol ("isopropyl alcohol") InChIKey KFZMGEQAYNKOFK-UHFFFAOYSA-N;
// 1-phenylethanol is C8H10O; acetophenone C8H8O; toluene C7H8. Library sources are the organic library's
// (lib/thermo/data/source/organics/species.csv).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as search } from '@/app/api/species/search/route';
import { getDb } from '@/db';
import { loadChem } from '@/lib/thermo/structure/chem';
import { createTeamSpecies } from '@/lib/services/species/create-team-species';
import type { SpeciesSearchHit } from '@/lib/thermo/structure/species-search';
import { makeTeamWithLead } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { speciesInput } from './support/species-fixtures';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let userId = 0;
let otherUserId = 0;
let amideInchikey = '';
const AMIDE_SMILES = 'CC(=O)NCc1ccc(N)cc1';
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  const team = await makeTeamWithLead('search');
  userId = team.leadId;
  otherUserId = (await makeTeamWithLead('search-other')).leadId;
  await createTeamSpecies({ teamId: team.teamId, userId, input: speciesInput({ name: 'Kestrel amide KR-117', aliases: ['kr117 amide'] }) });
  // A team species known by structure (invented intermediate; identity computed by RDKit).
  const drawn = await createTeamSpecies({ teamId: team.teamId, userId, input: speciesInput({ name: 'Kestrel aminobenzyl acetamide', phase: 's' }) });
  const parsed = (await loadChem()).parse(AMIDE_SMILES);
  await getDb().models.TeamSpecies.update({ smiles: parsed.smiles, inchikey: parsed.inchikey }, { where: { id: drawn.id } });
  amideInchikey = parsed.inchikey;
}, 60_000);
afterAll(async () => teardownTestDb(dir));

const get = (query: Record<string, string>, who = userId) => callRoute(search, { userId: who, path: `/api/species/search?${new URLSearchParams(query).toString()}` });

async function items(q: string, limit?: number): Promise<SpeciesSearchHit[]> {
  const res = await get(limit ? { q, limit: String(limit) } : { q });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  const body = res.body as { query: string; items: SpeciesSearchHit[] };
  expect(body.query).toBe(q.trim());
  return body.items;
}

describe('GET /api/species/search', () => {
  it('finds ethyl acetate by its name first, with its structure, formula and the phases the library has data for', async () => {
    const [first] = await items('ethyl acetate');
    expect(first).toMatchObject({ name: 'ethyl acetate', formula: 'C4H8O2', smiles: 'CCOC(C)=O', inchikey: 'XEKOWRVHYACXOJ-UHFFFAOYSA-N', origin: 'library', match: 'name' });
    const liquid = first!.phases.find((p) => p.phase === 'l');
    expect(liquid?.key).toBeTruthy();
    expect(liquid?.source).toMatch(/WebBook|ATcT|JANAF|CRC|NASA/);
  }, 60_000);

  it('ranks the exact name above the longer names that contain it', async () => {
    const list = await items('ethanol', 10);
    expect(list[0]).toMatchObject({ name: 'ethanol', formula: 'C2H6O', match: 'name' });
    expect(list.length).toBeGreaterThan(1);
    expect(list.slice(1).every((h) => h.match !== 'name')).toBe(true);
  });

  it('finds a compound by a synonym', async () => {
    const [first] = await items('isopropyl alcohol');
    expect(first).toMatchObject({ inchikey: 'KFZMGEQAYNKOFK-UHFFFAOYSA-N', formula: 'C3H8O' });
    expect(['name', 'synonym']).toContain(first!.match);
  });

  it('finds a compound by its CAS number', async () => {
    const list = await items('64-17-5');
    expect(list).toHaveLength(1);
    expect(list[0]).toMatchObject({ name: 'ethanol', cas: '64-17-5', match: 'cas' });
  });

  it('finds every compound of a formula, those with sourced data first', async () => {
    const list = await items('C8H10O', 50);
    expect(list.length).toBeGreaterThan(5);
    expect(list.every((h) => h.formula === 'C8H10O' && h.match === 'formula')).toBe(true);
    expect(list.map((h) => h.name)).toContain('1-phenylethanol');
    const firstEstimated = list.findIndex((h) => h.origin === 'estimated');
    const lastLibrary = list.map((h) => h.origin).lastIndexOf('library');
    if (firstEstimated >= 0 && lastLibrary >= 0) expect(lastLibrary).toBeLessThan(firstEstimated);
  });

  it('completes a name being typed, and forgives a typing slip', async () => {
    const [completed] = await items('acetophenon');
    expect(completed).toMatchObject({ name: 'acetophenone', formula: 'C8H8O' });
    const slipped = await items('tolune');
    expect(slipped.map((h) => h.name)).toContain('toluene');
    expect(slipped.find((h) => h.name === 'toluene')!.match).toBe('fuzzy');
  });

  it('marks a compound the library lacks as one a step would estimate', async () => {
    const [first] = await items('NADPH');
    expect(first).toMatchObject({ name: 'NADPH', origin: 'estimated', phases: [] });
    expect(first!.smiles).toBeTruthy();
  });

  it("includes the caller team's own species, and only the caller's", async () => {
    const [first] = await items('Kestrel amide');
    expect(first).toMatchObject({ name: 'Kestrel amide KR-117', origin: 'team' });
    expect(first!.phases[0]).toMatchObject({ phase: 'g' });
    expect(first!.phases[0]!.source).toMatch(/Kestrel Ridge worksheet/);
    const byAlias = await items('kr117 amide');
    expect(byAlias[0]).toMatchObject({ name: 'Kestrel amide KR-117', match: 'synonym' });
    const foreign = await get({ q: 'Kestrel amide' }, otherUserId);
    expect(foreign.status).toBe(200);
    expect((foreign.body as { items: SpeciesSearchHit[] }).items.some((h) => h.origin === 'team')).toBe(false);
  });

  it("draws a team species known by structure: its SMILES and InChIKey come with the hit, and the InChIKey finds it", async () => {
    const [first] = await items('Kestrel aminobenzyl');
    expect(first).toMatchObject({ name: 'Kestrel aminobenzyl acetamide', origin: 'team', inchikey: amideInchikey });
    expect(first!.smiles).toBeTruthy();
    const byKey = await items(amideInchikey);
    expect(byKey[0]).toMatchObject({ origin: 'team', match: 'inchikey' });
  });

  it('keeps to the limit', async () => {
    expect(await items('acid', 3)).toHaveLength(3);
  });

  it('answers 400 in the error shape for an empty, blank, missing or too long query and a bad limit', async () => {
    for (const query of [{ q: '' }, { q: '   ' }, {}, { q: 'x'.repeat(101) }, { q: 'water', limit: '0' }, { q: 'water', limit: '51' }, { q: 'water', limit: 'ten' }, { q: 'water', extra: '1' }]) {
      const res = await get(query as Record<string, string>);
      expect(res.status, JSON.stringify(query)).toBe(400);
      expect(errorOf(res.body).code).toBe('VALIDATION');
    }
  });

  it('answers 401 to a caller who is not signed in', async () => {
    const res = await callRoute(search, { userId: null, path: '/api/species/search?q=water' });
    expect(res.status).toBe(401);
  });
});
