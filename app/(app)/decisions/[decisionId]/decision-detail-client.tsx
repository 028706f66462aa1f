'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { DecisionRouteName, DecisionStanding } from '@/components/tables/decision-columns';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { When } from '@/components/ui/when';
import { ApiError } from '@/lib/queries/api-fetch';
import { decisionDetailQuery } from '@/lib/queries/decisions';
import { useProfile } from '@/lib/queries/me';
import type { DecisionDetailDto } from '@/lib/services/decisions/decision-dto';
import { SnapshotMetrics, whatIfText } from '../_components/snapshot-metrics';
import { SafetyCaution } from '@/components/safety/safety-caution';

const BACK = (
  <Link href="/decisions" className="text-sm text-pine-700 underline-offset-2 hover:underline">
    ← All decisions
  </Link>
);

export function DecisionDetailClient({ decisionId }: { decisionId: number }) {
  const decision = useQuery(decisionDetailQuery(decisionId));
  if (decision.isPending) {
    return (
      <p className="py-6 text-sm text-ink-soft" role="status">
        Loading decision…
      </p>
    );
  }
  if (decision.isError) {
    if (decision.error instanceof ApiError && decision.error.status === 404) {
      return (
        <EmptyState title="No such decision" action={BACK}>
          {`Your team has no decision #${decisionId}.`}
        </EmptyState>
      );
    }
    return (
      <Notice tone="error" title="The decision could not be loaded">
        {decision.error.message}{' '}
        <button type="button" className="underline" onClick={() => decision.refetch()}>
          Try again
        </button>
      </Notice>
    );
  }
  return <DecisionDetail decision={decision.data} />;
}

export function DecisionDetail({ decision }: { decision: DecisionDetailDto }) {
  const { data: profile } = useProfile();
  const units = { energyUnit: profile?.preferences.energyUnit ?? 'kJ', temperatureUnit: profile?.preferences.temperatureUnit ?? 'K' } as const;
  const shelved = decision.routes.filter((r) => decision.shelvedRouteIds.includes(r.id));
  return (
    <div className="flex flex-col gap-4">
      <PageHeader
        title={`Decision #${decision.id}`}
        lead={
          <>
            Recorded by {decision.author?.name ?? '—'}, <When iso={decision.createdAt} className="" />.
          </>
        }
        actions={BACK}
      />
      {decision.supersededById !== null ? (
        <Notice tone="caution" title={`Superseded by decision #${decision.supersededById}`}>
          A newer decision about some of the same routes replaced this one. It stays here as the record of what was decided then.{' '}
          <Link href={`/decisions/${decision.supersededById}`} className="underline">
            See decision #{decision.supersededById}
          </Link>
        </Notice>
      ) : null}

      <dl className="grid gap-x-6 gap-y-3 text-sm sm:grid-cols-[10rem_1fr]">
        <dt className="font-medium text-ink-soft">Choice</dt>
        <dd>{decision.chosen ? <DecisionRouteName route={decision.chosen} strong /> : '—'}</dd>
        <dt className="font-medium text-ink-soft">Rationale</dt>
        <dd className="max-w-prose whitespace-pre-wrap break-words">{decision.rationale}</dd>
        <dt className="font-medium text-ink-soft">Routes compared</dt>
        <dd>
          <ul className="flex flex-col gap-0.5">
            {decision.routes.map((route) => (
              <li key={route.id}>
                <DecisionRouteName route={route} />
              </li>
            ))}
          </ul>
        </dd>
        <dt className="font-medium text-ink-soft">Shelved by it</dt>
        <dd>
          {shelved.length ? (
            <ul className="flex flex-col gap-0.5">
              {shelved.map((route) => (
                <li key={route.id}>
                  <DecisionRouteName route={route} />
                </li>
              ))}
            </ul>
          ) : (
            <span className="text-ink-faint">none</span>
          )}
        </dd>
        <dt className="font-medium text-ink-soft">Standing</dt>
        <dd>
          <DecisionStanding supersededById={decision.supersededById} />
        </dd>
      </dl>

      <section aria-labelledby="snapshot-heading" className="flex flex-col gap-2">
        <h2 id="snapshot-heading" className="text-base font-semibold text-ink">
          The comparison it was made on
        </h2>
        <p className="text-sm text-ink-soft">{whatIfText(decision.snapshot.whatIf, units.temperatureUnit)} Values are as they stood then; the routes may have changed since.</p>
        <SnapshotMetrics snapshot={decision.snapshot} units={units} chosenRouteId={decision.chosen?.id ?? null} />
      </section>

      <SafetyCaution />
    </div>
  );
}
