// Growth: every foreign key and every list query has an index, read from the migrated schema itself.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { setupTestDb, teardownTestDb } from './support/test-db';

type Rows = Array<Record<string, unknown>>;
const q = (sql: string) => getDb().sequelize.query(sql, { type: 'SELECT' }) as Promise<Rows>;

// The leading columns each list query filters and orders on (lib/services/**/list-*, read-*).
const LIST_QUERIES: Array<[table: string, columns: string[]]> = [
  ['routes', ['team_id', 'archived_at', 'updated_at']],
  ['routes', ['team_id', 'deleted_at']],
  ['steps', ['route_id']],
  ['step_links', ['route_id']],
  ['route_revisions', ['route_id', 'version']],
  ['route_transitions', ['route_id']],
  ['comments', ['route_id', 'created_at']],
  ['step_flags', ['route_id']],
  ['notifications', ['user_id', 'id']],
  ['decisions', ['team_id', 'id']],
  ['audit_events', ['team_id', 'created_at']],
  ['memberships', ['team_id']],
  ['invitations', ['team_id']],
  ['driver_reactions', ['team_id']],
  ['team_species', ['team_id', 'key']],
  ['species_imports', ['team_id']],
  ['fit_data_sets', ['team_id']],
  ['fits', ['team_id']],
];

let dir = '';
const indexes = new Map<string, string[][]>(); // table → each index's columns, in order
const tables: string[] = [];

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  for (const { name } of await q("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'")) {
    const table = String(name);
    tables.push(table);
    const list: string[][] = [];
    for (const index of await q(`PRAGMA index_list("${table}")`)) {
      list.push((await q(`PRAGMA index_info("${String(index.name)}")`)).sort((a, b) => Number(a.seqno) - Number(b.seqno)).map((c) => String(c.name)));
    }
    // The primary key is an index too (an INTEGER PRIMARY KEY is the rowid and has no index_list row).
    const pk = (await q(`PRAGMA table_info("${table}")`)).filter((c) => Number(c.pk) > 0).sort((a, b) => Number(a.pk) - Number(b.pk)).map((c) => String(c.name));
    if (pk.length) list.push(pk);
    indexes.set(table, list);
  }
});
afterAll(async () => teardownTestDb(dir));

const hasLeading = (table: string, columns: string[]) => (indexes.get(table) ?? []).some((index) => columns.every((c, i) => index[i] === c));

describe('indexes', () => {
  it('index every foreign key column (as the leading column of some index)', async () => {
    const missing: string[] = [];
    for (const table of tables) {
      for (const fk of await q(`PRAGMA foreign_key_list("${table}")`)) if (!hasLeading(table, [String(fk.from)])) missing.push(`${table}.${String(fk.from)}`);
    }
    expect(tables.length).toBeGreaterThan(15);
    expect(missing, 'foreign keys without an index: add one in a new migration').toEqual([]);
  });

  it('index the filter and sort columns of every list query', () => {
    const missing = LIST_QUERIES.filter(([table, columns]) => !hasLeading(table, columns)).map(([t, c]) => `${t}(${c.join(', ')})`);
    expect(missing, 'list queries without a matching index').toEqual([]);
  });

  it('lead with team_id in some index on every team-scoped table, so each team reads only its own rows', async () => {
    const missing: string[] = [];
    for (const table of tables) {
      const columns = (await q(`PRAGMA table_info("${table}")`)).map((c) => String(c.name));
      if (columns.includes('team_id') && !hasLeading(table, ['team_id'])) missing.push(table);
    }
    expect(missing).toEqual([]);
  });
});
