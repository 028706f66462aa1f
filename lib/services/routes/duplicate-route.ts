import 'server-only';
import { getDb } from '../../../db';
import { recordEvent } from '../audit/record-event';
import { latestRevisionState, recordRevision, stateOfDocument } from '../revisions/record-revision';
import { getRoute } from './get-route';
import { stepRow } from './route-dto';
import { teamLookup } from '../species/team-lookup';

// An alternative starts as a full copy that remembers where it came from; its revision 1 says so.
export async function duplicateRoute({ teamId, userId, routeId, name }: { teamId: number; userId: number; routeId: number; name?: string }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const source = await getRoute({ teamId, routeId, transaction });
    const sourceRow = await models.Route.findByPk(routeId, { transaction });
    const copy = await models.Route.create(
      {
        teamId,
        name: name ?? `${source.name} (alternative)`,
        target: source.target,
        targetAmount: source.targetAmount,
        marginalThresholdKj: source.marginalThreshold_kJ,
        originRouteId: source.id,
        createdById: userId,
        updatedById: userId,
        stepCount: sourceRow?.stepCount ?? source.steps.length,
        overallDgKj: sourceRow?.overallDgKj ?? null,
        uphillSteps: sourceRow?.uphillSteps ?? null,
      },
      { transaction },
    );
    await models.Step.bulkCreate(source.steps.map((s, i) => stepRow(s, copy.id, i)), { transaction });
    await models.StepLink.bulkCreate(source.links.map((l) => ({ routeId: copy.id, fromKey: l.from, toKey: l.to, species: l.species })), { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'route.duplicated', targetType: 'route', targetId: copy.id, data: { from: routeId } }, transaction);
    const doc = await getRoute({ teamId, routeId: copy.id, transaction });
    // The copy's energies are the source's: the newest revision holds them, else the source is evaluated once.
    const energies = (await latestRevisionState({ routeId, transaction })) ?? stateOfDocument(source, undefined, await teamLookup(teamId, transaction));
    await recordRevision({
      doc, teamId, userId, evaluation: null, previous: null, head: `Duplicated from ${source.name}`, transaction,
      energies: { stepDeltaG: energies.stepDeltaG, overallDeltaG_kJ: energies.overallDeltaG_kJ },
    });
    return doc;
  });
}
