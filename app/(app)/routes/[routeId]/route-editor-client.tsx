'use client';

import { useQuery } from '@tanstack/react-query';
import { can } from '@/lib/auth/permissions';
import type { Role } from '@/lib/auth/roles';
import { useProfile } from '@/lib/queries/me';
import { routeDetailQuery } from '@/lib/queries/routes';
import { draftOf } from '@/lib/route-editor/route-draft';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import { RouteEditorStoreProvider } from '@/stores/route-editor-store';
import { ArchivedNotice } from './_components/archived-notice';
import { RouteEditor } from './_components/route-editor';
import { NewSpeciesDialogProvider } from './_components/new-species-dialog';

export function RouteEditorClient({ initialRoute, role, teamId, selfId }: { initialRoute: RouteDocumentDto; role: Role; teamId: number; selfId: number }) {
  const { data: profile } = useProfile();
  const { data: route = initialRoute } = useQuery({ ...routeDetailQuery(initialRoute.id), initialData: initialRoute });
  const preferences = profile?.preferences ?? { energyUnit: 'kJ', temperatureUnit: 'K', pressureUnit: 'bar' };
  const mayEdit = can(role, 'route.edit');
  // The store reads the route only when it mounts; later server copies arrive through autosave or
  // "Reload theirs". Unarchiving remounts it (a new key) on the unarchived copy and its new version.
  const editorKey = route.archived ? 'archived' : 'live';

  return (
    <div className="flex flex-col gap-3">
      {route.archived ? <ArchivedNotice routeId={route.id} canUnarchive={mayEdit} /> : null}
      <RouteEditorStoreProvider key={editorKey} initialDoc={draftOf(route)} initialVersion={route.version}>
        {/* On the board, "New species from a structure" opens over it (new-species-dialog.tsx) instead of leaving it. */}
        <NewSpeciesDialogProvider enabled={mayEdit && !route.archived}>
          <RouteEditor routeId={route.id} canEdit={mayEdit && !route.archived} units={preferences} review={{ teamId, selfId, role, status: route.status, archived: route.archived }} />
        </NewSpeciesDialogProvider>
      </RouteEditorStoreProvider>
    </div>
  );
}
