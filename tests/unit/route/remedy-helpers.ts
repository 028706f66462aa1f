// Pulls one step's remedies of each kind out of a single-step route.
import { evaluateRoute, type ConditionsRemedy, type CouplingRemedy, type DriverReaction, type RouteEvaluateRequest, type RouteStep, type TemperatureRemedy } from '@/lib/thermo/route';
import { nbsLookup } from '@/lib/thermo/species-library';

export function single(target: string, step: Omit<RouteStep, 'id'>, extra: Partial<RouteEvaluateRequest> = {}, drivers?: DriverReaction[]) {
  const r = evaluateRoute({ target, steps: [{ id: 'x', ...step }], ...extra }, { lookup: nbsLookup, ...(drivers ? { drivers } : {}) });
  const s = r.steps[0]!;
  return {
    route: r,
    step: s,
    temperature: s.remedies.filter((m): m is TemperatureRemedy => m.kind === 'temperature'),
    conditions: s.remedies.filter((m): m is ConditionsRemedy => m.kind === 'conditions'),
    coupling: s.remedies.filter((m): m is CouplingRemedy => m.kind === 'coupling'),
  };
}
