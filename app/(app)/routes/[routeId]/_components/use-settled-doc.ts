'use client';

import { useEffect, useState } from 'react';
import type { RouteDraft } from '@/lib/schemas/route';
import { useRouteEditorStoreApi } from '@/stores/route-editor-store';

// The working document as it was `delayMs` after it last changed. Subscribing outside React keeps a
// drag (one store update per frame) from re-rendering the whole editor.
export function useSettledDoc(delayMs: number): RouteDraft {
  const store = useRouteEditorStoreApi();
  const [settled, setSettled] = useState(() => store.getState().doc);
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    const unsubscribe = store.subscribe((state, previous) => {
      if (state.doc === previous.doc) return;
      clearTimeout(timer);
      timer = setTimeout(() => setSettled(store.getState().doc), delayMs);
    });
    return () => {
      unsubscribe();
      clearTimeout(timer);
    };
  }, [store, delayMs]);
  return settled;
}
