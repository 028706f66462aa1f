'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { routeKeys, setRouteArchived } from '@/lib/queries/routes';

// An archived route is read-only; an editor may bring it back to the list and edit it again.
export function ArchivedNotice({ routeId, canUnarchive }: { routeId: number; canUnarchive: boolean }) {
  const queryClient = useQueryClient();
  const unarchive = useMutation({
    mutationFn: () => setRouteArchived(routeId, false),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: routeKeys.all }),
  });
  return (
    <Notice tone="caution" title="Archived: this route is read-only until it is unarchived.">
      <div className="flex flex-wrap items-center gap-2">
        {canUnarchive ? (
          <Button variant="secondary" disabled={unarchive.isPending} onClick={() => unarchive.mutate()}>
            {unarchive.isPending ? 'Unarchiving…' : 'Unarchive'}
          </Button>
        ) : null}
        {unarchive.isError ? <span>Could not unarchive: {unarchive.error.message}</span> : null}
      </div>
    </Notice>
  );
}
