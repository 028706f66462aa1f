'use client';

import { useEffect } from 'react';
import { useRouteEditorStoreApi } from '@/stores/route-editor-store';

export const SHORTCUT_HELP = 'Delete removes the selected step · Ctrl/⌘+Z undo · Ctrl/⌘+Shift+Z or Ctrl+Y redo · F fits the view';

function isTyping(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  if (target instanceof HTMLTextAreaElement || target instanceof HTMLSelectElement) return true;
  if (target instanceof HTMLInputElement) return !['checkbox', 'radio', 'button', 'submit', 'reset', 'range'].includes(target.type);
  return false;
}

// Delete means the selected step only from the board (or nowhere in particular): pressed on a palette or panel button
// it would remove a step the keyboard user is not looking at.
function isOnBoard(target: EventTarget | null): boolean {
  if (!(target instanceof Element)) return true;
  return target === document.body || target.closest('.react-flow') !== null;
}

// Window-level keys for the board; typing in a field keeps the browser's own meaning of every key.
export function useEditorShortcuts({ canEdit, onFitView }: { canEdit: boolean; onFitView: () => void }) {
  const store = useRouteEditorStoreApi();
  useEffect(() => {
    const onKeyDown = (event: KeyboardEvent) => {
      // No defaultPrevented check: React Flow claims Delete for edges even when only a (non-deletable) node is selected.
      if (isTyping(event.target) || document.querySelector('dialog[open]')) return;
      const mod = event.ctrlKey || event.metaKey;
      const key = event.key.toLowerCase();
      const state = store.getState();
      if (!mod && !event.altKey && key === 'f') {
        event.preventDefault();
        onFitView();
        return;
      }
      if (!canEdit) return;
      if (mod && key === 'z' && !event.shiftKey) {
        event.preventDefault();
        state.undo();
      } else if (mod && ((key === 'z' && event.shiftKey) || (key === 'y' && !event.shiftKey))) {
        event.preventDefault();
        state.redo();
      } else if (!mod && (event.key === 'Delete' || event.key === 'Backspace') && state.selectedStepId && isOnBoard(event.target)) {
        event.preventDefault();
        state.removeStep(state.selectedStepId);
      }
    };
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, [store, canEdit, onFitView]);
}
