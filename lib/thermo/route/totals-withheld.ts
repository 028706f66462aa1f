// Route-level problems that hold back the totals but not the steps: a target no step makes (yet), several final
// steps, an unknown target, links that loop or name a missing step. Each step is still evaluated on its own.
import { isThermoError, type ThermoError } from '../errors';
import type { RouteLink } from '../../schemas/route-evaluate';
import { isRouteTooLargeError } from './route-errors';
import { buildRouteGraph, checkStepIds, type RouteGraph } from './route-graph';
import type { ExtentResult } from './extents';
import type { RouteProblem } from './route-types';

export function problemOf(err: ThermoError): RouteProblem {
  return { code: err.code, message: err.message, field: err.field ?? null, hint: err.hint ?? null, ...(err.details ? { details: err.details } : {}) };
}

/** Only engine errors about the route as a whole become problems; anything else still throws. */
function asProblem(err: unknown): RouteProblem {
  if (!isThermoError(err) || isRouteTooLargeError(err)) throw err;
  return problemOf(err);
}

/** The linked graph, or (when the links loop or name a missing step) the steps alone in input order. */
export function graphOrProblem(ids: readonly string[], links: readonly RouteLink[]): { graph: RouteGraph; problem: RouteProblem | null } {
  // Bad or repeated step ids are not a route-level problem: the request itself is malformed.
  checkStepIds(ids);
  try {
    return { graph: buildRouteGraph(ids, links), problem: null };
  } catch (err) {
    return { graph: buildRouteGraph(ids, []), problem: asProblem(err) };
  }
}

export function noExtents(ids: readonly string[]): ExtentResult {
  return { finalStep: -1, extents: ids.map(() => null), connected: ids.map(() => false), warnings: [] };
}

/** Extents when the route has a target its steps make; otherwise none, and why. */
export function extentsOrProblem(ids: readonly string[], compute: () => ExtentResult): { ext: ExtentResult; problem: RouteProblem | null } {
  try {
    return { ext: compute(), problem: null };
  } catch (err) {
    return { ext: noExtents(ids), problem: asProblem(err) };
  }
}
