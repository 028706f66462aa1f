// Growth: every foreign key and every list query has an index, read from the migrated schema itself.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { columnNames, foreignKeyColumns, indexColumns, tableNames } from './support/schema';
import { setupTestDb, teardownTestDb } from './support/test-db';


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
  for (const table of await tableNames()) {
    tables.push(table);
    indexes.set(table, await indexColumns(table));
  }
});
afterAll(async () => teardownTestDb(dir));

const hasLeading = (table: string, columns: string[]) => (indexes.get(table) ?? []).some((index) => columns.every((c, i) => index[i] === c));

describe('indexes', () => {
  it('index every foreign key column (as the leading column of some index)', async () => {
    const missing: string[] = [];
    for (const table of tables) {
      for (const column of await foreignKeyColumns(table)) if (!hasLeading(table, [column])) missing.push(`${table}.${column}`);
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
      const columns = await columnNames(table);
      if (columns.includes('team_id') && !hasLeading(table, ['team_id'])) missing.push(table);
    }
    expect(missing).toEqual([]);
  });
});
