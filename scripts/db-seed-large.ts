// npm run db:seed:large: the demo team grown to 5,000 routes (100,000 steps) and 10,000 team species, in its own
// database file (STEPWELL_LARGE_DB, default var/large/stepwell.sqlite), for the growth benchmarks. Starts afresh each time.
// Always SQLite, whatever DATABASE_URL says: the bulk copies below use SQLite's printf, datetime and json_object.
import fs from 'node:fs';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import { syntheticChain } from '../bench/support/synthetic-route';
import { DEMO_TEAM_NAME, DEMO_USERS } from '../db/seeders/demo-team';

export const LARGE_ROUTES = 5000;
export const LARGE_STEPS_PER_ROUTE = 20;
export const LARGE_TEAM_SPECIES = 10_000;

export function largeDbPath(): string {
  return path.resolve(process.env.STEPWELL_LARGE_DB ?? 'var/large/stepwell.sqlite');
}

async function main() {
  const file = largeDbPath();
  if (process.env.DATABASE_PATH && path.resolve(process.env.DATABASE_PATH) === file) throw new Error('STEPWELL_LARGE_DB must not be the working database');
  for (const suffix of ['', '-wal', '-shm']) fs.rmSync(file + suffix, { force: true });
  process.env.DATABASE_PATH = file;
  delete process.env.DATABASE_URL;
  const started = performance.now();
  // Imported after DATABASE_PATH is set, so the one Sequelize instance opens the large file.
  const { migrateAndSeed } = await import('./db-tasks');
  await migrateAndSeed({ seed: true });
  const { getDb, closeDb } = await import('../db');
  const { createRoute } = await import('../lib/services/routes/create-route');
  const { saveRoute } = await import('../lib/services/routes/save-route');
  const { createTeamSpecies } = await import('../lib/services/species/create-team-species');
  const { sequelize, models } = getDb();
  const team = (await models.Team.findOne({ where: { name: DEMO_TEAM_NAME } }))!;
  const lead = (await models.User.findOne({ where: { email: DEMO_USERS.find((u) => u.role === 'lead')!.email } }))!;

  // One template route and one template species through the real services; the rest are copies made in SQL.
  const chain = syntheticChain(LARGE_STEPS_PER_ROUTE);
  const created = await createRoute({ teamId: team.id, userId: lead.id, input: { name: 'Large team template', target: chain.target, targetAmount: '1 mol' } });
  const template = await saveRoute({
    teamId: team.id, userId: lead.id, routeId: created.id,
    input: { version: created.version, name: 'Large team template', targetAmount: '1 mol', marginalThreshold_kJ: -17, ...chain },
  });
  const templateId = template.route.id;
  // Made-up values for volume only: not reference data.
  const species = await createTeamSpecies({
    teamId: team.id, userId: lead.id,
    input: { formula: 'C1H1O1', phase: 'l', name: 'Volume species', dfH: -300, S: 150, provenance: { kind: 'estimated', method: 'Seeded for the growth benchmark' } },
  });

  const copies = LARGE_ROUTES - 1;
  await sequelize.transaction(async (transaction) => {
    const run = (sql: string, replacements: Record<string, unknown> = {}) => sequelize.query(sql, { replacements, transaction });
    const numbers = `WITH RECURSIVE n(i) AS (SELECT 1 UNION ALL SELECT i + 1 FROM n WHERE i < :count)`;
    // Names, targets, times and ΔG vary, and every tenth route is archived, so sorts and filters have work to do.
    await run(
      `${numbers}
       INSERT INTO routes (team_id, name, target, target_amount, status, version, marginal_threshold_kj, created_by_id, updated_by_id, archived_at,
                           step_count, overall_dg_kj, uphill_steps, created_at, updated_at)
       SELECT r.team_id, printf('Route %05d — %s', n.i, CASE n.i % 4 WHEN 0 THEN 'oxidation' WHEN 1 THEN 'split' WHEN 2 THEN 'recycle' ELSE 'loop' END),
              r.target, r.target_amount, r.status, r.version, r.marginal_threshold_kj, r.created_by_id, r.updated_by_id,
              CASE WHEN n.i % 10 = 0 THEN datetime('now', printf('-%d minutes', n.i)) END,
              r.step_count, r.overall_dg_kj + (n.i % 97) - 48, r.uphill_steps, datetime('now', printf('-%d minutes', n.i)), datetime('now', printf('-%d minutes', n.i))
       FROM routes r, n WHERE r.id = :templateId`,
      { count: copies, templateId },
    );
    await run(
      `INSERT INTO steps (route_id, step_key, sort_order, equation, conditions, yield_pct, notes, position_x, position_y, created_at, updated_at)
       SELECT r.id, s.step_key, s.sort_order, s.equation, s.conditions, s.yield_pct, s.notes, s.position_x, s.position_y, r.created_at, r.updated_at
       FROM routes r JOIN steps s ON s.route_id = :templateId WHERE r.team_id = :teamId AND r.id <> :templateId`,
      { templateId, teamId: team.id },
    );
    await run(
      `INSERT INTO step_links (route_id, from_key, to_key, species, created_at)
       SELECT r.id, l.from_key, l.to_key, l.species, r.created_at FROM routes r JOIN step_links l ON l.route_id = :templateId WHERE r.team_id = :teamId AND r.id <> :templateId`,
      { templateId, teamId: team.id },
    );
    await run(
      `INSERT INTO route_revisions (route_id, team_id, version, author_id, summary, snapshot, step_dg, overall_dg_kj, created_at)
       SELECT r.id, v.team_id, v.version, v.author_id, v.summary, v.snapshot, v.step_dg, r.overall_dg_kj, r.created_at
       FROM routes r JOIN route_revisions v ON v.route_id = :templateId WHERE r.team_id = :teamId AND r.id <> :templateId`,
      { templateId, teamId: team.id },
    );
    // Species CaHbOc(l): distinct formulas, elements to match, names that a search can find.
    await run(
      `${numbers}
       INSERT INTO team_species (team_id, key, formula, phase, form, name, aliases, elements, charge, dfh_kj, dfg_kj, dfg_derived, s_j_per_k,
                                 provenance_kind, provenance_text, notes, version, created_by_id, updated_by_id, created_at, updated_at)
       SELECT t.team_id, printf('C%dH%dO%d(l)', 2 + n.i / 400, 1 + (n.i / 10) % 40, 1 + n.i % 10), printf('C%dH%dO%d', 2 + n.i / 400, 1 + (n.i / 10) % 40, 1 + n.i % 10),
              t.phase, t.form, printf('Seeded species %05d', n.i), t.aliases, json_object('C', 2 + n.i / 400, 'H', 1 + (n.i / 10) % 40, 'O', 1 + n.i % 10), t.charge,
              t.dfh_kj - n.i % 200, t.dfg_kj - n.i % 200, t.dfg_derived, t.s_j_per_k, t.provenance_kind, t.provenance_text, t.notes, 1,
              t.created_by_id, t.updated_by_id, t.created_at, t.updated_at
       FROM team_species t, n WHERE t.id = :speciesId`,
      { count: LARGE_TEAM_SPECIES - 1, speciesId: species.id },
    );
  });

  const count = async (table: string) => Number(((await sequelize.query(`SELECT COUNT(*) AS n FROM ${table} WHERE team_id = :teamId`, { replacements: { teamId: team.id }, type: 'SELECT' })) as Array<{ n: number }>)[0]!.n);
  const steps = Number(((await sequelize.query('SELECT COUNT(*) AS n FROM steps JOIN routes ON routes.id = steps.route_id WHERE routes.team_id = :teamId', { replacements: { teamId: team.id }, type: 'SELECT' })) as Array<{ n: number }>)[0]!.n);
  await sequelize.query('ANALYZE');
  console.log(`[db] large team in ${file}: ${await count('routes')} routes, ${steps} steps, ${await count('team_species')} team species (${((performance.now() - started) / 1000).toFixed(1)} s)`);
  await closeDb();
}

if (require.main === module) {
  main().catch((error) => {
    console.error(error);
    process.exit(1);
  });
}
