import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { SaveRouteInput } from '../../schemas/route';
import { recordEvent } from '../audit/record-event';
import { evaluateRouteDocument, summariseEvaluation } from './evaluate-route-document';
import { getRoute } from './get-route';
import { stepRow } from './route-dto';

function assertConsistent(input: SaveRouteInput): void {
  const keys = new Set<string>();
  for (const step of input.steps) {
    if (keys.has(step.id)) throw new AppError('VALIDATION', `Two steps share the id "${step.id}".`, { fields: { steps: 'Step ids must be unique.' } });
    keys.add(step.id);
  }
  for (const link of input.links) {
    if (!keys.has(link.from) || !keys.has(link.to)) {
      throw new AppError('VALIDATION', `A link joins a step that is not in the route (${link.from} → ${link.to}).`, { fields: { links: 'Links must join steps of this route.' } });
    }
  }
}

// Saves the whole route document if the caller saw the latest version; otherwise 409 with the current one.
export async function saveRoute({ teamId, userId, routeId, input }: { teamId: number; userId: number; routeId: number; input: SaveRouteInput }) {
  assertConsistent(input);
  const evaluation = evaluateRouteDocument(input);
  const summary = summariseEvaluation(input, evaluation);
  const { sequelize, models } = getDb();
  const route = await sequelize.transaction(async (transaction) => {
    const [updated] = await models.Route.update(
      {
        name: input.name,
        target: input.target,
        targetAmount: input.targetAmount,
        marginalThresholdKj: input.marginalThreshold_kJ,
        version: input.version + 1,
        updatedById: userId,
        ...summary,
      },
      { where: { id: routeId, teamId, version: input.version }, transaction },
    );
    if (updated === 0) {
      const current = await models.Route.findOne({ where: { id: routeId, teamId }, attributes: ['version'], transaction });
      if (!current) throw new AppError('NOT_FOUND', 'No such route.');
      throw new AppError('CONFLICT', `This route changed elsewhere (now version ${current.version}; you edited version ${input.version}).`, {
        details: { currentVersion: current.version },
      });
    }
    await models.Step.destroy({ where: { routeId }, transaction });
    await models.StepLink.destroy({ where: { routeId }, transaction });
    await models.Step.bulkCreate(input.steps.map((s, i) => stepRow(s, routeId, i)), { transaction });
    await models.StepLink.bulkCreate(input.links.map((l) => ({ routeId, fromKey: l.from, toKey: l.to, species: l.species })), { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'route.saved', targetType: 'route', targetId: routeId, data: { version: input.version + 1 } }, transaction);
    return getRoute({ teamId, routeId, transaction });
  });
  return { route, evaluation };
}
