// One route's ladder essentials and metric column, from its evaluation. Pure.
import type { RouteEvaluateRequest, RouteEvaluateResponse } from '../thermo/route';
import { countEstimatedSteps, stepEstimates } from '../thermo/route/step-estimates';
import type { SpeciesLookup } from '../thermo/species-library';
import { parseTemperature } from '../thermo/units';
import type { LadderStep, RouteLadder, RouteMetrics } from './compare-types';
import { normaliseEquation } from './shared-steps';
import { DEFAULT_STEP_TEMPERATURE } from './what-if';

export interface RouteFacts {
  status: string;
  updatedAt: string;
  updatedBy: string;
  stepCount: number;
  openFlags: number;
  unresolvedComments: number;
}

const perTarget = (v: number | null, targetMol: number) => (v === null ? null : v / targetMol);

function stepTemperature(request: RouteEvaluateRequest, stepId: string, evaluated: number | undefined): number | null {
  if (evaluated !== undefined) return evaluated;
  const step = request.steps.find((s) => s.id === stepId);
  try {
    return parseTemperature(step?.temperature ?? DEFAULT_STEP_TEMPERATURE);
  } catch {
    return null;
  }
}

/** The ladder in the engine's order, energies divided down to one mol of target. */
export function ladderOf(request: RouteEvaluateRequest, evaluation: RouteEvaluateResponse, targetMol: number, lookup: SpeciesLookup): RouteLadder {
  const equations = new Map(request.steps.map((s) => [s.id, s.equation]));
  const steps: LadderStep[] = evaluation.steps.map((s) => {
    const equation = equations.get(s.id) ?? '';
    return {
      id: s.id,
      equation,
      equationKey: normaliseEquation(equation, lookup),
      class: s.class,
      deltaG_kJ: perTarget(s.deltaG_kJ, targetMol),
      deltaG0_kJ: perTarget(s.deltaG0_kJ, targetMol),
      cumulative_kJ: s.cumulative_kJ / targetMol,
      cumulative0_kJ: s.cumulative0_kJ / targetMol,
      temperature_K: stepTemperature(request, s.id, s.result?.temperature_K),
      signUncertain: s.signUncertain,
      estimated: stepEstimates(s.result) !== null,
      sigma_kJ: s.result?.uncertainty.deltaG0_kJ ?? null,
      species: (s.result?.species ?? []).map((p) => ({
        key: p.key, as_written: p.as_written, name: p.name, formula: p.formula, nu: p.nu, origin: p.origin, source: p.source, smiles: p.smiles,
        sigma_dfG_kJ: p.sigma_dfG_kJ, method: p.method ?? null,
      })),
      error: s.error?.message ?? null,
    };
  });
  const sigma = evaluation.overall.overallSigma_kJ;
  return {
    order: evaluation.order, steps, warnings: evaluation.warnings,
    overallSigma_kJ: sigma === null || sigma === undefined ? null : sigma / targetMol, overallSignUncertain: evaluation.overall.overallSignUncertain === true,
  };
}

function driversOf(evaluation: RouteEvaluateResponse): { names: string[]; uncoupled: number } {
  const names: string[] = [];
  let uncoupled = 0;
  for (const step of evaluation.steps) {
    if (step.class !== 'uphill') continue;
    const coupling = step.remedies.filter((r) => r.kind === 'coupling');
    if (coupling.length === 0) uncoupled += 1;
    for (const r of coupling) if (!names.includes(r.driverName)) names.push(r.driverName);
  }
  return { names, uncoupled };
}

function span(ladder: RouteLadder | null): { min: number | null; max: number | null } {
  const temps = (ladder?.steps ?? []).map((s) => s.temperature_K).filter((t): t is number => t !== null);
  return temps.length ? { min: Math.min(...temps), max: Math.max(...temps) } : { min: null, max: null };
}

/** The metric column; energy rows are null for a route the engine refused as a whole. */
export function metricsOf(facts: RouteFacts, evaluated: { evaluation: RouteEvaluateResponse; ladder: RouteLadder; targetMol: number } | null): RouteMetrics {
  const base = {
    stepCount: facts.stepCount,
    openFlags: facts.openFlags,
    unresolvedComments: facts.unresolvedComments,
    status: facts.status,
    updatedAt: facts.updatedAt,
    updatedBy: facts.updatedBy,
  };
  if (!evaluated) {
    return {
      ...base,
      overallDeltaG_kJ: null, overallDeltaG0_kJ: null, uphillSteps: null, marginalSteps: null, errorSteps: null,
      largestUphill_kJ: null, smallestDrivingForce_kJ: null, temperatureMin_K: null, temperatureMax_K: null,
      driversNeeded: [], uncoupledUphillSteps: null, estimatedSteps: null,
    };
  }
  const { evaluation: e, ladder, targetMol } = evaluated;
  const drivers = driversOf(e);
  const t = span(ladder);
  return {
    ...base,
    overallDeltaG_kJ: e.overall.deltaG_kJ / targetMol,
    overallDeltaG0_kJ: e.overall.deltaG0_kJ / targetMol,
    uphillSteps: e.overall.uphillSteps,
    marginalSteps: e.overall.marginalSteps,
    errorSteps: e.steps.filter((s) => s.class === 'error').length,
    largestUphill_kJ: perTarget(e.overall.largestUphill_kJ, targetMol),
    smallestDrivingForce_kJ: e.overall.smallestDrivingForce_kJ,
    temperatureMin_K: t.min,
    temperatureMax_K: t.max,
    driversNeeded: drivers.names,
    uncoupledUphillSteps: drivers.uncoupled,
    estimatedSteps: countEstimatedSteps(e.steps),
  };
}
