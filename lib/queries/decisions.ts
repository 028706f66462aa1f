import { queryOptions } from '@tanstack/react-query';
import type { DecisionDetailDto, DecisionListDto } from '../services/decisions/decision-dto';
import { ApiError, apiFetch } from './api-fetch';

export const decisionKeys = {
  all: ['decisions'] as const,
  lists: () => [...decisionKeys.all, 'list'] as const,
  list: (paging: { page: number; pageSize: number }) => [...decisionKeys.lists(), paging] as const,
  detail: (decisionId: number) => [...decisionKeys.all, 'detail', decisionId] as const,
};

/** The team's decision log, newest first, one server page at a time. */
export const decisionListQuery = (paging: { page: number; pageSize: number }) =>
  queryOptions({
    queryKey: decisionKeys.list(paging),
    queryFn: () => apiFetch<DecisionListDto>(`/api/decisions?page=${paging.page}&pageSize=${paging.pageSize}`),
    placeholderData: (previous) => previous,
    // A decision just recorded on the compare page must show on arrival here.
    staleTime: 0,
  });

/** One decision with the snapshot it was made on; a missing or foreign id is a 404, not worth a retry. */
export const decisionDetailQuery = (decisionId: number) =>
  queryOptions({
    queryKey: decisionKeys.detail(decisionId),
    queryFn: () => apiFetch<DecisionDetailDto>(`/api/decisions/${decisionId}`),
    staleTime: 0, // its "superseded by" can change
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 1,
  });
