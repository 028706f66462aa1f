import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { buildComparison, type RouteForComparison } from '../../compare/build-comparison';
import type { Comparison } from '../../compare/compare-types';
import { applyWhatIf } from '../../compare/what-if';
import type { WhatIf } from '../../schemas/compare';
import { ThermoError } from '../../thermo/errors';
import { evaluateRoute, type RouteEvaluateRequest } from '../../thermo/route';
import type { SpeciesLookup } from '../../thermo/species-library';
import { listDrivers } from '../drivers/list-drivers';
import { fitOverrides } from '../fits/fit-overrides';
import { toRouteEvaluateRequest } from '../routes/evaluate-route-document';
import { readLinkInputs, readStepInputs } from '../routes/read-route-rows';
import { toRouteDocument } from '../routes/route-dto';
import { teamLookup } from '../species/team-lookup';
import { reviewCounts } from './review-counts';

const quoted = (names: string[]) => names.map((n) => `“${n}”`).join(', ');

// The routes in the order asked for: a missing, deleted or foreign id is 404, an archived route 400.
async function loadRoutes(teamId: number, ids: number[], transaction?: Transaction) {
  const { Route, User } = getDb().models;
  const rows = await Route.findAll({
    where: { id: { [Op.in]: ids }, teamId, deletedAt: null },
    include: [{ model: User, as: 'updatedBy', attributes: ['name'] }],
    transaction,
  });
  const byId = new Map(rows.map((r) => [r.id, r]));
  const missing = ids.filter((id) => !byId.has(id));
  if (missing.length) throw new AppError('NOT_FOUND', `No such route: ${missing.join(', ')}.`);
  const archived = rows.filter((r) => r.archivedAt !== null);
  if (archived.length) {
    const message = `${quoted(archived.map((r) => r.name))} ${archived.length === 1 ? 'is' : 'are'} archived. Unarchive ${archived.length === 1 ? 'it' : 'them'} to compare.`;
    throw new AppError('VALIDATION', message, { fields: { ids: message } });
  }
  return Promise.all(
    ids.map(async (id) => {
      const row = byId.get(id)!;
      const [steps, links] = await Promise.all([readStepInputs(id, transaction), readLinkInputs(id, transaction)]);
      return { row, doc: toRouteDocument(row, steps, links), updatedBy: (row.get('updatedBy') as { name: string } | null)?.name ?? '—' };
    }),
  );
}

function evaluateOutcome(request: RouteEvaluateRequest, drivers: Awaited<ReturnType<typeof listDrivers>>, lookup: SpeciesLookup): RouteForComparison['outcome'] {
  try {
    return { evaluation: evaluateRoute(request, { drivers, lookup }) };
  } catch (error) {
    // A route the engine refuses as a whole (no steps, a cycle) stays in the comparison with its reason.
    if (error instanceof ThermoError) return { error: { code: error.code, message: error.message, field: error.field ?? null } };
    throw error;
  }
}

/** Evaluates 2–4 routes of the team under one what-if, never saving, and puts them side by side. */
export async function compareRoutes({ teamId, ids, whatIf = {}, transaction }: { teamId: number; ids: number[]; whatIf?: WhatIf; transaction?: Transaction }): Promise<Comparison> {
  const loaded = await loadRoutes(teamId, ids, transaction);
  const [drivers, counts, lookup] = await Promise.all([listDrivers({ teamId }), reviewCounts({ teamId, routeIds: ids, transaction }), teamLookup(teamId, transaction)]);
  const fits = await fitOverrides({ teamId, steps: loaded.flatMap((l) => l.doc.steps), transaction });
  const prepared = loaded.map(({ row, doc, updatedBy }) => {
    const { request, problems } = applyWhatIf(toRouteEvaluateRequest(doc, fits) as RouteEvaluateRequest, whatIf);
    return { row, doc, updatedBy, request, problems };
  });
  const problems = prepared.flatMap((p) => p.problems.map((x) => `${p.doc.name}: ${x.message}`));
  if (problems.length) {
    const message = `The temperature offset takes steps to 0 K or below (${problems.slice(0, 3).join('; ')}${problems.length > 3 ? '; …' : ''}).`;
    throw new AppError('VALIDATION', message, { fields: { 'whatIf.temperatureOffset_K': message } });
  }
  const routes: RouteForComparison[] = prepared.map(({ row, doc, updatedBy, request }) => ({
    id: doc.id,
    name: doc.name,
    target: doc.target,
    targetAmount: doc.targetAmount,
    status: doc.status,
    version: doc.version,
    archived: doc.archived,
    updatedAt: doc.updatedAt,
    updatedBy,
    stepCount: row.stepCount === doc.steps.length ? row.stepCount : doc.steps.length,
    ...counts.get(doc.id)!,
    request,
    outcome: evaluateOutcome(request, drivers, lookup),
  }));
  return buildComparison(routes, whatIf, lookup);
}
