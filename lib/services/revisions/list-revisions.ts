import 'server-only';
import { getDb } from '../../../db';
import type { ListRevisionsQuery } from '../../schemas/revision';
import { findRouteRow } from '../routes/get-route';
import { readableSummaries } from './relabel-summaries';
import { toRevisionSummary } from './revision-dto';

// A route's revisions, newest first, without their snapshots.
export async function listRevisions({ teamId, routeId, query }: { teamId: number; routeId: number; query: ListRevisionsQuery }) {
  const { RouteRevision, User } = getDb().models;
  await findRouteRow({ teamId, routeId });
  const { rows, count } = await RouteRevision.findAndCountAll({
    where: { routeId, teamId },
    attributes: { exclude: ['snapshot', 'stepDg'] },
    order: [['version', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    include: [{ model: User, as: 'author', attributes: ['name'] }],
  });
  const summaries = await readableSummaries(rows);
  return { items: rows.map((r) => toRevisionSummary(r, undefined, summaries.get(r.id))), total: count, page: query.page, pageSize: query.pageSize };
}
