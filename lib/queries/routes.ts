import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { StepStructures } from '../../components/chemistry/structure-brief';
import type { SpeciesDefinition } from '../thermo/structure/structure-lookup-type';
import type { ListRoutesQuery, RouteDraft, SaveRouteInput, StepInput } from '../schemas/route';
import type { LibraryReaction } from '../services/routes/search-library-reactions';
import type { DeletedRouteDto } from '../services/routes/list-deleted-routes';
import type { RouteAlternativesDto } from '../services/routes/list-alternatives';
import type { RouteDocumentDto, RouteSummaryDto } from '../services/routes/route-dto';
import type { BalanceCheck } from '../services/thermo/check-equation-balance';
import type { RouteEvaluateResponse } from '../thermo/route';
import { apiFetch } from './api-fetch';

export interface RouteListPage {
  items: RouteSummaryDto[];
  total: number;
  page: number;
  pageSize: number;
}

export interface RouteEvaluationAnswer {
  version: number;
  draft: boolean;
  evaluation: RouteEvaluateResponse;
}

/** PUT's evaluation is the engine's answer, or why the route as a whole could not be evaluated. */
export interface SaveRouteAnswer {
  route: RouteDocumentDto;
  evaluation: RouteEvaluateResponse | { error: { code: string; message: string; field: string | null } };
}

export type BalanceAnswer = BalanceCheck | { error: { code: string; message: string; position: number | null } };

export interface PaletteAnswer {
  recent: string[];
  library: LibraryReaction[];
  /** equation → its structures, for entries with something to draw */
  structures: Record<string, StepStructures>;
  /** recent equation → the labels its latest step binds (dropped with it, so the new step reads the same) */
  labels: Record<string, Record<string, SpeciesDefinition>>;
}

export const routeKeys = {
  all: ['routes'] as const,
  lists: () => [...routeKeys.all, 'list'] as const,
  list: (query: Partial<ListRoutesQuery>) => [...routeKeys.lists(), query] as const,
  detail: (routeId: number) => [...routeKeys.all, 'detail', routeId] as const,
  evaluations: (routeId: number) => [...routeKeys.all, 'evaluation', routeId] as const,
  /** keyed by a hash of the draft's engine fields, so moving a node never re-evaluates */
  evaluation: (routeId: number, draftHash: string) => [...routeKeys.evaluations(routeId), draftHash] as const,
  palette: (species: string) => [...routeKeys.all, 'palette', species] as const,
  balance: (equation: string, species?: unknown) => ['balance', equation, species ?? null] as const,
  drivers: () => ['drivers'] as const,
};

export const routeListQuery = (query: Partial<ListRoutesQuery>) =>
  queryOptions({
    queryKey: routeKeys.list(query),
    queryFn: () => {
      const params = new URLSearchParams(Object.entries(query).filter(([, v]) => v !== undefined && v !== '').map(([k, v]) => [k, String(v)]));
      return apiFetch<RouteListPage>(`/api/routes?${params.toString()}`);
    },
    placeholderData: (previous) => previous,
  });

export const routeDetailQuery = (routeId: number) =>
  queryOptions({ queryKey: routeKeys.detail(routeId), queryFn: () => apiFetch<RouteDocumentDto>(`/api/routes/${routeId}`) });

// The previous ladder stays on screen (placeholder) while the next draft evaluates.
export const routeEvaluationQuery = (routeId: number, draftHash: string, draft: RouteDraft) =>
  queryOptions({
    queryKey: routeKeys.evaluation(routeId, draftHash),
    queryFn: () => apiFetch<RouteEvaluationAnswer>(`/api/routes/${routeId}/evaluate`, { method: 'POST', body: draft }),
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    gcTime: 60_000,
    retry: false,
  });

/** `species` is the step's label map, so labels in the equation are read as the step defines them. */
export const balanceQuery = (equation: string, species?: StepInput['species']) =>
  queryOptions({
    queryKey: routeKeys.balance(equation, species),
    queryFn: () => apiFetch<BalanceAnswer>('/api/balance', { method: 'POST', body: species && Object.keys(species).length ? { equation, species } : { equation } }),
    staleTime: Infinity,
    retry: false,
  });

export const paletteQuery = (species: string) =>
  queryOptions({
    queryKey: routeKeys.palette(species),
    queryFn: () => apiFetch<PaletteAnswer>(`/api/palette${species ? `?species=${encodeURIComponent(species)}` : ''}`),
    placeholderData: keepPreviousData,
  });

export const createRoute = (input: { name: string; target: string; targetAmount: string }) =>
  apiFetch<RouteDocumentDto>('/api/routes', { method: 'POST', body: input });

export const saveRoute = (routeId: number, input: SaveRouteInput) =>
  apiFetch<SaveRouteAnswer>(`/api/routes/${routeId}`, { method: 'PUT', body: input });

export const duplicateRoute = (routeId: number, name?: string) =>
  apiFetch<RouteDocumentDto>(`/api/routes/${routeId}/duplicate`, { method: 'POST', body: name ? { name } : {} });

export const setRouteArchived = (routeId: number, archived: boolean) =>
  apiFetch<unknown>(`/api/routes/${routeId}/archive`, { method: 'POST', body: { archived } });

export interface DeletedRouteListPage {
  items: DeletedRouteDto[];
  total: number;
  page: number;
  pageSize: number;
}

// Under routeKeys.lists(), so every change that refreshes the lists refreshes this one too.
export const deletedRouteKeys = {
  list: (paging: { page: number; pageSize: number }) => [...routeKeys.lists(), 'deleted', paging] as const,
};

/** Routes deleted within the undo window, newest deletion first (leads only). */
export const deletedRouteListQuery = (paging: { page: number; pageSize: number }) =>
  queryOptions({
    queryKey: deletedRouteKeys.list(paging),
    queryFn: () => apiFetch<DeletedRouteListPage>(`/api/routes?deleted=1&page=${paging.page}&pageSize=${paging.pageSize}`),
    placeholderData: (previous) => previous,
  });

export interface DeletedRouteAnswer {
  id: number;
  deleted: true;
  deletedAt: string;
  restorableUntil: string;
}

export const deleteRoute = (routeId: number) => apiFetch<DeletedRouteAnswer>(`/api/routes/${routeId}`, { method: 'DELETE' });

export const undeleteRoute = (routeId: number) => apiFetch<{ id: number; deleted: false; version: number }>(`/api/routes/${routeId}/undelete`, { method: 'POST', body: {} });

/** How long a lead can bring a deleted route back (the server's window; shown in the UI's wording). */
export { UNDELETE_WINDOW_DAYS as UNDELETE_DAYS } from '../schemas/route';

// Under routeKeys.lists(), so duplicating, archiving or deleting a route refreshes the menu too.
export const routeAlternativesKeys = {
  of: (routeId: number) => [...routeKeys.lists(), 'alternatives', routeId] as const,
};

/** The route a route was duplicated from and the routes duplicated from it (deleted ones left out). */
export const routeAlternativesQuery = (routeId: number) =>
  queryOptions({ queryKey: routeAlternativesKeys.of(routeId), queryFn: () => apiFetch<RouteAlternativesDto>(`/api/routes/${routeId}/alternatives`) });

/** Posts a parsed route file; the server checks it field by field and creates nothing when one is wrong. */
export const importRouteFile = (file: unknown) => apiFetch<RouteDocumentDto>('/api/routes/import', { method: 'POST', body: file });

/** The compare page for these routes, in the order given (the page's first column is the first id). */
export const comparePageHref = (ids: readonly number[]) => `/routes/compare?ids=${ids.join(',')}`;
