// Public API of route evaluation (pure: no database, React or Next imports).
export { evaluateRoute, DEFAULT_MARGINAL_THRESHOLD_KJ, type RouteOptions } from './evaluate-route';
export { DEFAULT_DRIVERS } from './drivers';
export { routeNetEquation } from './net-equation';
export { RouteTooLargeError, isRouteTooLargeError, MAX_ROUTE_STEPS, MAX_ROUTE_LINKS } from './route-errors';
export { HEAT_RELEASE_THRESHOLD_KJ } from './step-notes';
export {
  RouteEvaluateRequestSchema,
  RouteStepSchema,
  RouteLinkSchema,
  type RouteEvaluateRequest,
  type RouteStep,
  type RouteLink,
} from '../../schemas/route-evaluate';
export type {
  RouteEvaluateResponse,
  RouteStepResult,
  RouteOverall,
  RouteWarning,
  RouteWarningCode,
  StepClass,
  StepNote,
  StepErrorInfo,
  Remedy,
  TemperatureRemedy,
  TemperatureSample,
  ConditionsRemedy,
  ConditionsAction,
  ConditionMapsOut,
  CouplingRemedy,
  DriverReaction,
} from './route-types';
