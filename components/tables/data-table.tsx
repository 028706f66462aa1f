'use client';

import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type OnChangeFn, type SortingState } from '@tanstack/react-table';
import { useIsPhone } from '@/lib/hooks/use-media-query';
import { RowCards, type CardLayout } from './row-cards';
import { ScrollRegion } from './scroll-region';

// A table whose sorting and paging happen on the server: react-table only lays out rows and headers.
export function DataTable<T>({
  caption,
  data,
  columns,
  sorting,
  onSortingChange,
  getRowId,
  numericColumns = [],
  isBusy = false,
  cards,
}: {
  caption: string;
  data: T[];
  columns: ColumnDef<T>[];
  sorting: SortingState;
  onSortingChange: OnChangeFn<SortingState>;
  getRowId: (row: T) => string;
  numericColumns?: string[];
  isBusy?: boolean;
  /** reflow the rows as cards on phones instead of scrolling the table sideways */
  cards?: CardLayout;
}) {
  const table = useReactTable({
    data,
    columns,
    state: { sorting },
    onSortingChange,
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
    sortDescFirst: false,
    getCoreRowModel: getCoreRowModel(),
    getRowId,
  });

  const isPhone = useIsPhone();
  if (cards && isPhone) return <RowCards table={table} caption={caption} layout={cards} sorting={sorting} isBusy={isBusy} />;

  return (
    <ScrollRegion label={caption} className="rounded-lg border border-paper-edge bg-white">
      <table className={`w-full text-sm transition-opacity ${isBusy ? 'opacity-70' : ''}`} aria-busy={isBusy}>
        <caption className="sr-only">{caption}</caption>
        {/* Header case as written: units such as "kJ/mol" must not read "KJ/MOL". */}
        <thead className="bg-paper-deep text-left text-xs text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const isNumeric = numericColumns.includes(header.column.id);
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                    className={`px-3 py-2 font-semibold ${isNumeric ? 'text-right' : ''}`}
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className={`inline-flex items-center gap-1 hover:text-ink ${sorted ? 'text-ink' : ''}`}
                      >
                        {label}
                        <span aria-hidden="true" className="w-3 text-[10px]">
                          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                        </span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-paper-edge hover:bg-paper/60">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={`px-3 py-2 align-top ${numericColumns.includes(cell.column.id) ? 'text-right tabular-nums' : ''}`}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
