// Puts the evaluated routes side by side: ladders, metric columns, best per row and shared steps. Pure.
import type { WhatIf } from '../schemas/compare';
import type { RouteEvaluateRequest, RouteEvaluateResponse } from '../thermo/route';
import type { SpeciesLookup } from '../thermo/species-library';
import { parseAmount } from '../thermo/units';
import { relabelStepIds, stepLabels } from '../route-editor/step-label';
import { totalsWaitReason } from '../route-editor/totals-wait';
import { bestPerRow } from './best-values';
import type { ComparedRoute, Comparison, ComparisonSnapshot } from './compare-types';
import { ladderOf, metricsOf } from './route-metrics';
import { sharedEquations } from './shared-steps';

export const COMPARE_CAUTION =
  'A comparison ranks routes by a thermodynamic screen only. It says nothing of rates, heat release and runaway, or toxicity: those need their own review before any work at the bench.';

export interface RouteForComparison {
  id: number;
  name: string;
  target: string;
  targetAmount: string;
  status: string;
  version: number;
  archived: boolean;
  updatedAt: string;
  updatedBy: string;
  stepCount: number;
  openFlags: number;
  unresolvedComments: number;
  /** the request as evaluated (what-if applied) */
  request: RouteEvaluateRequest;
  outcome: { evaluation: RouteEvaluateResponse } | { error: { code: string; message: string; field: string | null } };
}

function compareOne(route: RouteForComparison, lookup: SpeciesLookup): ComparedRoute {
  const { outcome, request, openFlags, unresolvedComments, stepCount, ...meta } = route;
  const facts = { status: meta.status, updatedAt: meta.updatedAt, updatedBy: meta.updatedBy, stepCount, openFlags, unresolvedComments };
  const head = {
    id: meta.id, name: meta.name, target: meta.target, targetAmount: meta.targetAmount, status: meta.status, version: meta.version,
    archived: meta.archived, updatedAt: meta.updatedAt, updatedBy: meta.updatedBy,
  };
  // People read these messages: steps by their labels ("Step 2 (…)"), never by their ids.
  const labels = stepLabels(request.steps ?? [], request.links ?? []);
  if ('error' in outcome) return { ...head, ladder: null, error: { ...outcome.error, message: relabelStepIds(outcome.error.message, labels) }, metrics: metricsOf(facts, null) };
  // A route whose totals wait (no step makes the target yet) compares like one the engine refused: no totals.
  const withheld = outcome.evaluation.totalsWithheld;
  if (withheld) return { ...head, ladder: null, error: { code: withheld.code, message: totalsWaitReason(withheld, labels), field: withheld.field }, metrics: metricsOf(facts, null) };
  // The engine has already read targetAmount for this evaluation, so it parses.
  const targetMol = parseAmount(request.targetAmount ?? '1 mol', 'targetAmount');
  const ladder = ladderOf(request, outcome.evaluation, targetMol, lookup);
  return { ...head, ladder, error: null, metrics: metricsOf(facts, { evaluation: outcome.evaluation, ladder, targetMol }) };
}

export function buildComparison(routes: readonly RouteForComparison[], whatIf: WhatIf, lookup: SpeciesLookup): Comparison {
  const compared = routes.map((r) => compareOne(r, lookup));
  return {
    whatIf,
    routes: compared,
    best: bestPerRow(compared.map((r) => ({ id: r.id, evaluated: r.ladder !== null, metrics: r.metrics }))),
    sharedEquations: sharedEquations(compared.map((r) => ({ routeId: r.id, steps: r.ladder?.steps ?? [] }))),
    caution: COMPARE_CAUTION,
  };
}

/** The part of a comparison a decision keeps. */
export function snapshotOf(comparison: Comparison): ComparisonSnapshot {
  return {
    whatIf: comparison.whatIf,
    routes: comparison.routes.map((r) => ({ id: r.id, name: r.name, status: r.status, metrics: r.metrics })),
    best: comparison.best,
    sharedEquations: comparison.sharedEquations,
  };
}
