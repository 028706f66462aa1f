'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SortingState } from '@tanstack/react-table';
import { useRouter } from 'next/navigation';
import { useMemo, useState } from 'react';
import { CompareSelectionBar, type SelectedRoute } from '@/components/tables/compare-selection-bar';
import { DataTable } from '@/components/tables/data-table';
import { ROUTE_CARD_LAYOUT, ROUTE_NUMERIC_COLUMNS, routeColumns } from '@/components/tables/route-columns';
import { TablePagination } from '@/components/tables/table-pagination';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { can } from '@/lib/auth/permissions';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { ApiError } from '@/lib/queries/api-fetch';
import { activeMembership, useProfile } from '@/lib/queries/me';
import { comparePageHref, deleteRoute, duplicateRoute, routeKeys, routeListQuery, setRouteArchived, UNDELETE_DAYS } from '@/lib/queries/routes';
import { ROUTE_SORTS, type ListRoutesQuery } from '@/lib/schemas/route';
import type { RouteSummaryDto } from '@/lib/services/routes/route-dto';
import { DeleteRouteDialog } from './delete-route-dialog';
import { DeletedRoutes } from './deleted-routes';
import { ImportRouteDialog } from './import-route-dialog';
import { NewRouteDialog } from './new-route-dialog';

type Sort = ListRoutesQuery['sort'];
const isSort = (id: string): id is Sort => (ROUTE_SORTS as readonly string[]).includes(id);

