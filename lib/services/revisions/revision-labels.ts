// Revision text people read names steps by label, never by id. Summaries written before labels carry ids
// ("T of s-8ab5e2fd 500 → 650 K", "moved s1, s2"); they are relabelled at read time from that revision's own
// document, so the numbers are the ones the route had then. Pure.
import { relabelStepIds, stepLabels, type StepLabel } from '../../route-editor/step-label';
import type { RouteSnapshot } from './revision-snapshot';

// Where an older summary put a step id: after "of " (a field of a step) or in the "moved a, b" list.
const ID_PLACES = '(?:\\bof |\\bmoved |, )';
// Newer summaries say "of Step 3 (…)" and "2 steps moved on the board": those never need the snapshot.
const OLD_STYLE = /(?:\bof |\bmoved )(?!Step \d)/;

/** Whether a stored summary may name steps by id (and so needs its revision's document to be read). */
export function mayNameStepIds(summary: string): boolean {
  return OLD_STYLE.test(summary);
}

export function readableSummary(summary: string, snapshot: Pick<RouteSnapshot, 'steps' | 'links'>): string {
  if (!mayNameStepIds(summary)) return summary;
  return relabelStepIds(summary, stepLabels(snapshot.steps, snapshot.links), ID_PLACES);
}

/**
 * Labels for a diff between two revisions: steps of the newer one as they are numbered there, and steps only
 * the older one had as they were numbered then.
 */
export function diffStepLabels(from: Pick<RouteSnapshot, 'steps' | 'links'>, to: Pick<RouteSnapshot, 'steps' | 'links'>): Record<string, string> {
  const before: Map<string, StepLabel> = stepLabels(from.steps, from.links);
  const after: Map<string, StepLabel> = stepLabels(to.steps, to.links);
  const out: Record<string, string> = {};
  for (const [id, label] of before) out[id] = label.full;
  for (const [id, label] of after) out[id] = label.full;
  return out;
}
