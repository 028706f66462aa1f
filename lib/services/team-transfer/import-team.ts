import 'server-only';
import { BaseError, Op, QueryTypes } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { TeamExportFile } from '../../schemas/team-transfer';
import { recordEvent } from '../audit/record-event';
import { IMPORT_KEY_PATTERN, newImportKey } from '../species/import-storage';
import { COLUMN_RULES, checkCell, typeRule } from './column-rules';
import { refuseTeamFile } from './file-place';
import { remapJsonCell } from './remap-json';
import { contentTables, transferTables, type TransferTable } from './transfer-tables';

type Cell = string | number | boolean | null;
type Deferred = { table: string; newId: number; column: string; ref: string; oldValue: number; where: string };

export interface ImportTeamResult {
  counts: Record<string, number>;
  /** people of the file who are members of the importing team, and so keep their routes, comments and flags */
  membersCredited: number;
  /** people of the file who are not: their rows show "former member" (or name the importing lead where one is required) */
  formerMembers: number;
}

// A function declaration, so the compiler narrows after a call as it does for `never`.
function invalid(where: string, message: string): never {
  return refuseTeamFile(where, message);
}

// Everything in one transaction: any bad row rolls the whole import back, so a refused file creates nothing.
export async function importTeam({ teamId, importerId, file }: { teamId: number; importerId: number; file: TeamExportFile }): Promise<ImportTeamResult> {
  const { sequelize, models } = getDb();
  try {
    return await sequelize.transaction(async (transaction) => {
      const tables = await transferTables(sequelize, transaction);
      const known = new Map(tables.map((t) => [t.name, t]));
      for (const name of Object.keys(file.tables)) if (!known.has(name)) invalid(`tables.${name}`, 'Stepwell has no such team table.');

      for (const table of contentTables(tables)) {
        const where = table.scope === 'team' ? 'team_id = ?' : 'route_id IN (SELECT id FROM routes WHERE team_id = ?)';
        const [counted] = await sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM ${table.name} WHERE ${where}`, { type: QueryTypes.SELECT, replacements: [teamId], transaction });
        if (Number(counted?.n ?? 0) > 0) throw new AppError('CONFLICT', 'Import goes into an empty team only: this team already has routes or data. Create a new team and import there.');
      }

      // Only the importing team's own members are credited: matching every account would tell the importer which
      // addresses have one, and would put strangers' names on this team's rows.
      const emails = file.people.map((p) => p.email.trim().toLowerCase());
      const memberIds = (await models.Membership.findAll({ where: { teamId }, attributes: ['userId'], transaction })).map((m) => m.userId);
      const accounts = await models.User.findAll({ where: { email: { [Op.in]: emails }, id: { [Op.in]: memberIds } }, attributes: ['id', 'email'], transaction });
      const byEmail = new Map(accounts.map((a) => [a.email, a.id]));
      const users = new Map<number, number>();
      for (const person of file.people) {
        const id = byEmail.get(person.email.trim().toLowerCase());
        if (id !== undefined) users.set(person.id, id);
      }

      const ids = new Map<string, Map<number, number>>();
      const deferred: Deferred[] = [];
      const counts: Record<string, number> = {};
      if (file.tables.driver_reactions) await sequelize.query('DELETE FROM driver_reactions WHERE team_id = ?', { replacements: [teamId], transaction });

      for (const table of tables) {
        const map = new Map<number, number>();
        ids.set(table.name, map);
        const rows = file.tables[table.name] ?? [];
        for (const [index, row] of rows.entries()) {
          const at = `tables.${table.name}[${index}]`;
          // A reviewer who is not a member here cannot review here; the rest of the route comes along.
          if (table.name === 'route_reviewers' && !users.has(Number(row.user_id))) continue;
          const values = rowValues({ table, row, at, teamId, importerId, users, ids, known, deferred });
          const columns = Object.keys(values);
          // The leading comment makes Sequelize's sqlite dialect use all() instead of run(), so RETURNING gives the new id.
          const inserted = await sequelize.query<{ id: number }>(
            `/* team import */ INSERT INTO ${table.name} (${columns.join(', ')}) VALUES (${columns.map(() => '?').join(', ')}) RETURNING id`,
            { type: QueryTypes.SELECT, replacements: columns.map((c) => values[c]), transaction },
          );
          map.set(row.id as number, inserted[0]!.id);
          for (const d of deferred) if (d.newId === -1) d.newId = inserted[0]!.id;
        }
        counts[table.name] = map.size;
      }

      for (const d of deferred) {
        const mapped = ids.get(d.ref)?.get(d.oldValue);
        if (mapped === undefined) invalid(d.where, `Refers to ${d.ref} id ${d.oldValue}, which is not in the file.`);
        await sequelize.query(`UPDATE ${d.table} SET ${d.column} = ? WHERE id = ?`, { replacements: [mapped, d.newId], transaction });
      }
      if (file.tables.driver_reactions) await models.Team.update({ driversSeededAt: new Date() }, { where: { id: teamId }, transaction });
      await recordEvent({ teamId, actorId: importerId, action: 'team.imported', targetType: 'team', targetId: teamId, data: { from: file.team.name, counts } }, transaction);
      return { counts, membersCredited: users.size, formerMembers: file.people.length - users.size };
    });
  } catch (error) {
    // A constraint the checks above did not foresee (a duplicate key, a wrong type) is still the file's fault, not a 500.
    if (error instanceof BaseError) throw new AppError('VALIDATION', `The team file does not fit the database: ${error.message.slice(0, 200)}`);
    throw error;
  }
}

function booleanCell(value: Exclude<Cell, null>, where: string): boolean {
  if (typeof value === 'boolean') return value;
  if (value === 0 || value === 1) return value === 1;
  return invalid(where, 'Expected true or false.');
}

// A Date goes to the driver in the target database's own format.
function timestampCell(value: Exclude<Cell, null>, where: string): Date {
  const at = typeof value === 'string' ? new Date(value) : null;
  if (!at || Number.isNaN(at.getTime())) invalid(where, 'Expected a date and time.');
  return at;
}

interface RowContext {
  table: TransferTable;
  row: Record<string, Cell>;
  at: string;
  teamId: number;
  importerId: number;
  users: Map<number, number>;
  ids: Map<string, Map<number, number>>;
  known: Map<string, TransferTable>;
  deferred: Deferred[];
}

function rowValues({ table, row, at, teamId, importerId, users, ids, known, deferred }: RowContext): Record<string, Cell | Date> {
  const columnNames = new Set(table.columns.map((c) => c.name));
  for (const key of Object.keys(row)) if (!columnNames.has(key)) invalid(`${at}.${key}`, `${table.name} has no such column.`);
  const oldId = row.id;
  if (typeof oldId !== 'number' || !Number.isInteger(oldId) || oldId <= 0) invalid(`${at}.id`, 'Each row needs a positive whole-number id.');
  if (ids.get(table.name)?.has(oldId)) invalid(`${at}.id`, `Id ${oldId} appears twice in ${table.name}.`);

  const values: Record<string, Cell | Date> = {};
  for (const column of table.columns) {
    if (column.name === 'id') continue;
    let value: Cell = row[column.name] ?? null;
    const where = `${at}.${column.name}`;
    if (column.ref === 'teams') value = teamId;
    else if (column.ref === 'users') value = value === null ? null : (users.get(Number(value)) ?? (column.notNull ? importerId : null));
    else if (column.ref && value !== null) {
      if (typeof value !== 'number' || !Number.isInteger(value)) invalid(where, 'Expected a whole-number id.');
      const target = ids.get(column.ref);
      if (!known.has(column.ref)) value = null;
      else if (column.ref !== table.name && target?.has(value)) value = target.get(value)!;
      else if (column.ref !== table.name && target) invalid(where, `Refers to ${column.ref} id ${value}, which is not in the file.`);
      else {
        // A reference to the same table (or one imported later) is filled in once every row has its new id.
        if (column.notNull) invalid(where, `Refers to ${column.ref} id ${value} before it exists.`);
        deferred.push({ table: table.name, newId: -1, column: column.name, ref: column.ref, oldValue: value, where });
        value = null;
      }
    }
    if (column.kind === 'boolean' && value !== null) value = booleanCell(value, where);
    if (table.name === 'species_imports' && column.name === 'storage_key') {
      if (!(typeof value === 'string' && IMPORT_KEY_PATTERN.test(value))) invalid(where, 'A stored file key is team-<n>/<uuid>.csv.');
      // The file itself is not in a team file: a fresh key under the importing team points at nothing, so its download
      // answers "no longer there" and can never reach another team's upload.
      value = newImportKey(teamId);
    }
    const rule = column.ref || column.kind !== 'plain' ? null : (COLUMN_RULES[table.name]?.[column.name] ?? typeRule(column.type));
    if (rule && value !== null) {
      const problem = checkCell(rule, value);
      if (problem) invalid(where, problem);
    }
    value = remapJsonCell(table.name, column.name, value, where, { routes: ids.get('routes') ?? new Map(), users });
    if (column.notNull && value === null) invalid(where, 'Required.');
    values[column.name] = column.kind === 'timestamp' && value !== null ? timestampCell(value, where) : value;
  }
  return values;
}
