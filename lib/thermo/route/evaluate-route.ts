// A multi-step route, evaluated: steps in topological order, each scaled by its extent, running
// totals, classes, remedies for uphill and marginal steps, and safety notes.
import type { EvaluateRequest } from '../../schemas/evaluate';
import type { RouteEvaluateRequest, RouteStep } from '../../schemas/route-evaluate';
import { ThermoError, isThermoError } from '../errors';
import { evaluateStep, type EvaluateResponse } from '../evaluate';
import { assertFiniteNumbers } from '../sanitise';
import type { SpeciesLookup } from '../species-library';
import { isStructureLookup } from '../structure/structure-lookup-type';
import { parseAmount } from '../units';
import { DEFAULT_DRIVERS, prepareDrivers } from './drivers';
import { computeExtents } from './extents';
import { conditionsRemedies } from './remedy-conditions';
import { couplingRemedies, driverCacheKey, type CouplingContext } from './remedy-coupling';
import { driversKey, remedyKey, remedyMemo } from './remedy-memo';
import { temperatureRemedy } from './remedy-temperature';
import { MAX_ROUTE_LINKS, MAX_ROUTE_STEPS, RouteTooLargeError, routeError } from './route-errors';
import { DEFAULT_MARGINAL_THRESHOLD_KJ, MAX_TARGET_AMOUNT_MOL, MIN_YIELD_FRACTION } from './route-limits';
import { withStepLabels } from './route-labels';
import { routeSigma } from './route-sigma';
import { extentsOrProblem, graphOrProblem, noExtents, problemOf } from './totals-withheld';
import type { DriverReaction, Remedy, RouteEvaluateResponse, RouteProblem, RouteStepResult, RouteWarning, StepErrorInfo } from './route-types';
import { classify, stepNotes } from './step-notes';
import { readStoichiometry, speciesKey, type Stoichiometry } from './stoichiometry';

export { DEFAULT_MARGINAL_THRESHOLD_KJ };

export interface RouteOptions {
  /** the library, team species and estimator to resolve species with; always given, never a default */
  lookup: SpeciesLookup;
  drivers?: readonly DriverReaction[];
  /** false skips the remedy searches, for callers that need only the ladder and totals (default true) */
  remedies?: boolean;
}

interface Evaluated {
  request: EvaluateRequest;
  nu: Stoichiometry | null;
  result: EvaluateResponse | null;
  error: StepErrorInfo | null;
}

function stepRequest(step: RouteStep): EvaluateRequest {
  const { id: _id, yield: _yield, ...request } = step;
  return request;
}

function errorInfo(err: ThermoError, index: number): StepErrorInfo {
  return { code: err.code, message: err.message, field: err.field ? `steps.${index}.${err.field}` : null };
}

/** The lookup with a species map's labels; only a lookup that knows structures can take one. */
function labelled(lookup: SpeciesLookup, species: EvaluateRequest['species'], field: string): SpeciesLookup {
  if (!species || Object.keys(species).length === 0) return lookup;
  if (!isStructureLookup(lookup)) throw new ThermoError('INVALID_VALUE', 'species definitions need the chemistry toolkit, which this caller did not load', { field });
  return lookup.withLabels(species, field);
}

function evaluateOne(step: RouteStep, index: number, lookup: SpeciesLookup): Evaluated {
  const request = stepRequest(step);
  let stepLookup: SpeciesLookup;
  try {
    stepLookup = labelled(lookup, request.species, 'species');
  } catch (err) {
    if (!isThermoError(err)) throw err;
    return { request, nu: null, result: null, error: errorInfo(err, index) };
  }
  // evaluateStep applies the step's labels again itself, so remedies that re-evaluate the request see them too.
  const { nu } = readStoichiometry(request.equation, stepLookup);
  try {
    return { request, nu, result: evaluateStep(request, { lookup, checkFinite: false }), error: null };
  } catch (err) {
    if (!isThermoError(err)) throw err;
    return { request, nu, result: null, error: errorInfo(err, index) };
  }
}

/** The target amount, or (when it cannot be read or is out of bounds) why the totals wait: the steps do not need it. */
function readAmount(request: RouteEvaluateRequest): { amount: number; problem: RouteProblem | null } {
  try {
    const amount = parseAmount(request.targetAmount ?? '1 mol', 'targetAmount');
    if (!(amount > 0)) throw routeError('targetAmount must be above 0 mol', 'targetAmount', 'e.g. "1 mol"');
    if (amount > MAX_TARGET_AMOUNT_MOL) throw routeError(`targetAmount must be at most ${MAX_TARGET_AMOUNT_MOL} mol`, 'targetAmount', 'e.g. "1 mol"');
    return { amount, problem: null };
  } catch (err) {
    if (!isThermoError(err)) throw err;
    return { amount: 1, problem: problemOf(err) };
  }
}

