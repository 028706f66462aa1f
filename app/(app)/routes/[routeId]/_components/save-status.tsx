'use client';

import { useRouteEditorStore } from '@/stores/route-editor-store';

const TEXT = { saved: 'Saved', unsaved: 'Unsaved changes', saving: 'Saving…', error: 'Not saved', conflict: 'Not saved: changed elsewhere' } as const;

export function SaveStatus({ isEvaluating, onRetry }: { isEvaluating: boolean; onRetry: () => void }) {
  const status = useRouteEditorStore((s) => s.saveStatus);
  const error = useRouteEditorStore((s) => s.saveError);
  return (
    <div className="flex items-center gap-3 text-xs">
      <p role="status" aria-live="polite" data-testid="save-status" className={status === 'error' || status === 'conflict' ? 'font-semibold text-uphill' : 'text-ink-soft'}>
        {TEXT[status]}
        {status === 'error' && error ? `: ${error}` : null}
      </p>
      {status === 'error' ? (
        <button type="button" onClick={onRetry} className="text-pine-700 underline">
          Retry
        </button>
      ) : null}
      <p aria-live="polite" className="min-w-20 text-ink-faint">
        {isEvaluating ? 'evaluating…' : ''}
      </p>
    </div>
  );
}
