import 'server-only';
import type { Transaction } from 'sequelize';
import type { Route } from '../../../db/models/route';
import { AppError } from '../../api/errors';
import { can } from '../../auth/permissions';
import type { Role } from '../../auth/roles';
import type { RouteStatus } from '../../schemas/workflow';
import { recordEvent } from '../audit/record-event';
import { recordTransition } from '../workflow/record-transition';
import type { TransitionOutcome } from '../workflow/transition-dto';
import { findRule } from '../workflow/transition-table';

/** Moves each route to shelved by the workflow table's rule, inside the decision's transaction; shelved routes stay as they are. */
export async function shelveCompared({
  routes, teamId, userId, role, note, transaction,
}: { routes: Route[]; teamId: number; userId: number; role: Role; note: string; transaction: Transaction }): Promise<TransitionOutcome[]> {
  const outcomes: TransitionOutcome[] = [];
  for (const route of routes) {
    if (route.status === 'shelved') continue;
    const from = route.status as RouteStatus;
    const rule = findRule(from, 'shelved');
    if (!rule) throw new AppError('CONFLICT', `“${route.name}” is ${from}, and the workflow has no move from there to shelved.`);
    if (!can(role, rule.permission)) throw new AppError('FORBIDDEN', 'Your role in this team cannot shelve routes.');
    await route.update({ status: 'shelved', version: route.version + 1 }, { transaction });
    outcomes.push(await recordTransition({ route, from, to: 'shelved', actorId: userId, note, transaction }));
    await recordEvent({ teamId, actorId: userId, action: 'route.transitioned', targetType: 'route', targetId: route.id, data: { from, to: 'shelved', reviewerIds: [] } }, transaction);
  }
  return outcomes;
}
