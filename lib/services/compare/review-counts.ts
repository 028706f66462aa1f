import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';

export interface ReviewCounts {
  openFlags: number;
  unresolvedComments: number;
}

/**
 * Open flags and unresolved comments per route, counted as the editor's badges count them: live
 * comments (a root and its live replies) in threads whose root is not resolved.
 */
export async function reviewCounts({ teamId, routeIds, transaction }: { teamId: number; routeIds: number[]; transaction?: Transaction }): Promise<Map<number, ReviewCounts>> {
  const { StepFlag, Comment } = getDb().models;
  const [flags, comments] = await Promise.all([
    StepFlag.findAll({ where: { teamId, routeId: { [Op.in]: routeIds }, clearedAt: null }, attributes: ['routeId'], transaction }),
    Comment.findAll({ where: { teamId, routeId: { [Op.in]: routeIds } }, attributes: ['id', 'routeId', 'parentId', 'resolvedAt', 'deletedAt'], transaction }),
  ]);
  const counts = new Map(routeIds.map((id) => [id, { openFlags: 0, unresolvedComments: 0 }]));
  for (const f of flags) counts.get(f.routeId)!.openFlags += 1;
  const roots = new Map(comments.filter((c) => c.parentId === null).map((c) => [c.id, c]));
  for (const c of comments) {
    if (c.deletedAt != null) continue;
    const root = c.parentId === null ? c : roots.get(c.parentId);
    if (!root || root.resolvedAt != null) continue;
    counts.get(c.routeId)!.unresolvedComments += 1;
  }
  return counts;
}
