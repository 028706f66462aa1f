// Why the route totals wait, said for people: step ids become labels ("Step 2 (methanol synthesis)"), the engine's
// field prefixes become words, and a reason that belongs to the target or its amount is also said at that field.
// Pure: the route overview, the ladder caption and the route settings form share it.
import type { RouteProblem } from '../thermo/route/route-types';
import { relabelStepIds, type StepLabel } from './step-label';

/** The route settings field a totals problem belongs to, or null when it is about the links or the steps. */
export type TotalsWaitField = 'target' | 'targetAmount';

/**
 * The field to mark: the amount when it cannot be read or is out of bounds, the target when the engine cannot read it
 * as a species (its message starts "target: "). "No step makes the target yet" is a route still being built, not a
 * wrong target: the overview and the ladder say it, the field stays unmarked.
 */
export function totalsWaitField(problem: Pick<RouteProblem, 'field' | 'message'> | null | undefined): TotalsWaitField | null {
  if (problem?.field === 'targetAmount') return 'targetAmount';
  if (problem?.field === 'target' && /^target: /.test(problem.message)) return 'target';
  return null;
}

/** The engine's reason in words: "Target: …", "The target amount must be above 0 mol", step ids as labels. */
export function totalsWaitReason(problem: Pick<RouteProblem, 'message'>, labels: ReadonlyMap<string, StepLabel>): string {
  const text = problem.message
    .replace(/^target: /, 'Target: ')
    .replace(/^targetAmount: /, 'Target amount: ')
    .replace(/^targetAmount /, 'The target amount ')
    .replace(/ as a amount\b/, ' as an amount');
  return relabelStepIds(text, labels);
}

/** What the target or amount field says while the totals wait because of it: the reason and the engine's hint. */
export function totalsWaitFieldMessage(problem: Pick<RouteProblem, 'message' | 'hint'>, labels: ReadonlyMap<string, StepLabel>): string {
  const reason = totalsWaitReason(problem, labels).replace(/^(Target|Target amount): /, '');
  const sentence = reason.charAt(0).toUpperCase() + reason.slice(1);
  return `${sentence}${problem.hint ? ` (${problem.hint})` : ''}. The route totals wait until this is fixed.`;
}
