import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { SaveRouteInput } from '../../schemas/route';
import { recordEvent } from '../audit/record-event';
import { fitOverrides } from '../fits/fit-overrides';
import { latestRevisionState, recordRevision, stateOfDocument } from '../revisions/record-revision';
import { recordTransition } from '../workflow/record-transition';
import type { TransitionOutcome } from '../workflow/transition-dto';
import { evaluateRouteDocument, summariseEvaluation } from './evaluate-route-document';
import { getRoute } from './get-route';
import { stepRow } from './route-dto';
import { teamLookup } from '../species/team-lookup';

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

function conflict(currentVersion: number, edited: number): AppError {
  return new AppError('CONFLICT', `This route changed elsewhere (now version ${currentVersion}; you edited version ${edited}).`, {
    details: { currentVersion },
  });
}

/** How a save came about, for its revision: a restore names the revision it brings back. */
export interface SaveOrigin {
  head: string;
  restoredFromId: number;
}

// Saves the whole route document if the caller saw the latest version; otherwise 409 with the current one.
// Every save writes a revision; saving an approved route sends it back to draft, recorded as a move.
export async function saveRoute({ teamId, userId, routeId, input, origin }: { teamId: number; userId: number; routeId: number; input: SaveRouteInput; origin?: SaveOrigin }) {
  assertConsistent(input);
  const lookup = await teamLookup(teamId);
  // A step's fit must be the team's (404 otherwise); its ΔH° and ΔS° go into the cached ΔG.
  const evaluation = evaluateRouteDocument(input, lookup, await fitOverrides({ teamId, steps: input.steps }));
  const summary = summariseEvaluation(input, evaluation);
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const current = await models.Route.findOne({ where: { id: routeId, teamId, deletedAt: null }, transaction });
    if (!current) throw new AppError('NOT_FOUND', 'No such route.');
    if (current.archivedAt) throw new AppError('UNPROCESSABLE', 'This route is archived, so it is read-only. Unarchive it to edit it.');
    if (current.version !== input.version) throw conflict(current.version, input.version);
    const previous = (await latestRevisionState({ routeId, transaction })) ?? stateOfDocument(await getRoute({ teamId, routeId, transaction }), undefined, lookup);
    const wasApproved = current.status === 'approved';
    const [updated] = await models.Route.update(
      {
        name: input.name,
        target: input.target,
        targetAmount: input.targetAmount,
        marginalThresholdKj: input.marginalThreshold_kJ,
        version: input.version + 1,
        updatedById: userId,
        ...(wasApproved ? { status: 'draft' } : {}),
        ...summary,
      },
      { where: { id: routeId, teamId, version: input.version, deletedAt: null }, transaction },
    );
    if (updated === 0) throw conflict(current.version, input.version);
    await models.Step.destroy({ where: { routeId }, transaction });
    await models.StepLink.destroy({ where: { routeId }, transaction });
    await models.Step.bulkCreate(input.steps.map((s, i) => stepRow(s, routeId, i)), { transaction });
    await models.StepLink.bulkCreate(input.links.map((l) => ({ routeId, fromKey: l.from, toKey: l.to, species: l.species })), { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'route.saved', targetType: 'route', targetId: routeId, data: { version: input.version + 1 } }, transaction);
    const route = await getRoute({ teamId, routeId, transaction });
    const revision = await recordRevision({
      doc: route, teamId, userId, evaluation, previous, head: origin?.head, restoredFromId: origin?.restoredFromId ?? null, transaction,
    });
    let transition: TransitionOutcome | null = null;
    if (wasApproved) {
      await current.reload({ transaction });
      transition = await recordTransition({
        route: current, from: 'approved', to: 'draft', actorId: userId, note: `Edited after approval (revision ${route.version}); back to draft for review.`, transaction,
      });
    }
    return { route, evaluation, revision, transition };
  });
}
