// A real route evaluation for the ladder and panel tests: an uphill step linked to a downhill one,
// a step the engine cannot read, and a step with no path to the target (no extent).
import { evaluateRoute, type RouteEvaluateResponse } from '@/lib/thermo/route';
import { nbsLookup } from '@/lib/thermo/species-library';

export function sampleEvaluation(): RouteEvaluateResponse {
  return evaluateRoute({
    target: 'NH3(g)',
    steps: [
      { id: 'reform', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '298.15 K' },
      { id: 'synth', equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperature: '298.15 K' },
      { id: 'bad', equation: 'Xx(g) -> Yy(g)' },
      { id: 'loose', equation: 'H2(g) + 1/2 O2(g) -> H2O(g)' },
    ],
    links: [{ from: 'reform', to: 'synth', species: 'H2(g)' }],
  }, { lookup: nbsLookup });
}
