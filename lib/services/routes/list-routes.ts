import 'server-only';
import { literal, Op, type Order, type WhereOptions } from 'sequelize';
import { getDb } from '../../../db';
import type { Route } from '../../../db/models/route';
import type { ListRoutesQuery } from '../../schemas/route';
import { toRouteSummary, type RouteSummaryDto } from './route-dto';

const SORT_COLUMNS: Record<ListRoutesQuery['sort'], string> = {
  name: 'name',
  target: 'target',
  updatedAt: 'updated_at',
  steps: 'step_count',
  overallDeltaG: 'overall_dg_kj',
  uphillSteps: 'uphill_steps',
};

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

export async function listRoutes({ teamId, query }: { teamId: number; query: ListRoutesQuery }) {
  const { Route, User } = getDb().models;
  const where: WhereOptions<Route> = { teamId, deletedAt: null, archivedAt: query.archived === '1' ? { [Op.ne]: null } : null };
  if (query.q) {
    // lower() on both sides and an explicit ESCAPE: SQLite's LIKE ignores ASCII case and has no default escape,
    // PostgreSQL's LIKE is case-sensitive; this reads the same on both.
    const pattern = getDb().sequelize.escape(`%${escapeLike(query.q.toLowerCase())}%`);
    const contains = (column: string) => literal(`lower("Route"."${column}") LIKE ${pattern} ESCAPE '\\'`);
    Object.assign(where, { [Op.or]: [contains('name'), contains('target')] });
  }
  const order: Order = [[SORT_COLUMNS[query.sort], query.dir.toUpperCase()], ['id', 'DESC']];
  const { rows, count } = await Route.findAndCountAll({
    where,
    order,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    include: [{ model: User, as: 'updatedBy', attributes: ['name'] }],
  });
  const items: RouteSummaryDto[] = rows.map((r) => toRouteSummary(r, (r.get('updatedBy') as { name: string } | null)?.name ?? '—'));
  return { items, total: count, page: query.page, pageSize: query.pageSize };
}
