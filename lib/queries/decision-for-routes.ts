import { queryOptions } from '@tanstack/react-query';
import type { DecisionListDto, DecisionSummaryDto } from '../services/decisions/decision-dto';
import { apiFetch } from './api-fetch';

/** The newest standing decision that compared exactly these routes, for the report; null when none. */
export function standingDecisionFor(items: readonly DecisionSummaryDto[], ids: readonly number[]): DecisionSummaryDto | null {
  const wanted = [...ids].sort((a, b) => a - b).join(',');
  return items.find((d) => d.supersededById === null && d.routes.map((r) => r.id).sort((a, b) => a - b).join(',') === wanted) ?? null;
}

export const latestDecisionQuery = (ids: readonly number[]) =>
  queryOptions({
    queryKey: ['decisions', 'standing', [...ids].sort((a, b) => a - b).join(',')] as const,
    queryFn: async () => standingDecisionFor((await apiFetch<DecisionListDto>('/api/decisions?pageSize=100')).items, ids),
  });
