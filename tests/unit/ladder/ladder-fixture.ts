// A real route evaluation for the ladder and panel tests: an uphill step linked to a downhill one,
// a step the engine cannot read, and a step with no path to the target (no extent); and a step on estimated values.
import { evaluateRoute, type RouteEvaluateResponse } from '@/lib/thermo/route';
import { builtinLookup, nbsLookup } from '@/lib/thermo/species-library';
import { loadChem } from '@/lib/thermo/structure/chem';
import { structureLookup } from '@/lib/thermo/structure/structure-lookup';

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

/**
 * A route on estimated values: an isopropanol-coupled ketone reduction in water at 30 °C (acetophenone to
 * (S)-1-phenylethanol; every organic solute estimated), evaluated at 90 % conversion. ΔG° is a few kJ/mol either
 * way of zero (K of order 1 is common practice for this coupled reduction), well inside its σ of ~14 kJ/mol.
 */
export async function estimatedEvaluation(): Promise<RouteEvaluateResponse> {
  const lookup = structureLookup(builtinLookup, await loadChem());
  return evaluateRoute({
    target: 'alcohol',
    steps: [
      {
        id: 'kred',
        equation: 'ketone + IPA -> alcohol + acetone',
        species: {
          ketone: { smiles: 'CC(=O)c1ccccc1', phase: 'aq' },
          IPA: { smiles: 'CC(C)O', phase: 'aq' },
          alcohol: { smiles: 'C[C@H](O)c1ccccc1', phase: 'aq' },
          acetone: { smiles: 'CC(C)=O', phase: 'aq' },
        },
        temperature: '303.15 K',
        concentrations: { ketone: '10 mmol/L', IPA: '1.3 mol/L', alcohol: '90 mmol/L', acetone: '90 mmol/L' },
      },
    ],
    links: [],
  }, { lookup, remedies: false });
}
