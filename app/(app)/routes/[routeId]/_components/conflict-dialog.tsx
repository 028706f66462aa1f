'use client';

import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/queries/api-fetch';
import { createRoute, routeDetailQuery, routeKeys, saveRoute } from '@/lib/queries/routes';
import { draftOf } from '@/lib/route-editor/route-draft';
import { useRouteEditorStore, useRouteEditorStoreApi } from '@/stores/route-editor-store';

const MAX_NAME = 160;
const COPY_SUFFIX = ' (my copy)';

// A stale save: take the other version, or keep this one as a new route. Either way nothing is lost.
export function ConflictDialog({ routeId }: { routeId: number }) {
  const store = useRouteEditorStoreApi();
  const router = useRouter();
  const queryClient = useQueryClient();
  const isOpen = useRouteEditorStore((s) => s.saveStatus === 'conflict');
  const [busy, setBusy] = useState<'reload' | 'copy' | null>(null);
  const [error, setError] = useState<string | null>(null);

  const fail = (e: unknown) => setError(e instanceof ApiError ? e.message : 'That did not work. Try again.');

  async function reloadTheirs() {
    setBusy('reload');
    setError(null);
    try {
      const fresh = await queryClient.fetchQuery({ ...routeDetailQuery(routeId), staleTime: 0 });
      store.getState().replaceDocument(draftOf(fresh), fresh.version);
    } catch (e) {
      fail(e);
    } finally {
      setBusy(null);
    }
  }

  async function keepMineAsCopy() {
    setBusy('copy');
    setError(null);
    const mine = store.getState().doc;
    try {
      const name = `${mine.name.slice(0, MAX_NAME - COPY_SUFFIX.length)}${COPY_SUFFIX}`;
      const copy = await createRoute({ name, target: mine.target, targetAmount: mine.targetAmount });
      const saved = await saveRoute(copy.id, { ...mine, name, version: copy.version });
      queryClient.setQueryData(routeKeys.detail(copy.id), saved.route);
      void queryClient.invalidateQueries({ queryKey: routeKeys.lists() });
      // This editor's edits now live in the copy; nothing is left to save here.
      store.getState().replaceDocument(mine, store.getState().version);
      router.push(`/routes/${copy.id}`);
    } catch (e) {
      fail(e);
      setBusy(null);
    }
  }

  return (
    <Dialog open={isOpen} title="This route changed elsewhere" onClose={() => undefined} dismissable={false}>
      <p className="text-sm text-ink-soft">
        Someone saved a newer version of this route while you were editing, so your changes were not saved over it. Choose which version to keep
        working on; the other is not lost.
      </p>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <div className="flex flex-col gap-2 sm:flex-row sm:justify-end">
        <Button variant="secondary" disabled={busy !== null} onClick={reloadTheirs}>
          {busy === 'reload' ? 'Loading…' : 'Reload theirs'}
        </Button>
        <Button disabled={busy !== null} onClick={keepMineAsCopy}>
          {busy === 'copy' ? 'Copying…' : 'Keep mine as a copy'}
        </Button>
      </div>
      <p className="text-xs text-ink-faint">“Reload theirs” discards your unsaved edits here. “Keep mine as a copy” saves them as a new route and opens it.</p>
    </Dialog>
  );
}
