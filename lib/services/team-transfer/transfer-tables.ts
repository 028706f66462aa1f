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
}

export interface TransferTable {
  name: string;
  columns: Column[];
  /** how the team's rows are found: by team_id, or through the route they belong to */
  scope: 'team' | 'route';
}

export async function transferTables(sequelize: Sequelize, transaction?: Transaction): Promise<TransferTable[]> {
  const tables: TransferTable[] = [];
  for (const name of ORDER) {
    const info = await sequelize.query<{ name: string; notnull: number }>(`PRAGMA table_info(${name})`, { type: QueryTypes.SELECT, transaction });
    if (info.length === 0) continue;
    const fks = await sequelize.query<{ from: string; table: string }>(`PRAGMA foreign_key_list(${name})`, { type: QueryTypes.SELECT, transaction });
    const refs: Record<string, string> = { ...Object.fromEntries(fks.map((fk) => [fk.from, fk.table])), ...(SOFT_REFERENCES[name] ?? {}) };
    const columns = info.map((c) => ({ name: c.name, notNull: c.notnull === 1, ref: refs[c.name] ?? null }));
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
