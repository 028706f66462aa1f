// Reads the migrated schema on either database, for tests that check its shape.
import { QueryTypes } from 'sequelize';
import { getDb } from '@/db';
import { onPostgres } from './test-db';

type Rows = Array<Record<string, unknown>>;
const q = (sql: string, replacements: Record<string, unknown> = {}) =>
  getDb().sequelize.query(sql, { type: QueryTypes.SELECT, replacements }) as Promise<Rows>;

export async function tableNames(): Promise<string[]> {
  const rows = onPostgres
    ? await q("SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename")
    : await q("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name");
  return rows.map((r) => String(r.name));
}

export async function columnNames(table: string): Promise<string[]> {
  return Object.keys(await getDb().sequelize.getQueryInterface().describeTable(table));
}

export async function foreignKeyColumns(table: string): Promise<string[]> {
  const refs = (await getDb().sequelize.getQueryInterface().getForeignKeyReferencesForTable(table)) as Array<{ columnName: string }>;
  return refs.map((r) => r.columnName);
}

/** Each index's columns in order, the primary key included. */
export async function indexColumns(table: string): Promise<string[][]> {
  if (onPostgres) {
    const rows = await q(
      `SELECT i.relname AS name, array_agg(a.attname::text ORDER BY k.ord) AS columns
         FROM pg_index x
         JOIN pg_class t ON t.oid = x.indrelid
         JOIN pg_class i ON i.oid = x.indexrelid
         CROSS JOIN LATERAL unnest(x.indkey) WITH ORDINALITY AS k(attnum, ord)
         JOIN pg_attribute a ON a.attrelid = t.oid AND a.attnum = k.attnum
        WHERE t.relname = :table
        GROUP BY i.relname`,
      { table },
    );
    return rows.map((r) => r.columns as string[]);
  }
  const list: string[][] = [];
  for (const index of await q(`PRAGMA index_list("${table}")`)) {
    list.push((await q(`PRAGMA index_info("${String(index.name)}")`)).sort((a, b) => Number(a.seqno) - Number(b.seqno)).map((c) => String(c.name)));
  }
  // An INTEGER PRIMARY KEY is the rowid and has no index_list row, but it is an index too.
  const pk = (await q(`PRAGMA table_info("${table}")`)).filter((c) => Number(c.pk) > 0).sort((a, b) => Number(a.pk) - Number(b.pk)).map((c) => String(c.name));
  if (pk.length) list.push(pk);
  return list;
}
