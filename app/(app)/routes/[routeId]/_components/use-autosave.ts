'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef } from 'react';
import { ApiError } from '@/lib/queries/api-fetch';
import { reviewKeys } from '@/lib/queries/revisions';
import { routeKeys, saveRoute } from '@/lib/queries/routes';
import type { RouteDraft } from '@/lib/schemas/route';
import { useRouteEditorStoreApi } from '@/stores/route-editor-store';

const AUTOSAVE_DEBOUNCE_MS = 1500;

// Saves the working document ~1.5 s after the last edit, against the version it was loaded at.
export function useAutosave(routeId: number, { enabled }: { enabled: boolean }) {
  const store = useRouteEditorStoreApi();
  const queryClient = useQueryClient();
  const failedDoc = useRef<RouteDraft | null>(null);

  const { mutateAsync } = useMutation({
    mutationFn: ({ draft, version }: { draft: RouteDraft; version: number }) => saveRoute(routeId, { version, ...draft }),
  });

  const saveNow = useCallback(async () => {
    const { doc: draft, version, saveStatus } = store.getState();
    if (saveStatus === 'saving' || saveStatus === 'conflict') return;
    store.getState().markSaving();
    try {
      const answer = await mutateAsync({ draft, version });
      failedDoc.current = null;
      store.getState().markSaved(answer.route.version, draft);
      queryClient.setQueryData(routeKeys.detail(routeId), answer.route);
      void queryClient.invalidateQueries({ queryKey: routeKeys.lists() });
      // A save is a new revision, may outdate comments, and may send an approved route back to draft.
      void queryClient.invalidateQueries({ queryKey: reviewKeys.route(routeId) });
    } catch (error) {
      failedDoc.current = draft;
      const isConflict = error instanceof ApiError && error.status === 409;
      const message = error instanceof ApiError ? error.message : 'Could not reach the server.';
      store.getState().markSaveFailed(message, { conflict: isConflict });
    }
  }, [mutateAsync, queryClient, routeId, store]);

  // Subscribed outside React: a drag updates the store every frame and must not re-render the editor.
  useEffect(() => {
    if (!enabled) return;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const fire = () => {
      timer = undefined;
      void saveNow();
    };
    const unsubscribe = store.subscribe((state, previous) => {
      if (state.doc === previous.doc && state.saveStatus === previous.saveStatus) return;
      if (!state.isDirty || state.saveStatus === 'saving' || state.saveStatus === 'conflict') return;
      // A save that failed is retried after the next edit (or the Retry button), not in a loop.
      if (state.saveStatus === 'error' && state.doc === failedDoc.current) return;
      clearTimeout(timer);
      timer = setTimeout(fire, AUTOSAVE_DEBOUNCE_MS);
    });
    return () => {
      unsubscribe();
      // Leaving the editor by an in-app link inside the debounce: save now rather than drop the edit.
      if (timer !== undefined) {
        clearTimeout(timer);
        fire();
      }
    };
  }, [enabled, store, saveNow]);

  // The browser asks before leaving while anything is unsaved or still on its way.
  useEffect(() => {
    if (!enabled) return;
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      const { isDirty: dirty, saveStatus } = store.getState();
      if (!dirty && saveStatus !== 'saving') return;
      event.preventDefault();
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [enabled, store]);

  return { saveNow };
}
