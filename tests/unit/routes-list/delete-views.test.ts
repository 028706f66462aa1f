// Server-renders the delete confirmation and the recently-deleted table (no DOM in this suite) to check their wording and controls.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DeleteRouteDialog } from '@/app/(app)/routes/delete-route-dialog';
import { DataTable } from '@/components/tables/data-table';
import { deletedRouteColumns } from '@/components/tables/deleted-route-columns';
import { routeColumns } from '@/components/tables/route-columns';
import type { DeletedRouteDto } from '@/lib/services/routes/list-deleted-routes';
import type { RouteSummaryDto } from '@/lib/services/routes/route-dto';

const noop = () => undefined;
const ROUTE: RouteSummaryDto = {
  id: 7, name: 'Methanol, Line 3 option A', target: 'CH3OH(g)', status: 'draft', stepCount: 2, overallDeltaG_kJ: -20, uphillSteps: 1,
  archived: false, originRouteId: null, updatedAt: '2026-12-02T09:14:00.000Z', updatedBy: 'Baptiste Osei',
};
const DELETED: DeletedRouteDto = { ...ROUTE, deletedAt: '2026-12-02T10:00:00.000Z', deletedBy: 'Baptiste Osei', restorableUntil: '2027-01-01T10:00:00.000Z' };

const dialog = (isLead: boolean, error: string | null = null) =>
  renderToStaticMarkup(createElement(DeleteRouteDialog, { route: ROUTE, isLead, isDeleting: false, error, onConfirm: noop, onClose: noop }));
const table = <T,>(data: T[], columns: Parameters<typeof DataTable<T>>[0]['columns']) =>
  renderToStaticMarkup(createElement(DataTable<T>, { caption: 'test', data, columns, sorting: [], onSortingChange: noop, getRowId: () => '1' }));

describe('the delete confirmation', () => {
  it('names the route and tells a designer that a lead can undo it for 30 days', () => {
    const html = dialog(false);
    expect(html).toContain('Delete “Methanol, Line 3 option A”?');
    expect(html).toContain('A group lead can undo this for 30 days');
    expect(html).toContain('Keep it');
    expect(html).toContain('Delete route');
  });

  it('tells a lead where to undo it, and shows a server refusal', () => {
    const html = dialog(true, 'No such route.');
    expect(html).toContain('You can undo this from “Recently deleted” for 30 days.');
    expect(html).toContain('role="alert"');
    expect(html).toContain('No such route.');
  });
});

describe('the route tables', () => {
  it('offer Delete per row only when the role may delete', () => {
    const base = { energyUnit: 'kJ' as const, busyRouteId: null, onDuplicate: noop, onArchive: noop, onDelete: noop };
    expect(table([ROUTE], routeColumns({ ...base, canEdit: true, canDelete: true }))).toContain('aria-label="Delete Methanol, Line 3 option A"');
    expect(table([ROUTE], routeColumns({ ...base, canEdit: false, canDelete: false }))).not.toContain('Delete');
  });

  it('list a deleted route with who deleted it, until when it can come back, and an Undo delete button, without a link to it', () => {
    const html = table([DELETED], deletedRouteColumns({ busyRouteId: null, onUndelete: noop }));
    expect(html).toContain('Baptiste Osei');
    expect(html).toContain('dateTime="2027-01-01T10:00:00.000Z"');
    expect(html).toContain('aria-label="Undo delete of Methanol, Line 3 option A"');
    expect(html).not.toContain('href=');
    expect(table([DELETED], deletedRouteColumns({ busyRouteId: 7, onUndelete: noop }))).toContain('Bringing back…');
  });
});
