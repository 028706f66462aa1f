'use client';

import { useQuery } from '@tanstack/react-query';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { balanceQuery } from '@/lib/queries/routes';
import type { StepInput } from '@/lib/schemas/route';
import { NewSpeciesForError } from './step-species';

// The live balance check under the equation field; "Balance" swaps in the smallest-integer form.
export function BalanceCheck({ equation, species, canEdit, onApply }: { equation: string; species?: StepInput['species']; canEdit: boolean; onApply: (balanced: string) => void }) {
  const settled = useDebouncedValue(equation.trim(), 400);
  const check = useQuery({ ...balanceQuery(settled, species), enabled: settled.length > 0 });

  if (!settled) return null;
  const answer = check.data;
  return (
    <div aria-live="polite" className="text-xs" data-testid="balance-check">
      {check.isPending ? (
        <p className="text-ink-faint">Checking balance…</p>
      ) : check.isError ? (
        <p className="text-uphill">{check.error.message}</p>
      ) : answer && 'error' in answer ? (
        <>
          <p className="text-uphill">
            <span aria-hidden="true">✗ </span>
            {answer.error.message}
          </p>
          {canEdit ? <NewSpeciesForError error={answer.error} species={species} /> : null}
        </>
      ) : answer && answer.unknownSpecies?.length ? (
        // Balanced or not, a species the library lacks stops the evaluation: never a green tick for it.
        <>
          <p className="text-uphill" data-testid="balance-unknown-species">
            <span aria-hidden="true">✗ </span>
            {answer.message}
          </p>
          {canEdit ? <NewSpeciesForError error={{ code: 'UNKNOWN_SPECIES', message: `Not in the species library: ${answer.unknownSpecies.join('; ')}` }} species={species} /> : null}
        </>
      ) : answer?.isBalanced ? (
        <p className="text-downhill">
          <span aria-hidden="true">✓ </span>
          {answer.message}
        </p>
      ) : answer ? (
        <div className="flex flex-wrap items-center gap-2 text-marginal">
          <p>
            <span aria-hidden="true">≠ </span>
            {answer.message}
          </p>
          {canEdit && answer.balanced ? (
            <button
              type="button"
              onClick={() => onApply(answer.balanced!)}
              className="rounded border border-pine-500 bg-white px-1.5 py-0.5 font-medium text-pine-700 hover:bg-pine-50"
              title={answer.balanced}
            >
              Balance
            </button>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
