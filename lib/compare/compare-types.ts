// Shapes of a route comparison: per route its ladder and metrics, which route is best per row, shared steps.
import type { WhatIf } from '../schemas/compare';
import type { SpeciesProvenance } from '../thermo/evaluate';
import type { RouteWarning, StepClass } from '../thermo/route';

/** What the comparison keeps of each species of a step: who it is, its drawing, and where its values came from. */
export type ComparedSpecies = Pick<SpeciesProvenance, 'key' | 'as_written' | 'name' | 'formula' | 'nu' | 'origin' | 'source' | 'smiles' | 'sigma_dfG_kJ'> & { method: string | null };

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
  /** σ(ΔrG°) per mol of reaction as written, kJ/mol; null when none is known (or the step failed) */
  sigma_kJ: number | null;
  /** the step's species with their origins ([] when the step failed) */
  species: ComparedSpecies[];
  /** the engine's message for a step it could not evaluate */
  error: string | null;
}

export interface RouteLadder {
  order: string[];
  steps: LadderStep[];
  /** σ of the route's total ΔG per mol of target (route-sigma.ts); null when no step has a σ; absent in older answers */
  overallSigma_kJ?: number | null;
  /** |total ΔG| ≤ σ: within the data uncertainty the total could have either sign */
  overallSignUncertain?: boolean;
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
