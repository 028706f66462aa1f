import 'server-only';
import { Op } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { Role } from '../../auth/roles';
import { snapshotOf } from '../../compare/build-comparison';
import type { DecisionInput } from '../../schemas/decision';
import { recordEvent } from '../audit/record-event';
import { compareRoutes } from '../compare/compare-routes';
import { forUpdate } from '../row-lock';
import { notifyTransition } from '../workflow/notify-transition';
import type { TransitionOutcome } from '../workflow/transition-dto';
import { getDecision } from './list-decisions';
import { shelveCompared } from './shelve-compared';

/**
 * Records the lead's choice with the comparison recomputed here, optionally shelves the other routes,
 * and supersedes the team's current decisions about any of the same routes, all in one transaction.
 * The comparison is worked out first, outside the write; a route saved in between answers 409.
 */
export async function recordDecision({ teamId, userId, role, input }: { teamId: number; userId: number; role: Role; input: DecisionInput }) {
  const comparison = await compareRoutes({ teamId, ids: input.routeIds, whatIf: input.whatIf ?? {} });
  const compared = new Map(comparison.routes.map((r) => [r.id, r]));
  const { sequelize, models } = getDb();
  const { decisionId, outcomes } = await sequelize.transaction(async (transaction) => {
    const rows = await models.Route.findAll({
      where: { id: { [Op.in]: input.routeIds }, teamId, deletedAt: null, archivedAt: null },
      order: [['id', 'ASC']], // one lock order for every writer, so two decisions cannot deadlock
      ...forUpdate(transaction),
    });
    const changed = input.routeIds.filter((id) => rows.find((r) => r.id === id)?.version !== compared.get(id)!.version);
    if (changed.length) {
      throw new AppError('CONFLICT', `${changed.map((id) => `“${compared.get(id)!.name}”`).join(', ')} changed while the decision was being recorded. Compare again and decide.`);
    }
    const others = rows.filter((r) => r.id !== input.chosenRouteId);
    const decision = await models.Decision.create(
      {
        teamId,
        chosenRouteId: input.chosenRouteId,
        routeIds: input.routeIds,
        shelvedRouteIds: input.shelveOthers ? others.filter((r) => r.status !== 'shelved').map((r) => r.id) : [],
        rationale: input.rationale,
        snapshot: snapshotOf(comparison),
        authorId: userId,
      },
      { transaction },
    );
    const chosenName = compared.get(input.chosenRouteId)!.name;
    const outcomes: TransitionOutcome[] = input.shelveOthers
      ? await shelveCompared({ routes: others, teamId, userId, role, note: `Shelved by decision #${decision.id}: the group goes on with “${chosenName}”.`, transaction })
      : [];
    const current = await models.Decision.findAll({ where: { teamId, supersededById: null, id: { [Op.ne]: decision.id } }, attributes: ['id', 'routeIds'], transaction });
    const overlapping = current.filter((d) => d.routeIds.some((id) => input.routeIds.includes(id))).map((d) => d.id);
    if (overlapping.length) await models.Decision.update({ supersededById: decision.id }, { where: { id: { [Op.in]: overlapping }, teamId }, transaction });
    await recordEvent(
      { teamId, actorId: userId, action: 'decision.recorded', targetType: 'decision', targetId: decision.id, data: { chosenRouteId: input.chosenRouteId, routeIds: input.routeIds, superseded: overlapping } },
      transaction,
    );
    return { decisionId: decision.id, outcomes };
  });
  // Notices go out only after the decision has committed; notifyTransition never throws.
  for (const outcome of outcomes) await notifyTransition(outcome);
  return { decision: await getDecision({ teamId, decisionId }), caution: comparison.caution };
}