export function RoutesClient() {
  const queryClient = useQueryClient();
  const router = useRouter();
  const { data: profile } = useProfile();
  const role = activeMembership(profile)?.role;
  const canEdit = can(role, 'route.edit');
  const canDelete = can(role, 'route.delete');
  // Seeing and undoing deletions is the lead's call, as on the server.
  const isLead = can(role, 'route.decide');
  const energyUnit = profile?.preferences.energyUnit ?? 'kJ';

  const [search, setSearch] = useState('');
  const q = useDebouncedValue(search.trim(), 300);
  const [sorting, setSorting] = useState<SortingState>([{ id: 'updatedAt', desc: true }]);
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(25);
  const [showArchived, setShowArchived] = useState(false);
  const [isCreating, setIsCreating] = useState(false);
  const [isImporting, setIsImporting] = useState(false);
  const [selected, setSelected] = useState<SelectedRoute[]>([]);
  const [showDeleted, setShowDeleted] = useState(false);
  const [toDelete, setToDelete] = useState<RouteSummaryDto | null>(null);
  const [message, setMessage] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);

  const sortId = sorting[0]?.id ?? 'updatedAt';
  const query: ListRoutesQuery = {
    q: q || undefined,
    sort: isSort(sortId) ? sortId : 'updatedAt',
    dir: sorting[0]?.desc === false ? 'asc' : 'desc',
    page,
    pageSize,
    archived: showArchived ? '1' : '0',
  };
  const routes = useQuery(routeListQuery(query));

  const untick = (id: number) => setSelected((current) => current.filter((r) => r.id !== id));
  const refreshLists = () => queryClient.invalidateQueries({ queryKey: routeKeys.lists() });
  const onError = (error: unknown) => setMessage({ tone: 'error', text: error instanceof ApiError ? error.message : 'That did not work. Try again.' });
  const duplicate = useMutation({
    mutationFn: (route: RouteSummaryDto) => duplicateRoute(route.id, `${route.name} (alternative)`),
    onSuccess: (copy) => {
      setMessage({ tone: 'success', text: `Created “${copy.name}”.` });
      return refreshLists();
    },
    onError,
  });
  const archive = useMutation({
    mutationFn: ({ route, archived }: { route: RouteSummaryDto; archived: boolean }) => setRouteArchived(route.id, archived),
    onSuccess: (_data, { route, archived }) => {
      if (archived) untick(route.id); // an archived route cannot be compared
      setMessage({ tone: 'success', text: `${archived ? 'Archived' : 'Restored'} “${route.name}”.` });
      return refreshLists();
    },
    onError,
  });
  const remove = useMutation({
    mutationFn: (route: RouteSummaryDto) => deleteRoute(route.id),
    onSuccess: (_data, route) => {
      setToDelete(null);
      untick(route.id);
      setMessage({ tone: 'success', text: `Deleted “${route.name}”. ${isLead ? 'You can undo this under “Recently deleted”' : 'A group lead can undo this'} for ${UNDELETE_DAYS} days.` });
      return refreshLists();
    },
  });
  const busyRouteId = remove.isPending ? (remove.variables?.id ?? null) : duplicate.isPending ? (duplicate.variables?.id ?? null) : archive.isPending ? (archive.variables?.route.id ?? null) : null;

  const columns = useMemo(
    () =>
      routeColumns({
        energyUnit,
        canEdit,
        canDelete,
        busyRouteId,
        onDuplicate: (route) => {
          setMessage(null);
          duplicate.mutate(route);
        },
        onArchive: (route, archived) => {
          setMessage(null);
          archive.mutate({ route, archived });
        },
        onDelete: (route) => {
          setMessage(null);
          remove.reset();
          setToDelete(route);
        },
        selection: {
          isSelected: (id) => selected.some((r) => r.id === id),
          onToggle: (route, isOn) =>
            setSelected((current) => (isOn ? [...current.filter((r) => r.id !== route.id), { id: route.id, name: route.name }] : current.filter((r) => r.id !== route.id))),
        },
      }),
    // The mutation objects change every render; their mutate and reset functions are stable.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [energyUnit, canEdit, canDelete, busyRouteId, duplicate.mutate, archive.mutate, remove.reset, selected],
  );

  const items = routes.data?.items ?? [];
  const isFiltered = Boolean(q);

  const listView = (
    <>
      <div aria-live="polite">{message ? <Notice tone={message.tone}>{message.text}</Notice> : null}</div>

      {routes.isPending ? (
        <p className="py-6 text-sm text-ink-soft" role="status">
          Loading routes…
        </p>
      ) : routes.isError ? (
        <Notice tone="error" title="Routes could not be loaded">
          {routes.error.message}{' '}
          <button type="button" className="underline" onClick={() => routes.refetch()}>
            Try again
          </button>
        </Notice>
      ) : items.length === 0 ? (
        <EmptyState
          title={isFiltered ? 'No routes match' : showArchived ? 'No archived routes' : 'No routes yet'}
          action={canEdit && !isFiltered && !showArchived ? <Button onClick={() => setIsCreating(true)}>New route</Button> : undefined}
        >
          {isFiltered
            ? `Nothing has “${q}” in its name or target.`
            : showArchived
              ? 'Archived routes appear here.'
              : canEdit
                ? 'Start a route from its target species, then add the steps that lead there.'
                : 'Designers on your team have not started a route yet.'}
        </EmptyState>
      ) : (
        <>
          <CompareSelectionBar
            selected={selected}
            onCompare={() => router.push(comparePageHref(selected.map((r) => r.id)))}
            onUntick={untick}
            onClear={() => setSelected([])}
          />
          <DataTable
            caption="Routes of your team"
            data={items}
            columns={columns}
            sorting={sorting}
            onSortingChange={(updater) => {
              setSorting(updater);
              setPage(1);
            }}
            getRowId={(route) => String(route.id)}
            numericColumns={ROUTE_NUMERIC_COLUMNS}
            isBusy={routes.isFetching}
            cards={ROUTE_CARD_LAYOUT}
          />
          <TablePagination
            page={page}
            pageSize={pageSize}
            total={routes.data.total}
            noun="routes"
            onPageChange={setPage}
            onPageSizeChange={(size) => {
              setPageSize(size);
              setPage(1);
            }}
          />
        </>
      )}
    </>
  );

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3">
        {showDeleted ? null : (
          <TextField
            label="Search"
            type="search"
            value={search}
            onChange={(e) => {
              setSearch(e.target.value);
              setPage(1);
            }}
            placeholder="Name or target"
            className="w-64"
          />
        )}
        {showDeleted ? null : (
          <label className="flex items-center gap-1.5 pb-1.5 text-sm">
            <input
              type="checkbox"
              checked={showArchived}
              onChange={(e) => {
                setShowArchived(e.target.checked);
                setPage(1);
              }}
              className="accent-pine-600"
            />
            Show archived routes
          </label>
        )}
        {isLead ? (
          <Button
            variant={showDeleted ? 'primary' : 'secondary'}
            aria-pressed={showDeleted}
            onClick={() => {
              setShowDeleted(!showDeleted);
              setMessage(null);
            }}
          >
            Recently deleted
          </Button>
        ) : null}
        <div className="flex-1" />
        {canEdit && !showDeleted ? (
          <>
            <Button variant="secondary" onClick={() => setIsImporting(true)}>
              Import route JSON
            </Button>
            <Button onClick={() => setIsCreating(true)}>New route</Button>
          </>
        ) : null}
      </div>

      {showDeleted ? <DeletedRoutes /> : listView}
      {canEdit ? <NewRouteDialog open={isCreating} onClose={() => setIsCreating(false)} /> : null}
      {canEdit ? <ImportRouteDialog open={isImporting} onClose={() => setIsImporting(false)} /> : null}
      {canDelete ? (
        <DeleteRouteDialog
          route={toDelete}
          isLead={isLead}
          isDeleting={remove.isPending}
          error={remove.error ? (remove.error instanceof ApiError ? remove.error.message : 'That did not work. Try again.') : null}
          onConfirm={() => toDelete && remove.mutate(toDelete)}
          onClose={() => setToDelete(null)}
        />
      ) : null}
    </div>
  );
}