function readInputs(request: RouteEvaluateRequest): { threshold: number; yields: number[] } {
  const { steps } = request;
  if (!Array.isArray(steps) || steps.length === 0) {
    throw routeError('A route needs at least one step', 'steps', 'add the steps of the route');
  }
  if (steps.length > MAX_ROUTE_STEPS) throw new RouteTooLargeError('steps', steps.length, MAX_ROUTE_STEPS);
  const links = request.links ?? [];
  if (links.length > MAX_ROUTE_LINKS) throw new RouteTooLargeError('links', links.length, MAX_ROUTE_LINKS);
  const threshold = request.marginalThreshold_kJ ?? DEFAULT_MARGINAL_THRESHOLD_KJ;
  if (!Number.isFinite(threshold) || threshold > 0) {
    throw routeError('marginalThreshold_kJ must be a finite number ≤ 0', 'marginalThreshold_kJ', 'e.g. -17 (≈ K = 10^3 at 298 K)');
  }
  const yields = steps.map((s, i) => {
    const y = s.yield ?? 1;
    if (!Number.isFinite(y) || y < MIN_YIELD_FRACTION || y > 1) {
      throw routeError(`steps[${i}].yield must be a fraction with ${MIN_YIELD_FRACTION} ≤ yield ≤ 1`, `steps.${i}.yield`, 'e.g. 0.9 for 90 %');
    }
    return y;
  });
  return { threshold, yields };
}

function checkTarget(target: string, lookup: SpeciesLookup): void {
  try {
    speciesKey(target, lookup);
  } catch (err) {
    if (isThermoError(err)) throw new ThermoError(err.code, `target: ${err.message}`, { field: 'target', ...(err.hint ? { hint: err.hint } : {}) });
    throw err;
  }
}

/**
 * `goal_kJ` is 0 for an uphill step and the threshold for a marginal one; the temperature search always aims at
 * `threshold_kJ`, the downhill boundary, since a temperature that only crosses zero leaves the step marginal.
 */
function computeRemedies(e: Evaluated, goal_kJ: number, threshold_kJ: number, ctx: CouplingContext): Remedy[] {
  const r = e.result!;
  // Fitted ΔH°, ΔS° get condition remedies only: the temperature search and coupling sums read the library's species.
  if (e.request.override) return conditionsRemedies(e.request, r, goal_kJ, ctx.lookup);
  return [
    temperatureRemedy(e.request, r, threshold_kJ, ctx.lookup),
    ...conditionsRemedies(e.request, r, goal_kJ, ctx.lookup),
    ...(e.nu ? couplingRemedies(e.request, r, e.nu, goal_kJ, ctx) : []),
  ];
}

function remediesFor(e: Evaluated, goal_kJ: number, threshold_kJ: number, ctx: CouplingContext, drivers: string): Remedy[] {
  const memo = remedyMemo(ctx.lookup);
  const key = remedyKey(e.request, `${goal_kJ}|${threshold_kJ}`, drivers);
  const hit = memo.get(key);
  if (hit) {
    for (const [id, why] of hit.failed) ctx.failed.set(id, why);
    return hit.remedies;
  }
  const remedies = computeRemedies(e, goal_kJ, threshold_kJ, ctx);
  // The drivers that failed at this step's temperature, whichever step first met the failure.
  const T = e.result!.temperature_K;
  const failed = ctx.drivers
    .filter((d) => ctx.failed.has(d.driver.id) && ctx.cache.get(driverCacheKey(d, e.request, T)) === null)
    .map((d): [string, string] => [d.driver.id, ctx.failed.get(d.driver.id)!]);
  memo.set(key, { remedies, failed });
  return remedies;
}

/**
 * Energies are for `targetAmount` of the target (per mol of target with the default 1 mol). Steps come
 * back in `order`. A target no step makes yet, several final steps, an unknown target or links that loop
 * do not fail the route: every step keeps its own result and `totalsWithheld` says why the totals wait. A step without an extent (disconnected, unknown) or with an error is left out of
 * the totals; its cumulative values carry the running sum. Classes, counts, remedies and
 * smallestDrivingForce_kJ use ΔG per mol of reaction as written; largestUphill_kJ uses ξ·ΔG.
 */
