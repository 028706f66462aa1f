// What a revision stores: the whole route document and the ΔG values of the save that made it. Pure.
import type { LinkInput, StepInput } from '../../schemas/route';
import type { RouteEvaluation } from '../routes/evaluate-route-document';

export interface RouteSnapshot {
  name: string;
  target: string;
  targetAmount: string;
  marginalThreshold_kJ: number;
  steps: StepInput[];
  links: LinkInput[];
}

/** A snapshot with the energies of its save: ΔG per mol of reaction by step key, and the route's overall ΔG. */
export interface RevisionState {
  snapshot: RouteSnapshot;
  stepDeltaG: Record<string, number | null>;
  overallDeltaG_kJ: number | null;
}

export function toSnapshot(doc: RouteSnapshot): RouteSnapshot {
  return {
    name: doc.name,
    target: doc.target,
    targetAmount: doc.targetAmount,
    marginalThreshold_kJ: doc.marginalThreshold_kJ,
    steps: doc.steps,
    links: doc.links,
  };
}

// The per-mol value is the one classes use: ΔG at the step's conditions, else ΔG°.
export function energiesOf(evaluation: RouteEvaluation | null): Pick<RevisionState, 'stepDeltaG' | 'overallDeltaG_kJ'> {
  if (!evaluation || 'error' in evaluation) return { stepDeltaG: {}, overallDeltaG_kJ: null };
  const stepDeltaG: Record<string, number | null> = {};
  for (const step of evaluation.steps) stepDeltaG[step.id] = step.result ? (step.result.deltaG_kJ ?? step.result.deltaG0_kJ) : null;
  // Step energies are kept even while the route's totals wait for a complete route.
  return { stepDeltaG, overallDeltaG_kJ: evaluation.totalsWithheld ? null : evaluation.overall.deltaG_kJ };
}
