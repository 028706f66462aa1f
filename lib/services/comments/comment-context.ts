import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import type { Comment } from '../../../db/models/comment';
import type { Route } from '../../../db/models/route';
import { AppError } from '../../api/errors';
import { forUpdate } from '../row-lock';
import { findRouteRow } from '../routes/get-route';
import { stepFingerprint } from './step-fingerprint';

export interface RouteContext {
  route: Route;
  /** Current fingerprint of every step, by step key. */
  fingerprints: Map<string, string>;
}

export async function loadRouteContext({ teamId, routeId, transaction }: { teamId: number; routeId: number; transaction?: Transaction }): Promise<RouteContext> {
  const route = await findRouteRow({ teamId, routeId, transaction });
  const steps = await getDb().models.Step.findAll({ where: { routeId }, attributes: ['stepKey', 'equation', 'conditions', 'yieldPct', 'notes'], transaction });
  return { route, fingerprints: new Map(steps.map((s) => [s.stepKey, stepFingerprint(s)])) };
}

/** A comment of this route and team, or 404 (another team's id looks exactly like a missing one). Inside a transaction the row is held for the write that follows. */
export async function findComment({ teamId, routeId, commentId, transaction }: { teamId: number; routeId: number; commentId: number; transaction?: Transaction }): Promise<Comment> {
  const options = transaction ? forUpdate(transaction) : {};
  const comment = Number.isInteger(commentId) && commentId > 0
    ? await getDb().models.Comment.findOne({ where: { id: commentId, routeId, teamId }, ...options })
    : null;
  if (!comment) throw new AppError('NOT_FOUND', 'No such comment.');
  return comment;
}

/** A live comment written by the caller: 404 if missing, 410 if deleted, 403 if someone else's. */
export async function findOwnComment(opts: { teamId: number; routeId: number; commentId: number; userId: number; transaction?: Transaction }): Promise<Comment> {
  const comment = await findComment(opts);
  if (comment.deletedAt) throw new AppError('GONE', 'This comment was deleted.');
  if (comment.authorId !== opts.userId) throw new AppError('FORBIDDEN', 'You can only change your own comments.');
  return comment;
}

/** Names of the given users, by id. */
export async function userNames(ids: Iterable<number | null | undefined>, transaction?: Transaction): Promise<Map<number, string>> {
  const wanted = [...new Set([...ids].filter((id): id is number => typeof id === 'number'))];
  if (wanted.length === 0) return new Map();
  const users = await getDb().models.User.findAll({ where: { id: { [Op.in]: wanted } }, attributes: ['id', 'name'], transaction });
  return new Map(users.map((u) => [u.id, u.name]));
}

/** Members of the team with their e-mail, for resolving `@handle` mentions. */
export async function teamMemberEmails(teamId: number, transaction?: Transaction): Promise<Array<{ userId: number; email: string }>> {
  const { Membership, User } = getDb().models;
  const rows = await Membership.findAll({ where: { teamId }, include: [{ model: User, as: 'user', attributes: ['email'] }], order: [['id', 'ASC']], transaction });
  return rows.map((m) => ({ userId: m.userId, email: (m.get('user') as InstanceType<typeof User>).email }));
}