export function evaluateRoute(request: RouteEvaluateRequest, opts: RouteOptions): RouteEvaluateResponse {
  const lookup = labelled(opts.lookup, request.species, 'species');
  const { threshold, yields } = readInputs(request);
  const { amount, problem: amountProblem } = readAmount(request);
  // The target and links may name a label the steps define; each step still evaluates with its own map only.
  const routeLookup = withStepLabels(lookup, request.steps);
  const ids = request.steps.map((s) => s.id);
  // A loop or a link to a missing step holds back the totals; each step is still evaluated on its own.
  const linked = graphOrProblem(ids, request.links ?? []);
  const { graph } = linked;
  const links = linked.problem ? [] : (request.links ?? []);
  const evaluated = request.steps.map((s, i) => evaluateOne(s, i, lookup));
  const withheld = linked.problem ?? amountProblem;
  const totals = withheld
    ? { ext: noExtents(ids), problem: withheld }
    : extentsOrProblem(ids, () => {
        checkTarget(request.target, routeLookup);
        return computeExtents({ graph, links, nu: evaluated.map((e) => e.nu), yields, target: request.target, targetAmount_mol: amount, lookup: routeLookup });
      });
  const ext = totals.ext;
  const drivers = prepareDrivers(opts.drivers ?? DEFAULT_DRIVERS, lookup);
  const ctx: CouplingContext = { drivers: drivers.prepared, lookup, cache: new Map(), failed: new Map() };
  const driverSet = driversKey(drivers.prepared);

  let cumulative = 0;
  let cumulative0 = 0;
  const steps: RouteStepResult[] = graph.order.map((i) => {
    const e = evaluated[i]!;
    const id = graph.ids[i]!;
    const r = e.result;
    const xi = ext.extents[i] ?? null;
    const perMol = r ? (r.deltaG_kJ ?? r.deltaG0_kJ) : null;
    const cls = perMol === null ? 'error' : classify(perMol, threshold);
    const counted = r !== null && xi !== null;
    const dG = counted ? xi * perMol! : null;
    const dG0 = counted ? xi * r.deltaG0_kJ : null;
    if (dG !== null) cumulative += dG;
    if (dG0 !== null) cumulative0 += dG0;
    const needsRemedy = cls === 'uphill' || cls === 'marginal';
    return {
      id,
      result: r,
      error: e.error,
      extent_mol: xi,
      deltaG_kJ: dG,
      deltaG0_kJ: dG0,
      cumulative_kJ: cumulative,
      cumulative0_kJ: cumulative0,
      class: cls,
      signUncertain: r?.uncertainty.signUncertain ?? false,
      remedies: needsRemedy && opts.remedies !== false ? remediesFor(e, cls === 'uphill' ? 0 : threshold, threshold, ctx, driverSet) : [],
      notes: r ? stepNotes(r, xi, lookup) : [],
    };
  });

  const perMolAll = steps.filter((s) => s.result).map((s) => s.result!.deltaG_kJ ?? s.result!.deltaG0_kJ);
  const uphillScaled = steps.filter((s) => s.class === 'uphill' && s.deltaG_kJ !== null).map((s) => s.deltaG_kJ!);
  const warnings: RouteWarning[] = [...ext.warnings, ...drivers.warnings];
  const failedSteps = steps.filter((s) => s.class === 'error').map((s) => s.id);
  if (failedSteps.length > 0) {
    warnings.push({ code: 'STEP_ERROR', message: `Could not evaluate ${failedSteps.join(', ')}; the totals leave ${failedSteps.length === 1 ? 'it' : 'them'} out`, steps: failedSteps });
  }
  for (const [id, why] of ctx.failed) warnings.push({ code: 'DRIVER_INVALID', message: `Driver ${id}: ${why}; not used`, steps: [] });
  const sigma = routeSigma(steps, cumulative);

  return assertFiniteNumbers({
    order: graph.order.map((i) => graph.ids[i]!),
    steps,
    overall: {
      deltaG_kJ: cumulative,
      deltaG0_kJ: cumulative0,
      uphillSteps: steps.filter((s) => s.class === 'uphill').length,
      marginalSteps: steps.filter((s) => s.class === 'marginal').length,
      largestUphill_kJ: uphillScaled.length ? Math.max(...uphillScaled) : null,
      smallestDrivingForce_kJ: perMolAll.length ? Math.min(...perMolAll.map((g) => -g)) : null,
      overallSigma_kJ: sigma.sigma_kJ,
      overallSignUncertain: sigma.signUncertain,
      overallSigmaUpperBound: sigma.upperBound,
    },
    warnings,
    totalsWithheld: totals.problem,
  });
}
