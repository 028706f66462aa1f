import 'server-only';
import { getDb } from '../../../db';
import type { StepInput } from '../../schemas/route';
import type { RouteImportInput } from '../../schemas/route-transfer';
import { DEFAULT_MARGINAL_THRESHOLD_KJ } from '../../thermo/route/route-limits';
import { recordEvent } from '../audit/record-event';
import { recordRevision } from '../revisions/record-revision';
import { evaluateRouteDocument, summariseEvaluation } from './evaluate-route-document';
import { getRoute } from './get-route';
import { stepRow } from './route-dto';
import { teamLookup } from '../species/team-lookup';

// A yield of 0.07 must come back as 7 %, not 7.000000000000001.
const percent = (fraction: number) => Math.round(fraction * 100 * 1e9) / 1e9;

/** The board's document for a route file: the header restores name, positions and notes. */
export function routeFileToDocument(input: RouteImportInput) {
  const header = input.stepwell;
  const steps: StepInput[] = input.steps.map(({ id, yield: y, volume: _v, fugacityCoefficients: _f, activityCoefficients: _a, ...fields }, i) => ({
    id,
    ...fields,
    yieldPct: percent(y ?? 1),
    notes: header?.notes?.[id] ?? '',
    // Without a header the steps go in a row, in file order.
    position: header?.positions?.[id] ?? { x: i * 320, y: 0 },
  }));
  return {
    name: header?.name ?? `Imported route to ${input.target}`,
    target: input.target,
    targetAmount: input.targetAmount ?? '1 mol',
    marginalThreshold_kJ: input.marginalThreshold_kJ ?? DEFAULT_MARGINAL_THRESHOLD_KJ,
    steps,
    links: input.links ?? [],
  };
}

/** Creates the route in the caller's team in one transaction, with its first revision. */
export async function importRoute({ teamId, userId, input }: { teamId: number; userId: number; input: RouteImportInput }) {
  const doc = routeFileToDocument(input);
  const evaluation = evaluateRouteDocument(doc, await teamLookup(teamId));
  const summary = summariseEvaluation(doc, evaluation);
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const route = await models.Route.create(
      {
        teamId, name: doc.name, target: doc.target, targetAmount: doc.targetAmount, marginalThresholdKj: doc.marginalThreshold_kJ,
        createdById: userId, updatedById: userId, ...summary,
      },
      { transaction },
    );
    await models.Step.bulkCreate(doc.steps.map((s, i) => stepRow(s, route.id, i)), { transaction });
    await models.StepLink.bulkCreate(doc.links.map((l) => ({ routeId: route.id, fromKey: l.from, toKey: l.to, species: l.species })), { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'route.imported', targetType: 'route', targetId: route.id, data: { steps: doc.steps.length } }, transaction);
    const saved = await getRoute({ teamId, routeId: route.id, transaction });
    await recordRevision({ doc: saved, teamId, userId, evaluation, previous: null, head: 'Imported from a route file', transaction });
    return saved;
  });
}
