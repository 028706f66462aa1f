import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { can, PERMISSIONS } from '../../auth/permissions';
import { ROLE_LABELS, type Role } from '../../auth/roles';
import { ROUTE_STATUS_LABELS, transitionFieldErrors, type RouteStatus, type TransitionInput } from '../../schemas/workflow';
import { recordEvent } from '../audit/record-event';
import { findRouteRow } from '../routes/get-route';
import { recordTransition } from './record-transition';
import type { TransitionOutcome } from './transition-dto';
import { allowedMoves, findRule, isRouteStatus, movesFrom, type TransitionRule } from './transition-table';

const label = (s: string) => (isRouteStatus(s) ? ROUTE_STATUS_LABELS[s].toLowerCase() : s);

function listed(statuses: string[]): string {
  const words = statuses.map(label);
  if (words.length === 0) return 'nowhere';
  return words.length === 1 ? words[0]! : `${words.slice(0, -1).join(', ')} or ${words.at(-1)}`;
}

function notAllowed(from: string, to: string, role: Role): AppError {
  const mine = allowedMoves(from, role);
  return new AppError(
    'CONFLICT',
    `This route is ${label(from)}, so it cannot move to ${label(to)}. From ${label(from)} it can move to ${listed(movesFrom(from))}` +
      (mine.length ? `; you can move it to ${listed(mine)}.` : '; your role cannot move it from here.'),
    { details: { status: from, allowed: mine } },
  );
}

function forbidden(rule: TransitionRule): AppError {
  const who = (PERMISSIONS[rule.permission] as readonly Role[]).map((r) => ROLE_LABELS[r].toLowerCase());
  return new AppError('FORBIDDEN', `Only a ${who.join(' or a ')} can move a route from ${label(rule.from)} to ${label(rule.to)}.`);
}

// Named reviewers are distinct members of the route's team other than the caller.
async function checkReviewers(ids: number[], teamId: number, callerId: number, transaction: Transaction): Promise<void> {
  const fail = (message: string) => new AppError('VALIDATION', message, { fields: { reviewerIds: message } });
  if (new Set(ids).size !== ids.length) throw fail('Name each reviewer once.');
  if (ids.includes(callerId)) throw fail('Name someone other than yourself as reviewer.');
  const members = await getDb().models.Membership.findAll({ where: { teamId, userId: { [Op.in]: ids } }, attributes: ['userId'], transaction });
  const found = new Set(members.map((m) => m.userId));
  const strangers = ids.filter((id) => !found.has(id));
  if (strangers.length) throw fail(`Reviewers must be members of this team (not: ${strangers.join(', ')}).`);
}

/** Moves a route's review status if the table allows it for the caller's role and the caller saw the latest version. */
export async function transitionRoute({
  teamId,
  userId,
  role,
  routeId,
  input,
}: {
  teamId: number;
  userId: number;
  role: Role;
  routeId: number;
  input: TransitionInput;
}): Promise<TransitionOutcome> {
  return getDb().sequelize.transaction(async (transaction) => {
    const route = await findRouteRow({ teamId, routeId, transaction, locked: true });
    if (route.version !== input.version) {
      throw new AppError('CONFLICT', `This route changed elsewhere (now version ${route.version}; you saw version ${input.version}).`, {
        details: { currentVersion: route.version, status: route.status },
      });
    }
    const from = route.status;
    const rule = findRule(from, input.to);
    if (!rule || !isRouteStatus(from)) throw notAllowed(from, input.to, role);
    if (!can(role, rule.permission)) throw forbidden(rule);
    const fields = transitionFieldErrors(input);
    const reviewerIds = input.reviewerIds ?? [];
    if (input.to !== 'in_review' && reviewerIds.length > 0) fields.reviewerIds = 'Reviewers are named only when sending a route for review.';
    if (Object.keys(fields).length) throw new AppError('VALIDATION', 'Some fields need attention.', { fields });
    if (input.to === 'in_review') await checkReviewers(reviewerIds, teamId, userId, transaction);

    await route.update({ status: input.to, version: route.version + 1 }, { transaction });
    const outcome = await recordTransition({ route, from: from as RouteStatus, to: input.to, actorId: userId, note: input.note, reviewerIds, transaction });
    await recordEvent(
      { teamId, actorId: userId, action: 'route.transitioned', targetType: 'route', targetId: routeId, data: { from, to: input.to, reviewerIds } },
      transaction,
    );
    return outcome;
  });
}
