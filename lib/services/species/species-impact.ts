import 'server-only';
import type { Transaction } from 'sequelize';
import { stepLabels } from '../../route-editor/step-label';
import type { SpeciesLookup } from '../../thermo/species-library';
import { evaluateRouteDocument } from '../routes/evaluate-route-document';
import { getRoute } from '../routes/get-route';
import { speciesUses } from './species-usage';

export interface StepChange {
  stepKey: string;
  /** how people name the step: "Step 3 (ethanol dehydrogenation)" */
  label: string;
  before_kJ: number | null;
  after_kJ: number | null;
}

export interface RouteImpact {
  routeId: number;
  routeName: string;
  /** ΔG of the whole route (under its conditions), kJ; null when the engine refuses the route */
  overallBefore_kJ: number | null;
  overallAfter_kJ: number | null;
  steps: StepChange[];
}

// Below this a change is rounding, not a change anyone would act on.
const CHANGED_KJ = 1e-9;

function stepEnergies(evaluation: ReturnType<typeof evaluateRouteDocument>): Map<string, number | null> {
  if ('error' in evaluation) return new Map();
  return new Map(evaluation.steps.map((s) => [s.id, s.deltaG_kJ ?? s.deltaG0_kJ]));
}

const differ = (a: number | null | undefined, b: number | null | undefined) =>
  (a ?? null) === null || (b ?? null) === null ? (a ?? null) !== (b ?? null) : Math.abs(a! - b!) > CHANGED_KJ;

/** The team's routes that use any of `keys`, with each step's ΔG before and after a change of lookup. */
export async function speciesImpact({
  teamId, keys, before, after, transaction,
}: { teamId: number; keys: ReadonlySet<string>; before: SpeciesLookup; after: SpeciesLookup; transaction?: Transaction }): Promise<RouteImpact[]> {
  // A species may be used under either lookup (a new team species can make a step resolve differently).
  const [usesBefore, usesAfter] = await Promise.all([
    speciesUses({ teamId, lookup: before, keys, transaction }),
    speciesUses({ teamId, lookup: after, keys, transaction }),
  ]);
  const routeIds = new Set([...usesBefore.values(), ...usesAfter.values()].flat().map((u) => u.routeId));
  const out: RouteImpact[] = [];
  for (const routeId of [...routeIds].sort((a, b) => a - b)) {
    const doc = await getRoute({ teamId, routeId, transaction });
    const b = evaluateRouteDocument(doc, before);
    const a = evaluateRouteDocument(doc, after);
    const eb = stepEnergies(b);
    const ea = stepEnergies(a);
    const labels = stepLabels(doc.steps, doc.links);
    const steps = doc.steps
      .map((s) => ({ stepKey: s.id, label: labels.get(s.id)!.full, before_kJ: eb.get(s.id) ?? null, after_kJ: ea.get(s.id) ?? null }))
      .sort((a, b) => labels.get(a.stepKey)!.number - labels.get(b.stepKey)!.number)
      .filter((s) => differ(s.before_kJ, s.after_kJ));
    const overallBefore = 'error' in b || b.totalsWithheld ? null : b.overall.deltaG_kJ;
    const overallAfter = 'error' in a || a.totalsWithheld ? null : a.overall.deltaG_kJ;
    if (steps.length || differ(overallBefore, overallAfter)) {
      out.push({ routeId, routeName: doc.name, overallBefore_kJ: overallBefore, overallAfter_kJ: overallAfter, steps });
    }
  }
  return out;
}
