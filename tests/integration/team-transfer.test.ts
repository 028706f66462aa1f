import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { POST as evaluateRoute } from '@/app/api/routes/[routeId]/evaluate/route';
import { GET as exportTeamRoute } from '@/app/api/teams/[teamId]/export/route';
import { POST as importTeamRoute } from '@/app/api/teams/[teamId]/import/route';
import { GET as importFileRoute } from '@/app/api/species/imports/[importId]/file/route';
import { uploadSpeciesImport } from '@/lib/services/species/upload-species-import';
import { createComment } from '@/lib/services/comments/create-comment';
import { recordDecision } from '@/lib/services/decisions/record-decision';
import { listDrivers } from '@/lib/services/drivers/list-drivers';
import { createFlag } from '@/lib/services/flags/create-flag';
import { createTeamSpecies } from '@/lib/services/species/create-team-species';
import { transitionRoute } from '@/lib/services/workflow/transition-route';
import { makeRoute, makeTeamWithLead } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { makeReviewTeam, startMailbox, type ReviewTeam } from './support/review-team';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let smtp: { close: () => Promise<void> };
let team: ReviewTeam;
let file: { tables: Record<string, Record<string, unknown>[]>; people: { email: string }[]; format: string };

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  smtp = await startMailbox();
  team = await makeReviewTeam();
  // A team species changes the evaluation, so equal evaluations after import show it came along.
  await createTeamSpecies({
    teamId: team.teamId,
    userId: team.designerId,
    input: {
      formula: 'CH3OH', phase: 'g', name: 'Methanol (team value)', dfH: -205, S: 240,
      provenance: { kind: 'estimated', method: 'Round-trip test value, not a recommended one' },
    },
  });
  const a = await makeRoute(team.teamId, team.designerId);
  const b = await makeRoute(team.teamId, team.designerId);
  await listDrivers({ teamId: team.teamId });
  const asked = await createComment({ teamId: team.teamId, routeId: a.id, userId: team.reviewerId, input: { body: 'Is 1100 K needed, @baptiste.osei?', stepKey: 's1' } });
  await createComment({ teamId: team.teamId, routeId: a.id, userId: team.designerId, input: { body: 'It keeps methane slip low.', parentId: asked.id } });
  await createFlag({ teamId: team.teamId, routeId: a.id, userId: team.reviewerId, input: { stepKey: 's1', category: 'safety', reason: 'Hot hydrogen at 1100 K.' } });
  await transitionRoute({ teamId: team.teamId, userId: team.designerId, role: 'designer', routeId: b.id, input: { to: 'in_review', note: '', reviewerIds: [team.reviewerId], version: b.version } });
  await recordDecision({ teamId: team.teamId, userId: team.leadId, role: 'lead', input: { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'Fewer uphill steps.', shelveOthers: false } });

  const res = await callRoute(exportTeamRoute, { userId: team.leadId, params: { teamId: String(team.teamId) } });
  expect(res.status).toBe(200);
  expect(res.headers.get('content-disposition')).toMatch(/attachment; filename="stepwell-team-\d+-\d{4}-\d{2}-\d{2}\.json"/);
  file = res.body as typeof file;
});
afterAll(async () => {
  await smtp.close();
  await teardownTestDb(dir);
});

