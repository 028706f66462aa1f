'use client';

import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ChemText } from '@/components/chemistry/chem-text';
import { formatEnergy, type EnergyUnit } from '@/components/ladder/energy-format';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { When } from '@/components/ui/when';
import { ApiError } from '@/lib/queries/api-fetch';
import { restoreRevision, reviewKeys, revisionsQuery } from '@/lib/queries/revisions';
import { routeKeys } from '@/lib/queries/routes';
import { draftOf } from '@/lib/route-editor/route-draft';
import type { RevisionSummaryDto } from '@/lib/services/revisions/revision-dto';
import { useRouteEditorStore, useRouteEditorStoreApi } from '@/stores/route-editor-store';
import { RevisionDiffView } from './revision-diff-view';

// Every save is a revision: list them, compare any two, and restore one as a new revision.
export function HistoryPanel({ routeId, canEdit, unit }: { routeId: number; canEdit: boolean; unit: EnergyUnit }) {
  const [page, setPage] = useState(1);
  const [picked, setPicked] = useState<number[]>([]);
  const [restoring, setRestoring] = useState<RevisionSummaryDto | null>(null);
  const query = useQuery(revisionsQuery(routeId, page));

  const toggle = (id: number) => setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : [...p.slice(-1), id]));
  const [from, to] = [...picked].sort((a, b) => a - b);
  const pages = query.data ? Math.max(1, Math.ceil(query.data.total / query.data.pageSize)) : 1;

  return (
    <div className="flex flex-col gap-3">
      <p className="text-xs text-ink-faint">Tick two revisions to compare them. Restoring makes a new revision; nothing is deleted.</p>
      {query.isPending ? <p className="text-sm text-ink-faint">Loading revisions…</p> : null}
      {query.isError ? <p role="alert" className="text-sm text-uphill">Could not load the history: {query.error.message}</p> : null}
      {query.data && query.data.items.length === 0 ? <p className="text-sm text-ink-faint">No revisions yet: the first save makes one.</p> : null}
      {query.data?.items.length ? (
        <ol className="flex flex-col divide-y divide-paper-deep" aria-label="Revisions, newest first">
          {query.data.items.map((r) => (
            <li key={r.id} className="flex items-start gap-2 py-1.5">
              <input type="checkbox" className="mt-1" aria-label={`Compare revision ${r.version}`} checked={picked.includes(r.id)} onChange={() => toggle(r.id)} />
              <div className="min-w-0 flex-1">
                <p className="text-sm">
                  <span className="font-medium">Revision {r.version}</span> · {r.author.name} · <When iso={r.createdAt} />
                </p>
                <p className="text-xs text-ink-soft">
                  <ChemText text={r.summary} />
                </p>
                <p className="text-xs tabular-nums text-ink-faint">
                  {r.overallDeltaG_kJ === null ? 'overall ΔG not evaluated in this revision' : `overall ΔG ${formatEnergy(r.overallDeltaG_kJ, unit)}`}
                </p>
              </div>
              {canEdit ? (
                <Button variant="quiet" onClick={() => setRestoring(r)}>
                  Restore
                </Button>
              ) : null}
            </li>
          ))}
        </ol>
      ) : null}
      {pages > 1 ? (
        <div className="flex items-center gap-2 text-xs">
          <Button variant="secondary" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
            Newer
          </Button>
          <span>
            page {page} of {pages}
          </span>
          <Button variant="secondary" disabled={page >= pages} onClick={() => setPage((p) => p + 1)}>
            Older
          </Button>
        </div>
      ) : null}
      {from !== undefined && to !== undefined ? <RevisionDiffView routeId={routeId} from={from} to={to} unit={unit} /> : null}
      {restoring ? <RestoreDialog routeId={routeId} revision={restoring} onClose={() => setRestoring(null)} /> : null}
    </div>
  );
}

function RestoreDialog({ routeId, revision, onClose }: { routeId: number; revision: RevisionSummaryDto; onClose: () => void }) {
  const store = useRouteEditorStoreApi();
  const queryClient = useQueryClient();
  const pendingEdits = useRouteEditorStore((s) => s.isDirty || s.saveStatus === 'saving');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const restore = async () => {
    setBusy(true);
    setError(null);
    try {
      const answer = await restoreRevision(routeId, revision.id, store.getState().version);
      store.getState().replaceDocument(draftOf(answer.route), answer.route.version);
      queryClient.setQueryData(routeKeys.detail(routeId), answer.route);
      await Promise.all([queryClient.invalidateQueries({ queryKey: reviewKeys.route(routeId) }), queryClient.invalidateQueries({ queryKey: routeKeys.lists() })]);
      onClose();
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'Could not reach the server.');
      setBusy(false);
    }
  };

  return (
    <Dialog open title={`Restore revision ${revision.version}?`} onClose={onClose}>
      <p className="text-sm">The route becomes what it was in revision {revision.version} (<ChemText text={revision.summary} />). This is saved as a new revision, so today’s version stays in the history.</p>
      {pendingEdits ? <p className="text-sm text-marginal">Your latest edits are still saving; wait a moment.</p> : null}
      {error ? (
        <p role="alert" className="text-sm text-uphill">
          {error}
        </p>
      ) : null}
      <div className="mt-3 flex justify-end gap-2">
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button disabled={busy || pendingEdits} onClick={() => void restore()}>
          {busy ? 'Restoring…' : 'Restore'}
        </Button>
      </div>
    </Dialog>
  );
}
