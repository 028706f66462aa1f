import 'server-only';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

/**
 * The team's tables in an order where every NOT NULL reference points to a table already imported.
 * Tables another helper may not have added yet are skipped when absent.
 */
const ORDER = [
  'fit_data_sets',
  'fits',
  'species_imports',
  'team_species',
  'routes',
  'steps',
  'step_links',
  'route_revisions',
  'route_transitions',
  'route_reviewers',
  'comments',
  'step_flags',
  'decisions',
  'driver_reactions',
] as const;

/** References the schema does not declare as foreign keys. */
const SOFT_REFERENCES: Record<string, Record<string, string>> = {
  team_species: { fit_id: 'fits' },
  steps: { fit_id: 'fits' },
};

export interface Column {
  name: string;
  notNull: boolean;
  /** 'teams', 'users', another transfer table, or null for a plain value */
  ref: string | null;
  /**
   * How a cell is read back in, so a file from either database loads into both: SQLite exports booleans as 0/1
   * (TINYINT(1)) and times as its own text, PostgreSQL true/false and ISO strings.
   */
  kind: 'boolean' | 'timestamp' | 'plain';
  /** the SQL type as the database reports it, e.g. VARCHAR(160) or JSON */
  type: string;
}

function kindOf(type: string): Column['kind'] {
  if (/^(BOOLEAN|TINYINT\(1\))$/i.test(type)) return 'boolean';
  return /^(DATETIME|TIMESTAMP)/i.test(type) ? 'timestamp' : 'plain';
}

export interface TransferTable {
  name: string;
  columns: Column[];
  /** how the team's rows are found: by team_id, or through the route they belong to */
  scope: 'team' | 'route';
}

// The schema changes only when migrations run, which happens before a process serves requests; reading it once per
// database connection saves ~30 round trips per import or export (PostgreSQL's catalogue queries are not cheap).
const schemaCache = new WeakMap<Sequelize, Promise<TransferTable[]>>();

export function transferTables(sequelize: Sequelize, transaction?: Transaction): Promise<TransferTable[]> {
  let cached = schemaCache.get(sequelize);
  if (!cached) {
    cached = readTransferTables(sequelize, transaction);
    schemaCache.set(sequelize, cached);
    cached.catch(() => schemaCache.delete(sequelize));
  }
  return cached;
}

// Read from the live schema through Sequelize's query interface, so the same code serves SQLite and PostgreSQL.
async function readTransferTables(sequelize: Sequelize, transaction?: Transaction): Promise<TransferTable[]> {
  const qi = sequelize.getQueryInterface();
  const existing = new Set((await qi.showAllTables({ transaction })).map((t) => (typeof t === 'string' ? t : (t as { tableName: string }).tableName)));
  const tables: TransferTable[] = [];
  for (const name of ORDER) {
    if (!existing.has(name)) continue;
    const info = await qi.describeTable(name, { transaction } as Parameters<typeof qi.describeTable>[1]);
    const fks = (await qi.getForeignKeyReferencesForTable(name, { transaction })) as Array<{ columnName: string; referencedTableName: string }>;
    const refs: Record<string, string> = { ...Object.fromEntries(fks.map((fk) => [fk.columnName, fk.referencedTableName])), ...(SOFT_REFERENCES[name] ?? {}) };
    const columns = Object.entries(info).map(([column, c]) => ({
      name: column, notNull: !c.allowNull, ref: refs[column] ?? null, kind: kindOf(c.type), type: c.type,
    }));
    const hasTeam = columns.some((c) => c.name === 'team_id');
    if (!hasTeam && !columns.some((c) => c.name === 'route_id' && c.ref === 'routes')) continue;
    tables.push({ name, columns, scope: hasTeam ? 'team' : 'route' });
  }
  return tables;
}

/** Tables whose rows make a team "not empty"; a new team's seeded drivers do not count (an import replaces them). */
export function contentTables(tables: TransferTable[]): TransferTable[] {
  return tables.filter((t) => t.name !== 'driver_reactions');
}

export function selectTeamRows(sequelize: Sequelize, table: TransferTable, teamId: number, transaction?: Transaction) {
  const where = table.scope === 'team' ? 'team_id = ?' : 'route_id IN (SELECT id FROM routes WHERE team_id = ?)';
  return sequelize.query<Record<string, unknown>>(`SELECT * FROM ${table.name} WHERE ${where} ORDER BY id`, { type: QueryTypes.SELECT, replacements: [teamId], transaction });
}
