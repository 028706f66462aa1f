'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { DataTable } from '@/components/tables/data-table';
import { deletedRouteColumns } from '@/components/tables/deleted-route-columns';
import { TablePagination } from '@/components/tables/table-pagination';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/queries/api-fetch';
import { deletedRouteListQuery, routeKeys, UNDELETE_DAYS, undeleteRoute } from '@/lib/queries/routes';
import type { DeletedRouteDto } from '@/lib/services/routes/list-deleted-routes';

const NO_SORTING: never[] = [];

// Leads only: routes deleted within the undo window, each with an Undo delete button.
export function DeletedRoutes() {
  const queryClient = useQueryClient();
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(25);
  const [message, setMessage] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const deleted = useQuery(deletedRouteListQuery({ page, pageSize }));

  const undo = useMutation({
    mutationFn: (route: DeletedRouteDto) => undeleteRoute(route.id),
    onSuccess: (_data, route) => {
      setMessage({ tone: 'success', text: `“${route.name}” is back in the routes list.` });
      if (items.length === 1 && page > 1) setPage(page - 1); // the page would be empty
      return queryClient.invalidateQueries({ queryKey: routeKeys.lists() });
    },
    onError: (error) => setMessage({ tone: 'error', text: error instanceof ApiError ? error.message : 'That did not work. Try again.' }),
  });
  const busyRouteId = undo.isPending ? (undo.variables?.id ?? null) : null;
  const columns = useMemo(
    () =>
      deletedRouteColumns({
        busyRouteId,
        onUndelete: (route) => {
          setMessage(null);
          undo.mutate(route);
        },
      }),
    // undo.mutate is stable; the mutation object is not.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [busyRouteId, undo.mutate],
  );

  const items = deleted.data?.items ?? [];
  return (
    <section aria-labelledby="deleted-routes-heading" className="flex flex-col gap-3">
      <h2 id="deleted-routes-heading" className="text-base font-semibold text-ink">
        Recently deleted
      </h2>
      <div aria-live="polite">{message ? <Notice tone={message.tone}>{message.text}</Notice> : null}</div>
      {deleted.isPending ? (
        <p className="py-6 text-sm text-ink-soft" role="status">
          Loading deleted routes…
        </p>
      ) : deleted.isError ? (
        <Notice tone="error" title="Deleted routes could not be loaded">
          {deleted.error.message}{' '}
          <button type="button" className="underline" onClick={() => deleted.refetch()}>
            Try again
          </button>
        </Notice>
      ) : items.length === 0 ? (
        <EmptyState title="Nothing deleted lately">{`Routes deleted in the last ${UNDELETE_DAYS} days appear here, and you can bring them back.`}</EmptyState>
      ) : (
        <>
          <p className="text-sm text-ink-soft">{`Deleted routes can be brought back for ${UNDELETE_DAYS} days after deletion.`}</p>
          <DataTable
            caption="Recently deleted routes of your team"
            data={items}
            columns={columns}
            sorting={NO_SORTING}
            onSortingChange={() => undefined}
            getRowId={(route) => String(route.id)}
            isBusy={deleted.isFetching}
          />
          <TablePagination
            page={page}
            pageSize={pageSize}
            total={deleted.data.total}
            noun="deleted routes"
            onPageChange={setPage}
            onPageSizeChange={(size) => {
              setPageSize(size);
              setPage(1);
            }}
          />
        </>
      )}
    </section>
  );
}
