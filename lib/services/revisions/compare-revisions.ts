import 'server-only';
import { findRouteRow } from '../routes/get-route';
import { findRevisionRow } from './get-revision';
import { diffRevisions } from './revision-diff';
import { toRevisionState, toRevisionSummary } from './revision-dto';
import { diffStepLabels, readableSummary } from './revision-labels';

export async function compareRevisions({ teamId, routeId, fromId, toId }: { teamId: number; routeId: number; fromId: number; toId: number }) {
  await findRouteRow({ teamId, routeId });
  const [from, to] = await Promise.all([
    findRevisionRow({ teamId, routeId, revisionId: fromId }),
    findRevisionRow({ teamId, routeId, revisionId: toId }),
  ]);
  const [a, b] = [toRevisionState(from), toRevisionState(to)];
  return {
    from: toRevisionSummary(from, undefined, readableSummary(from.summary, a.snapshot)),
    to: toRevisionSummary(to, undefined, readableSummary(to.summary, b.snapshot)),
    diff: diffRevisions(a, b),
    /** each step's label ("Step 2 (water–gas shift)"): as numbered in the newer revision, or in the older for removed steps */
    stepLabels: diffStepLabels(a.snapshot, b.snapshot),
  };
}
