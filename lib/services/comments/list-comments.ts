import 'server-only';
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { getDb } from '../../../db';
import type { Comment } from '../../../db/models/comment';
import type { CommentListDto, ListCommentsQuery, ThreadDto } from '../../schemas/comment';
import { loadRouteContext, userNames } from './comment-context';
import { buildThreads, namedUserIds, unresolvedCounts } from './comment-dto';

async function threadsWhere({ teamId, routeId, where, transaction }: { teamId: number; routeId: number; where: WhereOptions<Comment>; transaction?: Transaction }): Promise<ThreadDto[]> {
  const ctx = await loadRouteContext({ teamId, routeId, transaction });
  const rows = await getDb().models.Comment.findAll({ where: { routeId, teamId, ...where }, order: [['id', 'ASC']], transaction });
  return buildThreads(rows, ctx, await userNames(namedUserIds(rows), transaction));
}

/** Every thread of the route (or of one step), oldest first, with the unresolved counts for node badges. */
export async function listComments({ teamId, routeId, query }: { teamId: number; routeId: number; query: ListCommentsQuery }): Promise<CommentListDto> {
  const threads = await threadsWhere({ teamId, routeId, where: query.stepKey ? { stepKey: query.stepKey } : {} });
  // Counts always cover the whole route, so badges stay right while one step's threads are open.
  const all = query.stepKey ? await threadsWhere({ teamId, routeId, where: {} }) : threads;
  return { threads, ...unresolvedCounts(all) };
}

/** One thread by its root, as the list shows it (null when it is gone). */
export async function getThread({ teamId, routeId, rootId, transaction }: { teamId: number; routeId: number; rootId: number; transaction?: Transaction }): Promise<ThreadDto | null> {
  const threads = await threadsWhere({ teamId, routeId, where: { [Op.or]: [{ id: rootId }, { parentId: rootId }] }, transaction });
  return threads[0] ?? null;
}
