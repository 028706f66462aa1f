// Shapes of a route comparison: per route its ladder and metrics, which route is best per row, shared steps.
import type { WhatIf } from '../schemas/compare';
import type { RouteWarning, StepClass } from '../thermo/route';

export interface LadderStep {
  id: string;
  /** as saved on the step */
  equation: string;
  /** the normalised equation shared steps are matched by; null when the equation cannot be read */
  equationKey: string | null;
  class: StepClass;
  /** per mol of target (null: the step has no extent or failed) */
  deltaG_kJ: number | null;
  deltaG0_kJ: number | null;
  cumulative_kJ: number;
  cumulative0_kJ: number;
  temperature_K: number | null;
  signUncertain: boolean;
  /** ΔG uses at least one estimated species (group contribution, not measured) */
  estimated: boolean;
  /** the engine's message for a step it could not evaluate */
  error: string | null;
}

export interface RouteLadder {
  order: string[];
  steps: LadderStep[];
  warnings: RouteWarning[];
}

export interface RouteMetrics {
  /** per mol of target; null when the route as a whole could not be evaluated */
  overallDeltaG_kJ: number | null;
  overallDeltaG0_kJ: number | null;
  stepCount: number;
  uphillSteps: number | null;
  marginalSteps: number | null;
  /** steps the engine could not evaluate (left out of the totals) */
  errorSteps: number | null;
  /** ξ·ΔG of the most uphill step, per mol of target; null when no step is uphill */
  largestUphill_kJ: number | null;
  /** min over steps of −ΔG per mol of reaction as written (the basis of the step classes) */
  smallestDrivingForce_kJ: number | null;
  temperatureMin_K: number | null;
  temperatureMax_K: number | null;
  /** names of the drivers the coupling remedies of uphill steps use, each once */
  driversNeeded: string[];
  /** uphill steps for which no driver gives a coupling remedy */
  uncoupledUphillSteps: number | null;
  /**
   * steps whose ΔG uses at least one estimated species (group contribution, not measured); null when the route
   * could not be evaluated, absent from decisions recorded before the row existed
   */
  estimatedSteps?: number | null;
  openFlags: number;
  unresolvedComments: number;
  status: string;
  updatedAt: string;
  updatedBy: string;
}

export type MetricKey =
  | 'overallDeltaG_kJ'
  | 'overallDeltaG0_kJ'
  | 'stepCount'
  | 'uphillSteps'
  | 'marginalSteps'
  | 'largestUphill_kJ'
  | 'smallestDrivingForce_kJ'
  | 'estimatedSteps'
  | 'temperatureSpan'
  | 'driversNeeded'
  | 'openFlags'
  | 'unresolvedComments'
  | 'status'
  | 'updatedAt'
  | 'updatedBy';

export interface ComparedRoute {
  id: number;
  name: string;
  target: string;
  targetAmount: string;
  status: string;
  /** the saved route's version (the workflow's moves ask for it) */
  version: number;
  archived: boolean;
  updatedAt: string;
  updatedBy: string;
  /** null when the engine refused the route as a whole (no steps, a cycle); `error` says why */
  ladder: RouteLadder | null;
  error: { code: string; message: string; field: string | null } | null;
  metrics: RouteMetrics;
}

export interface SharedEquation {
  /** the normalised equation */
  equation: string;
  routes: { routeId: number; stepIds: string[] }[];
}

export interface Comparison {
  whatIf: WhatIf;
  routes: ComparedRoute[];
  /** per metric row, the ids of the routes holding its best value (ties share it; [] when no route qualifies) */
  best: Record<MetricKey, number[]>;
  sharedEquations: SharedEquation[];
  caution: string;
}

/** What the decision log keeps of a comparison. */
export interface ComparisonSnapshot {
  whatIf: WhatIf;
  routes: { id: number; name: string; status: string; metrics: RouteMetrics }[];
  best: Record<MetricKey, number[]>;
  sharedEquations: SharedEquation[];
}
