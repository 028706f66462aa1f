import type { Comment } from '../../../db/models/comment';
import type { CommentDto, ThreadDto } from '../../schemas/comment';
import type { RouteContext } from './comment-context';

/**
 * Written on an earlier version: a step comment when the step's fields changed (or the step is gone),
 * a route comment when the route has been saved since.
 */
export function isOutdated(comment: Comment, ctx: RouteContext): boolean {
  if (comment.stepKey) return ctx.fingerprints.get(comment.stepKey) !== comment.stepFingerprint;
  return ctx.route.version > comment.routeVersion;
}

export function toCommentDto(comment: Comment, ctx: RouteContext, names: Map<number, string>): CommentDto {
  const isDeleted = comment.deletedAt != null;
  const person = (id: number | null | undefined) => (typeof id === 'number' && names.has(id) ? { id, name: names.get(id)! } : null);
  return {
    id: comment.id,
    routeId: comment.routeId,
    stepKey: comment.stepKey,
    parentId: comment.parentId,
    author: person(comment.authorId),
    body: isDeleted ? '' : comment.body,
    mentions: isDeleted ? [] : comment.mentions.map((m) => ({ userId: m.userId, handle: m.handle, name: names.get(m.userId) ?? m.handle })),
    routeVersion: comment.routeVersion,
    outdated: isOutdated(comment, ctx),
    isDeleted,
    editedAt: comment.editedAt?.toISOString() ?? null,
    createdAt: comment.createdAt.toISOString(),
  };
}

/** Every user id a DTO of these comments names. */
export function namedUserIds(comments: Comment[]): number[] {
  return comments.flatMap((c) => [c.authorId, c.resolvedById, ...c.mentions.map((m) => m.userId)].filter((id): id is number => typeof id === 'number'));
}

// A deleted comment stays only as the head of a thread that still has live replies.
export function buildThreads(comments: Comment[], ctx: RouteContext, names: Map<number, string>): ThreadDto[] {
  const replies = new Map<number, Comment[]>();
  for (const c of comments) if (c.parentId !== null) replies.set(c.parentId, [...(replies.get(c.parentId) ?? []), c]);
  const threads: ThreadDto[] = [];
  for (const root of comments) {
    if (root.parentId !== null) continue;
    const live = (replies.get(root.id) ?? []).filter((r) => r.deletedAt == null);
    if (root.deletedAt != null && live.length === 0) continue;
    threads.push({
      root: toCommentDto(root, ctx, names),
      replies: live.map((r) => toCommentDto(r, ctx, names)),
      resolved: root.resolvedAt != null,
      resolvedAt: root.resolvedAt?.toISOString() ?? null,
      resolvedBy: root.resolvedById != null && names.has(root.resolvedById) ? { id: root.resolvedById, name: names.get(root.resolvedById)! } : null,
    });
  }
  return threads;
}

/** Live comments in unresolved threads, per step key and on the route as a whole. */
export function unresolvedCounts(threads: ThreadDto[]): { unresolvedByStep: Record<string, number>; unresolvedOnRoute: number } {
  const unresolvedByStep: Record<string, number> = {};
  let unresolvedOnRoute = 0;
  for (const t of threads) {
    if (t.resolved) continue;
    const count = t.replies.length + (t.root.isDeleted ? 0 : 1);
    if (t.root.stepKey) unresolvedByStep[t.root.stepKey] = (unresolvedByStep[t.root.stepKey] ?? 0) + count;
    else unresolvedOnRoute += count;
  }
  return { unresolvedByStep, unresolvedOnRoute };
}
