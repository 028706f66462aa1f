'use client';

import { useQuery } from '@tanstack/react-query';
import { ChemText } from '@/components/chemistry/chem-text';
import { commentsQuery, flagsQuery } from '@/lib/queries/comments';
import { approvalSummary, type ApprovalItem } from '@/lib/review/approval-summary';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function Items({ items, total, noun }: { items: ApprovalItem[]; total: number; noun: string }) {
  return (
    <ul className="ml-4 list-disc text-xs">
      {items.map((item, i) => (
        <li key={i}>
          <span className="font-medium">
            <ChemText text={item.place} />
          </span>
          : {item.text}
        </li>
      ))}
      {total > items.length ? <li className="list-none text-ink-faint">…and {plural(total - items.length, `more ${noun}`, `more ${noun}s`)} in the review tabs below.</li> : null}
    </ul>
  );
}

/** Before a lead approves: the open flags and unresolved threads, named by step. Same queries (and cache) as the review tabs. */
export function useApprovalCheck(routeId: number, stepLabels: Record<string, string>) {
  const flags = useQuery(flagsQuery(routeId, 'open'));
  const comments = useQuery(commentsQuery(routeId));
  const summary = flags.data && comments.data ? approvalSummary(flags.data.flags, comments.data.threads, stepLabels) : null;
  return { summary, isPending: flags.isPending || comments.isPending, error: flags.error ?? comments.error };
}

export function ApprovalCheck({ check }: { check: ReturnType<typeof useApprovalCheck> }) {
  const { summary: s, isPending, error } = check;
  if (error) {
    return (
      <p role="alert" className="text-xs text-uphill">
        Could not check the open flags and comments ({error.message}). Look at the Flags and Discussion tabs before approving.
      </p>
    );
  }
  if (isPending || !s) return <p className="text-xs text-ink-faint">Checking for open flags and comments…</p>;
  if (s.isClear) {
    return (
      <p className="text-xs text-downhill" data-testid="approval-check">
        No open flags and no unresolved comments.
      </p>
    );
  }
  return (
    <div role="note" aria-label="Open review items" data-testid="approval-check" className="flex flex-col gap-1.5 rounded-md border border-marginal/40 bg-marginal-bg px-3 py-2 text-sm">
      {s.openFlags ? (
        <div>
          <p className="font-semibold">
            {plural(s.openFlags, 'open flag', 'open flags')}
            {s.safetyFlags ? `, ${s.safetyFlags} of them on safety` : ''}
          </p>
          <Items items={s.flags} total={s.openFlags} noun="flag" />
        </div>
      ) : null}
      {s.unresolvedThreads ? (
        <div>
          <p className="font-semibold">{plural(s.unresolvedThreads, 'unresolved comment thread', 'unresolved comment threads')}</p>
          <Items items={s.threads} total={s.unresolvedThreads} noun="thread" />
        </div>
      ) : null}
      <p className="text-xs">You can still approve; the flags and threads stay open on the route.</p>
    </div>
  );
}
