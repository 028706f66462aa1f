import 'server-only';
import { Op, Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { TEAM_EXPORT_FORMAT, type TeamExportFile } from '../../schemas/team-transfer';
import { selectTeamRows, transferTables } from './transfer-tables';

type Cell = string | number | boolean | null;

function toCell(value: unknown): Cell {
  if (value === null || value === undefined) return null;
  if (value instanceof Date) return value.toISOString();
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') return value;
  return JSON.stringify(value);
}

// Reads every team table inside one read transaction, so the file is one consistent moment of the team. On SQLite, DEFERRED
// (not the app's usual IMMEDIATE) takes no write lock, so saves go on while a large team is exported. On PostgreSQL,
// READ COMMITTED would give each SELECT its own moment; REPEATABLE READ gives the whole export one snapshot.
export async function exportTeam({ teamId }: { teamId: number }): Promise<TeamExportFile> {
  const { sequelize, models } = getDb();
  return sequelize.transaction({ type: Transaction.TYPES.DEFERRED, isolationLevel: Transaction.ISOLATION_LEVELS.REPEATABLE_READ }, async (transaction) => {
    const team = await models.Team.findByPk(teamId, { transaction });
    if (!team) throw new AppError('NOT_FOUND', 'No such team.');
    const tables = await transferTables(sequelize, transaction);
    const out: Record<string, Record<string, Cell>[]> = {};
    const userIds = new Set<number>();
    for (const table of tables) {
      const rows = await selectTeamRows(sequelize, table, teamId, transaction);
      const userColumns = table.columns.filter((c) => c.ref === 'users').map((c) => c.name);
      out[table.name] = rows.map((row) => {
        for (const column of userColumns) if (typeof row[column] === 'number') userIds.add(row[column] as number);
        return Object.fromEntries(Object.entries(row).map(([k, v]) => [k, toCell(v)]));
      });
    }
    for (const comment of out.comments ?? []) {
      for (const mention of parseMentions(comment.mentions)) userIds.add(mention.userId);
    }
    const people = await models.User.findAll({ where: { id: { [Op.in]: [...userIds] } }, attributes: ['id', 'email', 'name'], order: [['id', 'ASC']], transaction });
    return {
      format: TEAM_EXPORT_FORMAT,
      exportedAt: new Date().toISOString(),
      team: { id: team.id, name: team.name },
      people: people.map((p) => ({ id: p.id, email: p.email, name: p.name })),
      tables: out,
      notes: [
        'Members, invitations, notifications and the audit trail are not exported; people are matched by e-mail on import.',
        'Uploaded species files are not included: species_imports rows keep their counts and checksum only.',
      ],
    };
  });
}

export function parseMentions(value: unknown): { userId: number; handle: string }[] {
  try {
    const parsed: unknown = typeof value === 'string' ? JSON.parse(value) : value;
    return Array.isArray(parsed) ? parsed.filter((m): m is { userId: number; handle: string } => typeof m?.userId === 'number') : [];
  } catch {
    return [];
  }
}
