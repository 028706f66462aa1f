// One what-if for every step of a route: a temperature offset and/or a common standard pressure. Pure; the saved route is untouched.
import type { WhatIf } from '../schemas/compare';
import { isThermoError } from '../thermo/errors';
import type { RouteEvaluateRequest } from '../thermo/route';
import { parseTemperature } from '../thermo/units';
import { withTrueMinus } from '../format/numbers';
import { stepLabels } from '../route-editor/step-label';

/** The engine's default step temperature. */
export const DEFAULT_STEP_TEMPERATURE = '298.15 K';

export interface WhatIfProblem {
  stepId: string;
  message: string;
}

export function isEmptyWhatIf(whatIf: WhatIf | undefined): boolean {
  return !whatIf || ((whatIf.temperatureOffset_K ?? 0) === 0 && whatIf.standardPressure === undefined);
}

// Kelvin to 6 decimals, so an offset never adds floating-point noise to the request.
function kelvin(T: number): string {
  return `${Number(T.toFixed(6))} K`;
}

/** The request with the what-if applied, and the steps it would take to 0 K or below. */
export function applyWhatIf(request: RouteEvaluateRequest, whatIf: WhatIf | undefined): { request: RouteEvaluateRequest; problems: WhatIfProblem[] } {
  if (isEmptyWhatIf(whatIf)) return { request, problems: [] };
  const offset = whatIf!.temperatureOffset_K ?? 0;
  const problems: WhatIfProblem[] = [];
  // The message is read by people: a step by its label ("Step 2 (…)"), never its id.
  const labels = stepLabels(request.steps, request.links ?? []);
  const steps = request.steps.map((step) => {
    const next = { ...step, ...(whatIf!.standardPressure ? { standardPressure: whatIf!.standardPressure } : {}) };
    if (offset === 0) return next;
    let T: number;
    try {
      T = parseTemperature(step.temperature ?? DEFAULT_STEP_TEMPERATURE);
    } catch (error) {
      // An unreadable temperature stays as it is; the engine reports it on the step.
      if (isThermoError(error)) return next;
      throw error;
    }
    const shifted = T + offset;
    if (!(shifted > 0)) {
      const label = labels.get(step.id)?.full ?? 'a step';
      problems.push({ stepId: step.id, message: withTrueMinus(`${label} at ${Number(T.toFixed(2))} K would go to ${Number(shifted.toFixed(2))} K`) });
      return next;
    }
    return { ...next, temperature: kelvin(shifted) };
  });
  return { request: { ...request, steps }, problems };
}
