'use client';

import type { ColumnDef } from '@tanstack/react-table';
import type { DeletedRouteDto } from '@/lib/services/routes/list-deleted-routes';
import { Button } from '../ui/button';
import { When } from '../ui/when';
import { FormulaText } from '@/components/chemistry/formula-text';

// The recently deleted routes: no link (a deleted route opens nowhere), who deleted it, and until when it can come back.
export function deletedRouteColumns({ busyRouteId, onUndelete }: { busyRouteId: number | null; onUndelete: (route: DeletedRouteDto) => void }): ColumnDef<DeletedRouteDto>[] {
  return [
    { id: 'name', header: 'Name', enableSorting: false, cell: ({ row }) => <span className="font-medium text-ink">{row.original.name}</span> },
    { id: 'target', header: 'Target', enableSorting: false, cell: ({ row }) => <FormulaText value={row.original.target} /> },
    {
      id: 'deletedAt',
      header: 'Deleted',
      enableSorting: false,
      cell: ({ row }) => (
        <span className="text-ink-soft">
          {row.original.deletedBy}
          <br />
          <When iso={row.original.deletedAt} />
        </span>
      ),
    },
    { id: 'restorableUntil', header: 'Can be undone until', enableSorting: false, cell: ({ row }) => <When iso={row.original.restorableUntil} className="text-sm text-ink-soft" /> },
    {
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      enableSorting: false,
      cell: ({ row }) => (
        <div className="flex justify-end">
          <Button variant="secondary" disabled={busyRouteId === row.original.id} onClick={() => onUndelete(row.original)} aria-label={`Undo delete of ${row.original.name}`}>
            {busyRouteId === row.original.id ? 'Bringing back…' : 'Undo delete'}
          </Button>
        </div>
      ),
    },
  ];
}
