import 'server-only';
import { Op } from 'sequelize';
import { getDb } from '../../../db';
import type { ListRoutesQuery } from '../../schemas/route';
import { restorableUntil, UNDELETE_WINDOW_DAYS } from './delete-route';
import { toRouteSummary, type RouteSummaryDto } from './route-dto';

export interface DeletedRouteDto extends RouteSummaryDto {
  deletedAt: string;
  deletedBy: string;
  restorableUntil: string;
}

// The team's routes deleted within the window a lead can still bring them back in, newest deletion first.
export async function listDeletedRoutes({ teamId, query, now = new Date() }: { teamId: number; query: ListRoutesQuery; now?: Date }) {
  const { Route, User } = getDb().models;
  const since = new Date(now.getTime() - UNDELETE_WINDOW_DAYS * 86_400_000);
  const { rows, count } = await Route.findAndCountAll({
    where: { teamId, deletedAt: { [Op.gte]: since } },
    order: [['deleted_at', 'DESC'], ['id', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    include: [
      { model: User, as: 'updatedBy', attributes: ['name'] },
      { model: User, as: 'deletedBy', attributes: ['name'] },
    ],
  });
  const name = (r: (typeof rows)[number], as: string) => (r.get(as) as { name: string } | null)?.name ?? '—';
  const items: DeletedRouteDto[] = rows.map((r) => ({
    ...toRouteSummary(r, name(r, 'updatedBy')),
    deletedAt: r.deletedAt!.toISOString(),
    deletedBy: name(r, 'deletedBy'),
    restorableUntil: restorableUntil(r.deletedAt!).toISOString(),
  }));
  return { items, total: count, page: query.page, pageSize: query.pageSize };
}