async function evaluations(teamId: number, userId: number) {
  const routes = await getDb().models.Route.findAll({ where: { teamId }, order: [['id', 'ASC']] });
  const out = [];
  for (const route of routes) {
    const res = await callRoute(evaluateRoute, { method: 'POST', userId, params: { routeId: String(route.id) } });
    expect(res.status).toBe(200);
    out.push({ name: route.name, status: route.status, evaluation: res.body });
  }
  // Species provenance names the team species row, whose id differs between the teams.
  return JSON.parse(JSON.stringify(out).replace(/team species #\d+/g, 'team species #n')) as unknown;
}

async function teamCounts(teamId: number) {
  const { Route, RouteRevision, Comment, StepFlag, Decision, RouteTransition, TeamSpecies } = getDb().models;
  return {
    routes: await Route.count({ where: { teamId } }),
    revisions: await RouteRevision.count({ where: { teamId } }),
    comments: await Comment.count({ where: { teamId } }),
    flags: await StepFlag.count({ where: { teamId } }),
    decisions: await Decision.count({ where: { teamId } }),
    transitions: await RouteTransition.count({ where: { teamId } }),
    species: await TeamSpecies.count({ where: { teamId } }),
  };
}

describe('team export and import', () => {
  it('exports every team table with the people it names', () => {
    expect(file.format).toBe('stepwell.team/1');
    for (const table of ['routes', 'steps', 'step_links', 'route_revisions', 'route_transitions', 'route_reviewers', 'comments', 'step_flags', 'decisions', 'driver_reactions', 'team_species']) {
      expect(file.tables[table]?.length, table).toBeGreaterThan(0);
    }
    expect(file.people.map((p) => p.email).sort()).toEqual([team.email.designer, team.email.lead, team.email.reviewer].sort());
    expect(JSON.stringify(file)).not.toMatch(/password_hash|session_epoch/);
  });

  it('imports into an empty team: same routes, evaluations, review and decisions', async () => {
    const target = await makeTeamWithLead('restored');
    // The same people are members here, so their routes, comments and mentions stay theirs.
    for (const userId of [team.designerId, team.reviewerId]) await getDb().models.Membership.create({ teamId: target.teamId, userId, role: 'designer' });
    await listDrivers({ teamId: target.teamId }); // a new team's default drivers do not make it "not empty"
    const res = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body: file });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ counts: { routes: 2 } });

    expect(await teamCounts(target.teamId)).toEqual(await teamCounts(team.teamId));
    const evaluated = await evaluations(target.teamId, target.leadId);
    expect(JSON.stringify(evaluated)).toContain('team species #n');
    expect(evaluated).toEqual(await evaluations(team.teamId, team.leadId));

    const { Route, Decision, Comment, DriverReaction } = getDb().models;
    const newRoutes = (await Route.findAll({ where: { teamId: target.teamId }, order: [['id', 'ASC']] })).map((r) => r.id);
    const decision = await Decision.findOne({ where: { teamId: target.teamId } });
    expect(decision!.routeIds).toEqual(newRoutes);
    expect(decision!.chosenRouteId).toBe(newRoutes[0]);
    const reply = await Comment.findOne({ where: { teamId: target.teamId, body: 'It keeps methane slip low.' } });
    const root = await Comment.findByPk(reply!.parentId!);
    expect(root!.body).toContain('Is 1100 K needed');
    expect(root!.mentions).toEqual([{ userId: team.designerId, handle: 'baptiste.osei' }]);
    expect(await DriverReaction.count({ where: { teamId: target.teamId } })).toBe(await DriverReaction.count({ where: { teamId: team.teamId } }));
    // The source team is untouched.
    expect((await Route.findAll({ where: { teamId: team.teamId } })).every((r) => !newRoutes.includes(r.id))).toBe(true);
  });

  it('refuses a team that already has routes with 409, and changes nothing', async () => {
    const busy = await makeTeamWithLead('busy');
    await makeRoute(busy.teamId, busy.leadId);
    const before = await teamCounts(busy.teamId);
    const res = await callRoute(importTeamRoute, { method: 'POST', userId: busy.leadId, params: { teamId: String(busy.teamId) }, body: file });
    expect(res.status).toBe(409);
    expect(errorOf(res.body).code).toBe('CONFLICT');
    expect(await teamCounts(busy.teamId)).toEqual(before);
  });

  it('answers malformed files with 400 and creates nothing', async () => {
    const target = await makeTeamWithLead('malformed');
    const empty = await teamCounts(target.teamId);
    const clone = () => JSON.parse(JSON.stringify(file)) as typeof file;
    const brokenStep = clone();
    brokenStep.tables.steps![0]!.route_id = 987654;
    const unknownColumn = clone();
    unknownColumn.tables.routes![0]!.secret_column = 1;
    const unknownTable = clone();
    unknownTable.tables.users = [{ id: 1 }];
    const missingName = clone();
    delete missingName.tables.routes![1]!.name;
    const cases: Array<[string, unknown]> = [
      ['wrong format', { ...clone(), format: 'something-else/1' }],
      ['not an object', [1, 2, 3]],
      ['step of a route not in the file', brokenStep],
      ['unknown column', unknownColumn],
      ['unknown table', unknownTable],
      ['required column missing', missingName],
    ];
    for (const [label, body] of cases) {
      const res = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body });
      expect(res.status, label).toBe(400);
      expect(errorOf(res.body), label).toMatchObject({ code: 'VALIDATION', message: expect.any(String) });
      expect(await teamCounts(target.teamId), label).toEqual(empty);
    }
    const raw = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, rawBody: '{"format":', headers: { 'content-type': 'application/json' } });
    expect(raw.status).toBe(400);
  });

  it('loads a file written by the other database: booleans as 0/1 or true/false, SQLite date text', async () => {
    // SQLite exports BOOLEAN columns as 0/1 and dates as its own text; PostgreSQL exports true/false and ISO strings.
    for (const [label, derived, createdAt] of [
      ['as SQLite writes it', 1, '2026-11-30 09:15:00.000 +00:00'],
      ['as PostgreSQL writes it', true, '2026-11-30T09:15:00.000Z'],
    ] as const) {
      const target = await makeTeamWithLead('other-database');
      const moved = JSON.parse(JSON.stringify(file)) as typeof file;
      for (const row of moved.tables.team_species!) Object.assign(row, { dfg_derived: derived, created_at: createdAt });
      const res = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body: moved });
      expect(res.status, `${label}: ${JSON.stringify(res.body)}`).toBe(201);
      const species = await getDb().models.TeamSpecies.findOne({ where: { teamId: target.teamId } });
      expect(species!.dfgDerived, label).toBe(true);
      expect(species!.createdAt.toISOString(), label).toBe('2026-11-30T09:15:00.000Z');
    }
    const target = await makeTeamWithLead('not-a-boolean');
    const bad = JSON.parse(JSON.stringify(file)) as typeof file;
    bad.tables.team_species![0]!.dfg_derived = 'yes';
    const res = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body: bad });
    expect(res.status).toBe(400);
    expect(errorOf(res.body).fields).toEqual({ 'tables.team_species[0].dfg_derived': 'Expected true or false.' });
    bad.tables.team_species![0]!.dfg_derived = 0;
    bad.tables.team_species![0]!.created_at = 'last Tuesday';
    const undated = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body: bad });
    expect(undated.status).toBe(400);
    expect(errorOf(undated.body).fields).toEqual({ 'tables.team_species[0].created_at': 'Expected a date and time.' });
  });

  it('refuses a species-import file key that could name a file outside the import folder', async () => {
    const importRow = (key: string) => ({
      id: 1, team_id: team.teamId, file_name: 'species.csv', checksum: 'a'.repeat(64), byte_size: 10, row_count: 1, storage_key: key,
      status: 'committed', imported_by_id: null, created_count: 1, overridden_count: 0, skipped_count: 0, committed_at: null, created_at: '2026-11-30T09:15:00.000Z',
    });
    for (const key of ['../stepwell.sqlite', '/etc/passwd', 'team-1/../../x.csv', 'team-1/notes.csv']) {
      const target = await makeTeamWithLead('bad-key');
      const body = { ...file, tables: { ...file.tables, species_imports: [importRow(key)] } };
      const res = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body });
      expect(res.status, key).toBe(400);
      expect(errorOf(res.body).fields, key).toEqual({ 'tables.species_imports[0].storage_key': 'A stored file key is team-<n>/<uuid>.csv.' });
      expect(await getDb().models.SpeciesImport.count({ where: { teamId: target.teamId } }), key).toBe(0);
    }
    const target = await makeTeamWithLead('good-key');
    const body = { ...file, tables: { ...file.tables, species_imports: [importRow('team-7/0f8e2c1a-5b4d-4c3e-9a2b-1d0e9f8a7b6c.csv')] } };
    const res = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
  });

  it('credits only members of the importing team and never says which addresses have accounts', async () => {
    // The designer has an account, but not in this team: their rows become "former member" (or the lead where required).
    const target = await makeTeamWithLead('strangers');
    const res = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body: file });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(JSON.stringify(res.body)).not.toMatch(/@/);
    expect(res.body).not.toHaveProperty('unmatchedPeople');
    expect(res.body).toMatchObject({ membersCredited: 0, formerMembers: file.people.length });
    const { Route, Comment, StepFlag } = getDb().models;
    const routes = await Route.findAll({ where: { teamId: target.teamId } });
    expect(routes.every((r) => r.createdById === target.leadId)).toBe(true);
    const comments = await Comment.findAll({ where: { teamId: target.teamId } });
    expect(comments.length).toBeGreaterThan(0);
    expect(comments.every((c) => c.authorId === null)).toBe(true);
    expect(comments.every((c) => (c.mentions as unknown[]).length === 0)).toBe(true);
    expect((await StepFlag.findAll({ where: { teamId: target.teamId } })).every((f) => f.createdById === null)).toBe(true);
  });

  it('refuses, naming row and column, every cell that would break the team later', async () => {
    const clone = () => JSON.parse(JSON.stringify(file)) as typeof file;
    type Edit = (f: typeof file) => void;
    const cases: Array<[string, Edit, string, RegExp]> = [
      ['step conditions not JSON', (f) => { f.tables.steps![0]!.conditions = '{"temperature": '; }, 'tables.steps[0].conditions', /JSON/],
      ['step conditions of the wrong shape', (f) => { f.tables.steps![0]!.conditions = '{"temperature": 5}'; }, 'tables.steps[0].conditions', /temperature/],
      ['species aliases not JSON', (f) => { f.tables.team_species![0]!.aliases = 'methanol, wood spirit'; }, 'tables.team_species[0].aliases', /JSON/],
      ['species aliases not a list', (f) => { f.tables.team_species![0]!.aliases = '{"a": 1}'; }, 'tables.team_species[0].aliases', /./],
      ['unknown route status', (f) => { f.tables.routes![0]!.status = 'launched'; }, 'tables.routes[0].status', /route status/],
      ['negative version', (f) => { f.tables.routes![1]!.version = -3; }, 'tables.routes[1].version', /at least 1/],
      ['zero species version', (f) => { f.tables.team_species![0]!.version = 0; }, 'tables.team_species[0].version', /at least 1/],
      ['file name with CR/LF', (f) => { f.tables.species_imports = [importRow({ file_name: 'a.csv\r\nX-Injected: 1' })]; }, 'tables.species_imports[0].file_name', /ASCII/],
      ['file name with non-ASCII', (f) => { f.tables.species_imports = [importRow({ file_name: 'données.csv' })]; }, 'tables.species_imports[0].file_name', /ASCII/],
      ['over-long route name', (f) => { f.tables.routes![0]!.name = 'x'.repeat(161); }, 'tables.routes[0].name', /160/],
      ['flag category', (f) => { f.tables.step_flags![0]!.category = 'vibes'; }, 'tables.step_flags[0].category', /category/],
      ['text in a number column', (f) => { f.tables.team_species![0]!.dfh_kj = '-205'; }, 'tables.team_species[0].dfh_kj', /number/],
    ];
    for (const [label, edit, field, message] of cases) {
      const target = await makeTeamWithLead('bad-cell');
      const body = clone();
      edit(body);
      const res = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body });
      expect(res.status, label).toBe(400);
      const fields = errorOf(res.body).fields ?? {};
      expect(Object.keys(fields), label).toEqual([field]);
      expect(fields[field], label).toMatch(message);
      // The headline says the place in words, rows counted from 1 like every upload message: [1] is row 2.
      const [, table, index, column] = /^tables\.(\w+)\[(\d+)\]\.(\w+)$/.exec(field)!;
      expect(errorOf(res.body).message, label).toContain(`table ${table}, row ${Number(index) + 1}, column ${column} (row 1 is the first entry of the table): `);
      expect(await teamCounts(target.teamId), label).toEqual({ routes: 0, revisions: 0, comments: 0, flags: 0, decisions: 0, transitions: 0, species: 0 });
    }
  });

  it("gives imported species files a fresh key of the importing team, so another team's upload never downloads", async () => {
    const csv = 'formula,phase,name,dfH,S,provenance,reference\nC2H6O,l,Secret ethanol,-277,160,citation,CRC Handbook (test row)\n';
    const upload = await uploadSpeciesImport({ teamId: team.teamId, userId: team.leadId, fileName: 'secret.csv', bytes: Buffer.from(csv), text: csv });
    const exported = await callRoute(exportTeamRoute, { userId: team.leadId, params: { teamId: String(team.teamId) } });
    const withUpload = exported.body as typeof file;
    const row = withUpload.tables.species_imports!.find((r) => r.id === upload.id)!;
    expect(row.storage_key).toMatch(new RegExp(`^team-${team.teamId}/`));

    const target = await makeTeamWithLead('key-thief');
    const res = await callRoute(importTeamRoute, { method: 'POST', userId: target.leadId, params: { teamId: String(target.teamId) }, body: withUpload });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const imported = await getDb().models.SpeciesImport.findOne({ where: { teamId: target.teamId, fileName: 'secret.csv' } });
    expect(imported!.storageKey).toMatch(new RegExp(`^team-${target.teamId}/[0-9a-f-]{36}\\.csv$`));
    const download = await callRoute(importFileRoute, { userId: target.leadId, params: { importId: String(imported!.id) } });
    expect(download.status).toBe(410);
    expect(JSON.stringify(download.body)).not.toContain('Secret ethanol');
  });
});

function importRow(overrides: Record<string, unknown>) {
  return {
    id: 1, team_id: 1, file_name: 'species.csv', checksum: 'a'.repeat(64), byte_size: 10, row_count: 1,
    storage_key: 'team-7/0f8e2c1a-5b4d-4c3e-9a2b-1d0e9f8a7b6c.csv', status: 'committed', imported_by_id: null,
    created_count: 1, overridden_count: 0, skipped_count: 0, committed_at: null, created_at: '2026-11-30T09:15:00.000Z', ...overrides,
  };
}
