'use client';

import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import { MAX_QUERY_LENGTH } from '../thermo/structure/species-search-limits';
import type { SpeciesSearchHit } from '../thermo/structure/species-search-entries';
import { apiFetch } from './api-fetch';

export type { SearchPhase, SpeciesSearchHit } from '../thermo/structure/species-search-entries';

export const speciesSearchKeys = {
  all: ['species-search'] as const,
  query: (q: string, limit: number) => [...speciesSearchKeys.all, q, limit] as const,
};

export const speciesSearchQuery = (q: string, limit = 8) =>
  queryOptions({
    queryKey: speciesSearchKeys.query(q, limit),
    queryFn: () => apiFetch<{ query: string; items: SpeciesSearchHit[] }>(`/api/species/search?${new URLSearchParams({ q, limit: String(limit) })}`),
    // The list stays while the next answer is on its way, so it does not flicker as the user types.
    placeholderData: keepPreviousData,
    staleTime: 5 * 60_000,
    retry: false,
  });

/** Matches for what the user is typing, searched 200 ms after the last key; nothing for blank or over-long text. */
export function useSpeciesSearch(text: string, limit = 8) {
  const settled = useDebouncedValue(text.trim(), 200);
  const enabled = settled.length > 0 && settled.length <= MAX_QUERY_LENGTH;
  const query = useQuery({ ...speciesSearchQuery(settled, limit), enabled });
  return { ...query, settled, enabled, isSettling: settled !== text.trim() };
}
