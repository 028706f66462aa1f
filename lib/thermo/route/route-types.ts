// Shapes of a route evaluation: per-step results, remedies, notes and the route totals.
import type { ThermoErrorCode } from '../errors';
import type { EvaluateResponse } from '../evaluate';

export type StepClass = 'downhill' | 'marginal' | 'uphill' | 'error';

export type RouteWarningCode =
  | 'LINK_SPECIES'
  /** a link whose species is made in one phase and used in another: refused, with the phase change to add */
  | 'LINK_PHASE'
  | 'DISCONNECTED'
  | 'EXTENT_UNKNOWN'
  | 'STEP_ERROR'
  | 'DRIVER_INVALID';

export interface RouteWarning {
  code: RouteWarningCode;
  message: string;
  steps: string[];
  species?: string[];
}

export interface StepNote {
  code: 'HEAT_RELEASE' | 'GAS_EVOLUTION';
  message: string;
  /** ΔH° in kJ per mol of reaction (HEAT_RELEASE) or Δn(gas) per mol of reaction (GAS_EVOLUTION) */
  value: number;
}

export interface StepErrorInfo {
  code: ThermoErrorCode;
  message: string;
  field: string | null;
}

/** A problem with the route as a whole (target, links): the steps are evaluated, the totals wait. */
export interface RouteProblem {
  code: ThermoErrorCode;
  message: string;
  /** the request field it belongs to ("target", "links", "links.0.to"), or null */
  field: string | null;
  hint: string | null;
  /** the engine's details, e.g. `cycle` (step ids), `candidates`, `suggestions` */
  details?: Record<string, unknown>;
}

export interface TemperatureSample {
  T_K: number;
  deltaG0_kJ: number;
  /** at the step's pressures and concentrations; null when the step gives none */
  deltaG_kJ: number | null;
}

export interface TemperatureRemedy {
  kind: 'temperature';
  summary: string;
  direction: 'raise' | 'lower' | null;
  current_K: number;
  /** ΔG per mol of reaction to get below: 0 for uphill steps, the threshold for marginal ones */
  goal_kJ: number;
  /** where ΔG°(T) = 0 (the engine's, lowest in the data range) */
  crossover_K: number | null;
  /** nearest T where ΔG at the step's conditions reaches goal_kJ */
  target_K: number | null;
  /** a whole kelvin just past target_K, re-evaluated */
  suggested_K: number | null;
  suggestedDeltaG_kJ: number | null;
  /** warning codes of the engine at suggested_K (phase changes, data range) */
  warningsAtSuggested: string[];
  dataRange_K: [number, number] | null;
  samples: TemperatureSample[];
}

export type ConditionsAction = 'product-pressure' | 'remove-product' | 'reactant-excess' | 'out-of-reach';

export interface ConditionMapsOut {
  pressures?: Record<string, string>;
  concentrations?: Record<string, string>;
}

export interface ConditionsRemedy {
  kind: 'conditions';
  action: ConditionsAction;
  species: string | null;
  summary: string;
  goal_kJ: number;
  lnQ_current: number;
  /** largest ln Q with ΔG < goal_kJ at the step's temperature */
  lnQ_max: number;
  activity_current: number | null;
  activity_target: number | null;
  /** n-fold excess (reactants) or n-fold reduction (products) of the activity */
  factor: number | null;
  value: number | null;
  unit: 'bar' | 'mol/L' | null;
  /** the step's pressures and concentrations with this change applied */
  conditions: ConditionMapsOut | null;
  /** ΔG per mol of reaction re-evaluated with `conditions` */
  checkedDeltaG_kJ: number | null;
}

export interface CouplingRemedy {
  kind: 'coupling';
  summary: string;
  note: string;
  driverId: string;
  driverName: string;
  driverEquation: string;
  /** smallest multiple of the driver in 0.5 steps */
  multiple: number;
  /** the real multiple that brings ΔG exactly to goal_kJ */
  exactMultiple: number;
  goal_kJ: number;
  stepDeltaG_kJ: number;
  driverDeltaG0_kJ: number;
  combinedEquation: string;
  combinedDeltaG_kJ: number;
  /** the step's pressures and concentrations used for the combined equation (species still in it) */
  conditions: ConditionMapsOut | null;
  warnings: string[];
  /** how plausible a partner the driver is for this step (route/coupling-partners.ts); the list is ranked by it */
  partnerScore: number;
  /** the score in words: shared species, same phase, an unstable state at T */
  partnerReasons: string[];
}

export type Remedy = TemperatureRemedy | ConditionsRemedy | CouplingRemedy;

export interface DriverReaction {
  id: string;
  name: string;
  equation: string;
  basis: string;
}

export interface RouteStepResult {
  id: string;
  result: EvaluateResponse | null;
  error: StepErrorInfo | null;
  /** mol of reaction as written; null when the step has no path to the target or its extent is unknown */
  extent_mol: number | null;
  deltaG_kJ: number | null;
  deltaG0_kJ: number | null;
  cumulative_kJ: number;
  cumulative0_kJ: number;
  class: StepClass;
  signUncertain: boolean;
  remedies: Remedy[];
  notes: StepNote[];
}

export interface RouteOverall {
  deltaG_kJ: number;
  deltaG0_kJ: number;
  uphillSteps: number;
  marginalSteps: number;
  largestUphill_kJ: number | null;
  smallestDrivingForce_kJ: number | null;
  /** σ of deltaG_kJ: the counted steps' ξ·σ(ΔrG°) in quadrature (route-sigma.ts); null when no step has a σ */
  overallSigma_kJ: number | null;
  /** |deltaG_kJ| ≤ overallSigma_kJ: within the data uncertainty the total could have either sign */
  overallSignUncertain: boolean;
  /** the quadrature sum over-states σ (shared intermediates partly cancel, or a step's σ is an upper bound) */
  overallSigmaUpperBound: boolean;
}

export interface RouteEvaluateResponse {
  order: string[];
  steps: RouteStepResult[];
  /** sums over the counted steps; meaningless (zero) while totalsWithheld is set */
  overall: RouteOverall;
  warnings: RouteWarning[];
  /** why the route totals wait for a complete route (no step makes the target yet, a loop): null once they stand */
  totalsWithheld: RouteProblem | null;
}
