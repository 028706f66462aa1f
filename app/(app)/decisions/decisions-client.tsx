'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useMemo, useState } from 'react';
import { DataTable } from '@/components/tables/data-table';
import { DECISION_CARD_LAYOUT, decisionColumns } from '@/components/tables/decision-columns';
import { TablePagination } from '@/components/tables/table-pagination';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { can } from '@/lib/auth/permissions';
import { decisionListQuery } from '@/lib/queries/decisions';
import { activeMembership, useProfile } from '@/lib/queries/me';

const NO_SORTING: never[] = [];

// The team's decision log, newest first, paged on the server.
export function DecisionsClient() {
  const { data: profile } = useProfile();
  const isLead = can(activeMembership(profile)?.role, 'route.decide');
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(25);
  const decisions = useQuery(decisionListQuery({ page, pageSize }));
  const columns = useMemo(() => decisionColumns(), []);
  const items = decisions.data?.items ?? [];

  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-soft">
        Decisions are never edited. To change course, compare the routes again and record a new decision: it supersedes the earlier ones about any of the same
        routes, and both stay here.
      </p>
      {decisions.isPending ? (
        <p className="py-6 text-sm text-ink-soft" role="status">
          Loading decisions…
        </p>
      ) : decisions.isError ? (
        <Notice tone="error" title="Decisions could not be loaded">
          {decisions.error.message}{' '}
          <button type="button" className="underline" onClick={() => decisions.refetch()}>
            Try again
          </button>
        </Notice>
      ) : items.length === 0 && decisions.data.total === 0 ? (
        <EmptyState
          title="No decisions yet"
          action={
            <Link href="/routes" className="rounded-md bg-pine-600 px-3 py-1.5 text-sm font-medium text-white hover:bg-pine-700">
              Go to routes
            </Link>
          }
        >
          {isLead
            ? 'Tick two to four routes on the routes list, compare them, and record which one the group goes on with.'
            : 'A group lead records a decision after comparing routes; it appears here for the whole team.'}
        </EmptyState>
      ) : (
        <>
          <DataTable
            caption="Decision log of your team, newest first"
            data={items}
            columns={columns}
            sorting={NO_SORTING}
            onSortingChange={() => undefined}
            getRowId={(d) => String(d.id)}
            isBusy={decisions.isFetching}
            cards={DECISION_CARD_LAYOUT}
          />
          <TablePagination
            page={page}
            pageSize={pageSize}
            total={decisions.data.total}
            noun="decisions"
            onPageChange={setPage}
            onPageSizeChange={(size) => {
              setPageSize(size);
              setPage(1);
            }}
          />
        </>
      )}
    </div>
  );
}
