'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import type { DecisionRouteRef, DecisionSummaryDto } from '@/lib/services/decisions/decision-dto';
import { When } from '../ui/when';
import type { CardLayout } from './row-cards';

/** A route named in a decision: a link while it exists, its old name marked once it is deleted. */
export function DecisionRouteName({ route, strong = false }: { route: DecisionRouteRef; strong?: boolean }) {
  if (route.deleted) {
    return (
      <span className={strong ? 'font-medium text-ink' : 'text-ink-soft'}>
        {route.name} <span className="rounded bg-paper-deep px-1 text-[11px] text-ink-faint">deleted</span>
      </span>
    );
  }
  return (
    <Link href={`/routes/${route.id}`} className={`text-pine-700 underline-offset-2 hover:underline ${strong ? 'font-medium' : ''}`}>
      {route.name}
    </Link>
  );
}

/** "Current", or which newer decision replaced this one. */
export function DecisionStanding({ supersededById }: { supersededById: number | null }) {
  if (supersededById === null) return <span className="rounded bg-downhill-bg px-1.5 py-0.5 text-xs font-medium text-downhill">Current</span>;
  return (
    <span className="text-xs text-ink-soft">
      superseded by{' '}
      <Link href={`/decisions/${supersededById}`} className="font-medium text-pine-700 underline-offset-2 hover:underline">
        #{supersededById}
      </Link>
    </span>
  );
}

/** On phones each decision is a card headed by its number and date (DataTable `cards`). */
export const DECISION_CARD_LAYOUT: CardLayout = { title: ['decision'] };

// The decision log: paged on the server and shown in the order it was written, so no column sorts.
export function decisionColumns(): ColumnDef<DecisionSummaryDto>[] {
  return [
    {
      id: 'decision',
      header: 'Decided',
      enableSorting: false,
      cell: ({ row }) => (
        <div className="whitespace-nowrap">
          <Link href={`/decisions/${row.original.id}`} className="font-medium text-pine-700 underline-offset-2 hover:underline" aria-label={`Decision #${row.original.id}: details and snapshot`}>
            #{row.original.id}
          </Link>
          <br />
          <When iso={row.original.createdAt} />
        </div>
      ),
    },
    {
      id: 'routes',
      header: 'Routes compared',
      enableSorting: false,
      cell: ({ row }) => (
        <ul className="flex flex-col gap-0.5">
          {row.original.routes.map((route) => (
            <li key={route.id}>
              <DecisionRouteName route={route} />
            </li>
          ))}
        </ul>
      ),
    },
    {
      id: 'choice',
      header: 'Choice',
      enableSorting: false,
      cell: ({ row }) => {
        const { chosen, shelvedRouteIds } = row.original;
        return (
          <div>
            {chosen ? <DecisionRouteName route={chosen} strong /> : <span className="text-ink-faint">—</span>}
            {shelvedRouteIds.length ? <p className="text-xs text-ink-faint">{`${shelvedRouteIds.length} other${shelvedRouteIds.length === 1 ? '' : 's'} shelved`}</p> : null}
          </div>
        );
      },
    },
    {
      id: 'rationale',
      header: 'Rationale',
      enableSorting: false,
      cell: ({ row }) => <p className="max-w-prose whitespace-pre-wrap break-words text-ink">{row.original.rationale}</p>,
    },
    { id: 'author', header: 'Author', enableSorting: false, cell: ({ row }) => <span className="text-ink-soft">{row.original.author?.name ?? '—'}</span> },
    { id: 'standing', header: 'Standing', enableSorting: false, cell: ({ row }) => <DecisionStanding supersededById={row.original.supersededById} /> },
  ];
}
