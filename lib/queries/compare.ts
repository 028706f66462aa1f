import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { Comparison } from '../compare/compare-types';
import type { WhatIf } from '../schemas/compare';
import type { DecisionInput } from '../schemas/decision';
import { apiFetch } from './api-fetch';

export function compareUrl(ids: readonly number[], whatIf: WhatIf = {}): string {
  const params = new URLSearchParams({ ids: ids.join(',') });
  if (whatIf.temperatureOffset_K) params.set('temperatureOffset_K', String(whatIf.temperatureOffset_K));
  if (whatIf.standardPressure) params.set('standardPressure', whatIf.standardPressure);
  return `/api/compare?${params.toString()}`;
}

export const compareQuery = (ids: readonly number[], whatIf: WhatIf) =>
  queryOptions({
    queryKey: ['compare', ids.join(','), whatIf.temperatureOffset_K ?? 0, whatIf.standardPressure ?? ''] as const,
    queryFn: () => apiFetch<Comparison>(compareUrl(ids, whatIf)),
    placeholderData: keepPreviousData,
    retry: false,
  });

export const recordDecision = (input: DecisionInput) => apiFetch<{ decision: { id: number }; caution: string }>('/api/decisions', { method: 'POST', body: input });
