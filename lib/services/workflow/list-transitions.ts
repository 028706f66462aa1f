import 'server-only';
import { getDb } from '../../../db';
import type { RouteStatus, ListTransitionsQuery } from '../../schemas/workflow';
import { findRouteRow } from '../routes/get-route';
import type { TransitionDto } from './transition-dto';

// A route's review history, newest first, with who moved it and whom they named.
export async function listTransitions({ teamId, routeId, query }: { teamId: number; routeId: number; query: ListTransitionsQuery }) {
  const { RouteTransition, RouteReviewer, User } = getDb().models;
  await findRouteRow({ teamId, routeId });
  const { rows, count } = await RouteTransition.findAndCountAll({
    where: { routeId, teamId },
    order: [['id', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    include: [
      { model: User, as: 'actor', attributes: ['name'] },
      { model: RouteReviewer, as: 'reviewers', attributes: ['userId'], include: [{ model: User, as: 'user', attributes: ['id', 'name'] }] },
    ],
    distinct: true,
  });
  const items: TransitionDto[] = rows.map((row) => {
    const reviewers = (row.get('reviewers') as { userId: number; get(key: 'user'): { name: string } | null }[]) ?? [];
    return {
      id: row.id,
      routeId: row.routeId,
      from: row.fromStatus as RouteStatus,
      to: row.toStatus as RouteStatus,
      actor: { id: row.actorId, name: (row.get('actor') as { name: string } | null)?.name ?? '—' },
      note: row.note,
      reviewers: reviewers.map((r) => ({ id: r.userId, name: r.get('user')?.name ?? '—' })).sort((a, b) => a.id - b.id),
      routeVersion: row.routeVersion,
      createdAt: row.createdAt.toISOString(),
    };
  });
  return { items, total: count, page: query.page, pageSize: query.pageSize };
}
