import { queryOptions } from '@tanstack/react-query';
import type { RevisionDiff } from '../services/revisions/revision-diff';
import type { RevisionDto, RevisionSummaryDto } from '../services/revisions/revision-dto';
import type { RouteDocumentDto } from '../services/routes/route-dto';
import type { TransitionDto } from '../services/workflow/transition-dto';
import type { TransitionInput } from '../schemas/workflow';
import { apiFetch } from './api-fetch';

export interface Paged<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const reviewKeys = {
  route: (routeId: number) => ['review', routeId] as const,
  revisions: (routeId: number, page: number) => [...reviewKeys.route(routeId), 'revisions', page] as const,
  revision: (routeId: number, revisionId: number) => [...reviewKeys.route(routeId), 'revision', revisionId] as const,
  compare: (routeId: number, from: number, to: number) => [...reviewKeys.route(routeId), 'compare', from, to] as const,
  transitions: (routeId: number) => [...reviewKeys.route(routeId), 'transitions'] as const,
};

export const revisionsQuery = (routeId: number, page: number) =>
  queryOptions({
    queryKey: reviewKeys.revisions(routeId, page),
    queryFn: () => apiFetch<Paged<RevisionSummaryDto>>(`/api/routes/${routeId}/revisions?page=${page}&pageSize=20`),
  });

export const revisionCompareQuery = (routeId: number, from: number, to: number) =>
  queryOptions({
    queryKey: reviewKeys.compare(routeId, from, to),
    queryFn: () => apiFetch<{ from: RevisionSummaryDto; to: RevisionSummaryDto; diff: RevisionDiff; stepLabels: Record<string, string> }>(`/api/routes/${routeId}/revisions/compare?from=${from}&to=${to}`),
    staleTime: Infinity,
  });

export const revisionQuery = (routeId: number, revisionId: number) =>
  queryOptions({ queryKey: reviewKeys.revision(routeId, revisionId), queryFn: () => apiFetch<RevisionDto>(`/api/routes/${routeId}/revisions/${revisionId}`), staleTime: Infinity });

export const transitionsQuery = (routeId: number) =>
  queryOptions({ queryKey: reviewKeys.transitions(routeId), queryFn: () => apiFetch<Paged<TransitionDto>>(`/api/routes/${routeId}/transitions?pageSize=50`) });

export const restoreRevision = (routeId: number, revisionId: number, version: number) =>
  apiFetch<{ route: RouteDocumentDto }>(`/api/routes/${routeId}/revisions/${revisionId}/restore`, { method: 'POST', body: { version } });

export const moveRoute = (routeId: number, input: TransitionInput) =>
  apiFetch<{ route: { id: number; status: string; version: number }; transition: TransitionDto }>(`/api/routes/${routeId}/transitions`, { method: 'POST', body: input });
