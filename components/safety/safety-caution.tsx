'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Notice } from '@/components/ui/notice';
import { apiFetch } from '@/lib/queries/api-fetch';
import { meKeys, useProfile } from '@/lib/queries/me';
import type { ProfileDto } from '@/lib/services/users/get-profile';
import { CAUTION_FULL, CAUTION_SHORT, CAUTION_TITLE } from '@/lib/safety/caution-text';

// Saves the fold on the server (per person, every device) and shows it at once.
function useCautionFold() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (cautionCollapsed: boolean) => apiFetch<unknown>('/api/me/preferences', { method: 'PATCH', body: { cautionCollapsed } }),
    onMutate: (cautionCollapsed) => {
      const before = queryClient.getQueryData<ProfileDto>(meKeys.profile());
      if (before) queryClient.setQueryData<ProfileDto>(meKeys.profile(), { ...before, cautionCollapsed });
      return { before };
    },
    onError: (_error, _value, context) => {
      if (context?.before) queryClient.setQueryData(meKeys.profile(), context.before);
    },
  });
}

/**
 * Shown wherever routes are judged (the editor, the comparison, decisions): the screen's limits, in plain words.
 * Once read it folds to one line, remembered per person; the one line never goes. Printed reports (`always`) keep
 * the full text whatever the reader chose, since paper travels to people who have not read it.
 */
export function SafetyCaution({ always = false }: { always?: boolean }) {
  const { data: profile } = useProfile();
  const fold = useCautionFold();
  const folded = !always && (profile?.cautionCollapsed ?? false);

  if (folded) {
    return (
      <div role="note" aria-label="Safety caution" data-testid="safety-caution" data-folded="true" className="flex flex-wrap items-center gap-x-2 rounded-md border border-brass-500/40 bg-brass-100 px-3 py-1 text-xs text-brass-700">
        <span aria-hidden="true">⚠</span>
        <span className="flex-1">{CAUTION_SHORT}</span>
        <button type="button" className="underline underline-offset-2 hover:text-ink print:hidden" onClick={() => fold.mutate(false)}>
          Show in full
        </button>
      </div>
    );
  }
  return (
    <div data-testid="safety-caution" data-folded="false">
      <Notice tone="caution" title={CAUTION_TITLE}>
        {CAUTION_FULL}
        {always || !profile ? null : (
          <div className="mt-1 print:hidden">
            <button type="button" className="text-xs underline underline-offset-2 hover:text-ink" onClick={() => fold.mutate(true)}>
              I have read this: fold it to one line
            </button>
            {fold.isError ? <span className="ml-2 text-xs text-uphill">Could not save that choice: {fold.error.message}</span> : null}
          </div>
        )}
      </Notice>
    </div>
  );
}
