'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import type { ListRoutesQuery } from '@/lib/schemas/route';
import { ROUTE_STATUS_LABELS, type RouteStatus } from '@/lib/schemas/workflow';
import type { RouteSummaryDto } from '@/lib/services/routes/route-dto';
import { energyUnitLabel, formatEnergyValue, type EnergyUnit } from '../ladder/energy-format';
import { Button } from '../ui/button';
import type { CardLayout } from './row-cards';
import { When } from '@/components/ui/when';
import { FormulaText } from '@/components/chemistry/formula-text';

export const ROUTE_NUMERIC_COLUMNS = ['steps', 'overallDeltaG', 'uphillSteps'];

// The columns the server sorts by (ListRoutesQuery.sort, the same ids); the values only make react-table offer it.
const SORT_VALUES: Record<ListRoutesQuery['sort'], (route: RouteSummaryDto) => string | number | null> = {
  name: (r) => r.name,
  target: (r) => r.target,
  updatedAt: (r) => r.updatedAt,
  steps: (r) => r.stepCount,
  overallDeltaG: (r) => r.overallDeltaG_kJ,
  uphillSteps: (r) => r.uphillSteps,
};

/** On phones each route is a card: tick and name on top, actions at the foot (DataTable `cards`). */
export const ROUTE_CARD_LAYOUT: CardLayout = { title: ['select', 'name'], footer: ['actions'], labels: { overallDeltaG: 'Overall ΔG' } };

function UphillCell({ count }: { count: number | null }) {
  if (count === null) return <span className="text-ink-faint">not evaluated</span>;
  if (count === 0) {
    return (
      <span className="inline-flex items-center gap-1 text-downhill">
        <span aria-hidden="true">↓</span> none
      </span>
    );
  }
  return (
    <span className="inline-flex items-center gap-1 rounded bg-uphill-bg px-1.5 font-medium text-uphill">
      <span aria-hidden="true">↑</span> {count} uphill
    </span>
  );
}

/** Ticks for choosing routes to compare; the list keeps which are ticked. */
export interface CompareSelection {
  isSelected: (routeId: number) => boolean;
  onToggle: (route: RouteSummaryDto, selected: boolean) => void;
}

function selectColumn({ isSelected, onToggle }: CompareSelection): ColumnDef<RouteSummaryDto> {
  return {
    id: 'select',
    header: () => <span className="sr-only">Compare</span>,
    enableSorting: false,
    cell: ({ row }) => {
      const route = row.original;
      // The comparison refuses archived routes, so they cannot be ticked.
      return (
        <input
          type="checkbox"
          checked={isSelected(route.id)}
          disabled={route.archived}
          title={route.archived ? 'Archived routes cannot be compared; unarchive it first.' : undefined}
          onChange={(e) => onToggle(route, e.target.checked)}
          aria-label={`Select ${route.name} to compare`}
          className="mt-0.5 accent-pine-600"
        />
      );
    },
  };
}

export function routeColumns({
  energyUnit,
  canEdit,
  canDelete = false,
  busyRouteId,
  onDuplicate,
  onArchive,
  onDelete,
  selection,
}: {
  energyUnit: EnergyUnit;
  canEdit: boolean;
  /** designers and leads: a Delete action that asks first */
  canDelete?: boolean;
  busyRouteId: number | null;
  onDuplicate: (route: RouteSummaryDto) => void;
  onArchive: (route: RouteSummaryDto, archived: boolean) => void;
  onDelete?: (route: RouteSummaryDto) => void;
  selection?: CompareSelection;
}): ColumnDef<RouteSummaryDto>[] {
  const columns: ColumnDef<RouteSummaryDto>[] = [
    ...(selection ? [selectColumn(selection)] : []),
    {
      id: 'name',
      header: 'Name',
      cell: ({ row }) => (
        <div>
          <Link href={`/routes/${row.original.id}`} className="font-medium text-pine-700 underline-offset-2 hover:underline">
            {row.original.name}
          </Link>
          {row.original.originRouteId ? <span className="ml-1.5 text-xs text-ink-faint">alternative</span> : null}
        </div>
      ),
    },
    { id: 'target', header: 'Target', cell: ({ row }) => <FormulaText value={row.original.target} /> },
    {
      id: 'status',
      header: 'Status',
      enableSorting: false,
      cell: ({ row }) => (
        <span className="rounded bg-paper-deep px-1.5 py-0.5 text-xs text-ink-soft">
          {row.original.archived ? 'Archived' : (ROUTE_STATUS_LABELS[row.original.status as RouteStatus] ?? row.original.status.replace(/_/g, ' '))}
        </span>
      ),
    },
    { id: 'steps', header: 'Steps', cell: ({ row }) => row.original.stepCount },
    {
      id: 'overallDeltaG',
      // The unit is stated once, in the header; cells hold the bare number (screen readers still hear the unit).
      header: () => <span title="Overall free-energy change per mol of target, at each step's conditions">Overall ΔG ({energyUnitLabel(energyUnit)}/mol)</span>,
      // No total is saved while a step fails or the route is incomplete: say so rather than show a number.
      cell: ({ row }) =>
        row.original.overallDeltaG_kJ === null ? (
          <span className="text-ink-faint">{row.original.stepCount === 0 ? 'no steps' : 'not evaluated'}</span>
        ) : (
          <span className="relative tabular-nums">
            {formatEnergyValue(row.original.overallDeltaG_kJ, energyUnit)}
            <span className="sr-only"> {energyUnitLabel(energyUnit)}/mol</span>
          </span>
        ),
    },
    { id: 'uphillSteps', header: 'Uphill steps', cell: ({ row }) => <UphillCell count={row.original.uphillSteps} /> },
    {
      id: 'updatedAt',
      header: 'Last edited',
      cell: ({ row }) => (
        <span className="text-ink-soft">
          {row.original.updatedBy}
          <br />
          <When iso={row.original.updatedAt} />
        </span>
      ),
    },
  ];
  // react-table offers a header (or the phone's sort menu) as a sort control only where the column reads a value.
  for (const column of columns) {
    const read = column.id ? SORT_VALUES[column.id as ListRoutesQuery['sort']] : undefined;
    if (read) Object.assign(column, { accessorFn: read });
  }
  const hasDelete = canDelete && onDelete !== undefined;
  if (!canEdit && !hasDelete) return columns;
  return [
    ...columns,
    {
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      enableSorting: false,
      cell: ({ row }) => {
        const route = row.original;
        const isBusy = busyRouteId === route.id;
        return (
          <div className="flex flex-wrap justify-end gap-1 whitespace-nowrap">
            {canEdit ? (
              <>
                <Button variant="quiet" disabled={isBusy} onClick={() => onDuplicate(route)} aria-label={`Duplicate ${route.name} as an alternative`}>
                  Duplicate as alternative
                </Button>
                <Button variant="quiet" disabled={isBusy} onClick={() => onArchive(route, !route.archived)} aria-label={`${route.archived ? 'Unarchive' : 'Archive'} ${route.name}`}>
                  {route.archived ? 'Unarchive' : 'Archive'}
                </Button>
              </>
            ) : null}
            {hasDelete ? (
              <Button variant="danger" disabled={isBusy} onClick={() => onDelete(route)} aria-label={`Delete ${route.name}`}>
                Delete
              </Button>
            ) : null}
          </div>
        );
      },
    },
  ];
}
