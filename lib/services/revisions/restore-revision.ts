import 'server-only';
import { AppError } from '../../api/errors';
import { SaveRouteInput } from '../../schemas/route';
import { findRouteRow } from '../routes/get-route';
import { saveRoute } from '../routes/save-route';
import { findRevisionRow } from './get-revision';

// Brings an old revision back as the current document through the normal save, so it becomes a new revision itself.
export async function restoreRevision({ teamId, userId, routeId, revisionId, version }: { teamId: number; userId: number; routeId: number; revisionId: number; version: number }) {
  await findRouteRow({ teamId, routeId });
  const row = await findRevisionRow({ teamId, routeId, revisionId });
  // A snapshot that today's rules refuse (tightened limits) cannot be saved as is.
  const parsed = SaveRouteInput.safeParse({ ...(JSON.parse(row.snapshot) as object), version });
  if (!parsed.success) {
    throw new AppError('UNPROCESSABLE', `Revision ${row.version} no longer passes today's checks for a route, so it cannot be restored as is.`);
  }
  return saveRoute({ teamId, userId, routeId, input: parsed.data, origin: { head: `Restored revision ${row.version}`, restoredFromId: row.id } });
}
