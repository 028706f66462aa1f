'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useDeferredValue, useId, useMemo, useState } from 'react';
import { DataTable } from '@/components/tables/data-table';
import { SPECIES_NUMERIC_COLUMNS, speciesColumns } from '@/components/tables/species-columns';
import { TablePagination } from '@/components/tables/table-pagination';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { can } from '@/lib/auth/permissions';
import { activeMembership, useProfile } from '@/lib/queries/me';
import { speciesListQuery, type SpeciesFilters } from '@/lib/queries/species';

const NO_SORTING: never[] = [];
const selectClass = 'rounded-md border border-paper-edge bg-white px-2 py-1.5 text-sm';

export function SpeciesClient() {
  const { data: profile } = useProfile();
  const canEdit = can(activeMembership(profile)?.role, 'species.edit');
  const [filters, setFilters] = useState<SpeciesFilters>({ q: '', phase: '', origin: '', page: 1, pageSize: 25 });
  // Typing stays quick; the query follows the deferred text.
  const deferredQ = useDeferredValue(filters.q);
  const species = useQuery(speciesListQuery({ ...filters, q: deferredQ }));
  const columns = useMemo(() => speciesColumns(), []);
  const ids = { q: useId(), phase: useId(), origin: useId() };
  const set = (patch: Partial<SpeciesFilters>) => setFilters((f) => ({ ...f, page: 1, ...patch }));

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={ids.q} className="text-sm font-medium">Search</label>
          <input id={ids.q} type="search" value={filters.q} onChange={(e) => set({ q: e.target.value })} placeholder="Formula, name or alias, e.g. H2O or ethanol" className={`${selectClass} w-72`} />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={ids.phase} className="text-sm font-medium">Phase</label>
          <select id={ids.phase} value={filters.phase} onChange={(e) => set({ phase: e.target.value as SpeciesFilters['phase'] })} className={selectClass}>
            <option value="">Any phase</option>
            <option value="g">Gas</option>
            <option value="l">Liquid</option>
            <option value="s">Solid</option>
            <option value="aq">Aqueous</option>
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={ids.origin} className="text-sm font-medium">Origin</label>
          <select id={ids.origin} value={filters.origin} onChange={(e) => set({ origin: e.target.value as SpeciesFilters['origin'] })} className={selectClass}>
            <option value="">Built-in and team</option>
            <option value="library">Built-in only</option>
            <option value="team">Team only</option>
          </select>
        </div>
        {canEdit ? (
          <div className="ml-auto flex flex-wrap gap-2">
            <Link href="/species/import" className="rounded-md border border-paper-edge bg-white px-3 py-1.5 text-sm font-medium hover:bg-paper-deep">Import CSV</Link>
            <Link href="/species/from-structure" className="rounded-md border border-paper-edge bg-white px-3 py-1.5 text-sm font-medium hover:bg-paper-deep">From a structure</Link>
            <Link href="/species/new" className="rounded-md bg-pine-600 px-3 py-1.5 text-sm font-medium text-white hover:bg-pine-700">Add a species</Link>
          </div>
        ) : null}
      </div>
      {species.isPending ? (
        <p className="py-6 text-sm text-ink-soft" role="status">Loading species…</p>
      ) : species.isError ? (
        <Notice tone="error" title="The species could not be loaded">
          {species.error.message}{' '}
          <button type="button" className="underline" onClick={() => species.refetch()}>Try again</button>
        </Notice>
      ) : species.data.total === 0 ? (
        <EmptyState title={filters.origin === 'team' && !filters.q && !filters.phase ? 'Your team has no species of its own yet' : 'No species match'}>
          {filters.origin === 'team' && canEdit
            ? 'Add one with its provenance, or import a CSV of several.'
            : 'Try a formula such as CO2, a name such as methanol, or clear the filters.'}
        </EmptyState>
      ) : (
        <>
          <DataTable
            caption="Species of the built-in library and your team"
            data={species.data.items}
            columns={columns}
            sorting={NO_SORTING}
            onSortingChange={() => undefined}
            getRowId={(r) => `${r.origin}:${r.key}`}
            numericColumns={SPECIES_NUMERIC_COLUMNS}
            isBusy={species.isFetching}
          />
          <TablePagination
            page={filters.page}
            pageSize={filters.pageSize}
            total={species.data.total}
            noun="species"
            onPageChange={(page) => setFilters((f) => ({ ...f, page }))}
            onPageSizeChange={(pageSize) => set({ pageSize })}
          />
        </>
      )}
    </div>
  );
}
