'use client';

import { flexRender, type Column, type SortingState, type Table } from '@tanstack/react-table';
import { useId } from 'react';
import { COMPACT_INPUT } from '../ui/input-class';

/** Which columns head each card and which close it (actions); the rest become labelled facts. */
export interface CardLayout {
  title: string[];
  footer?: string[];
  /** words for the sort menu where a column's header is not plain text */
  labels?: Record<string, string>;
}

function columnLabel<T>(column: Column<T>, labels: Record<string, string> | undefined): string {
  const header = column.columnDef.header;
  return labels?.[column.id] ?? (typeof header === 'string' ? header : column.id);
}

// On a phone the sortable headers are gone, so the same sorting is offered as two menus.
function CardSort<T>({ table, sorting, labels }: { table: Table<T>; sorting: SortingState; labels: Record<string, string> | undefined }) {
  const id = useId();
  const sortable = table.getAllLeafColumns().filter((c) => c.getCanSort());
  if (sortable.length === 0) return null;
  const current = sorting[0];
  const set = (next: { id: string; desc: boolean }) => table.setSorting([next]);
  return (
    <div className="flex flex-wrap items-end gap-2 text-xs font-medium">
      <label htmlFor={`${id}-by`} className="flex flex-col gap-1">
        Sort by
        <select id={`${id}-by`} className={`${COMPACT_INPUT} w-40`} value={current?.id ?? ''} onChange={(e) => set({ id: e.target.value, desc: current?.desc ?? false })}>
          {sortable.map((c) => (
            <option key={c.id} value={c.id}>
              {columnLabel(c, labels)}
            </option>
          ))}
        </select>
      </label>
      <label htmlFor={`${id}-dir`} className="flex flex-col gap-1">
        Order
        <select
          id={`${id}-dir`}
          className={`${COMPACT_INPUT} w-32`}
          value={current?.desc ? 'desc' : 'asc'}
          onChange={(e) => set({ id: current?.id ?? sortable[0]!.id, desc: e.target.value === 'desc' })}
        >
          <option value="asc">Ascending</option>
          <option value="desc">Descending</option>
        </select>
      </label>
    </div>
  );
}

// The rows of a DataTable reflowed as cards, one per row, for screens too narrow for the table.
export function RowCards<T>({ table, caption, layout, sorting, isBusy }: { table: Table<T>; caption: string; layout: CardLayout; sorting: SortingState; isBusy: boolean }) {
  const footer = layout.footer ?? [];
  return (
    <div className="flex flex-col gap-2">
      <CardSort table={table} sorting={sorting} labels={layout.labels} />
      <ul aria-label={caption} aria-busy={isBusy} className={`flex flex-col gap-2 transition-opacity ${isBusy ? 'opacity-70' : ''}`} data-testid="row-cards">
        {table.getRowModel().rows.map((row) => {
          const cells = row.getVisibleCells();
          const pick = (ids: string[]) => cells.filter((c) => ids.includes(c.column.id));
          const facts = cells.filter((c) => !layout.title.includes(c.column.id) && !footer.includes(c.column.id));
          const actions = pick(footer);
          return (
            <li key={row.id} className="min-w-0 rounded-lg border border-paper-edge bg-white p-3 text-sm">
              <div className="flex min-w-0 items-start gap-2 break-words">
                {pick(layout.title).map((cell) => (
                  <div key={cell.id} className="min-w-0">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </div>
                ))}
              </div>
              <dl className="mt-2 grid grid-cols-[auto_minmax(0,1fr)] gap-x-3 gap-y-1">
                {facts.map((cell) => {
                  const header = table.getFlatHeaders().find((h) => h.column.id === cell.column.id);
                  return (
                    <div key={cell.id} className="contents">
                      <dt className="text-xs text-ink-faint">{header ? flexRender(cell.column.columnDef.header, header.getContext()) : cell.column.id}</dt>
                      <dd className="min-w-0 break-words">{flexRender(cell.column.columnDef.cell, cell.getContext())}</dd>
                    </div>
                  );
                })}
              </dl>
              {actions.length ? (
                <div className="mt-2 border-t border-paper-edge pt-2">
                  {actions.map((cell) => (
                    <div key={cell.id}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</div>
                  ))}
                </div>
              ) : null}
            </li>
          );
        })}
      </ul>
    </div>
  );
}
