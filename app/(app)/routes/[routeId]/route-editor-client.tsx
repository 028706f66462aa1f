'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { can } from '@/lib/auth/permissions';
import type { Role } from '@/lib/auth/roles';
import { useProfile } from '@/lib/queries/me';
import { routeDetailQuery } from '@/lib/queries/routes';
import { draftOf } from '@/lib/route-editor/route-draft';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import { RouteEditorStoreProvider } from '@/stores/route-editor-store';
import { RouteEditor } from './_components/route-editor';

export function RouteEditorClient({ initialRoute, role }: { initialRoute: RouteDocumentDto; role: Role }) {
  const { data: profile } = useProfile();
  const { data: route = initialRoute } = useQuery({ ...routeDetailQuery(initialRoute.id), initialData: initialRoute });
  // The draft starts from the route as first loaded; later server copies arrive through autosave or "Reload theirs".
  const [initial] = useState(() => ({ doc: draftOf(route), version: route.version }));
  const preferences = profile?.preferences ?? { energyUnit: 'kJ', temperatureUnit: 'K', pressureUnit: 'bar' };
  const canEdit = can(role, 'route.edit');

  return (
    <RouteEditorStoreProvider initialDoc={initial.doc} initialVersion={initial.version}>
      <RouteEditor routeId={route.id} canEdit={canEdit} units={preferences} />
    </RouteEditorStoreProvider>
  );
}
