import 'server-only';
import { findRouteRow } from '../routes/get-route';
import { findRevisionRow } from './get-revision';
import { diffRevisions } from './revision-diff';
import { toRevisionState, toRevisionSummary } from './revision-dto';

export async function compareRevisions({ teamId, routeId, fromId, toId }: { teamId: number; routeId: number; fromId: number; toId: number }) {
  await findRouteRow({ teamId, routeId });
  const [from, to] = await Promise.all([
    findRevisionRow({ teamId, routeId, revisionId: fromId }),
    findRevisionRow({ teamId, routeId, revisionId: toId }),
  ]);
  return { from: toRevisionSummary(from), to: toRevisionSummary(to), diff: diffRevisions(toRevisionState(from), toRevisionState(to)) };
}
