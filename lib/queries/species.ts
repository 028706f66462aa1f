import { queryOptions } from '@tanstack/react-query';
import type { SpeciesImpactRequest, SpeciesImportCommit, TeamSpeciesInput } from '../schemas/species';
import type { SpeciesDetailDto } from '../services/species/get-species';
import type { ImportPreviewDto } from '../services/species/import-preview';
import type { SpeciesPage } from '../services/species/list-species';
import type { RouteImpact } from '../services/species/species-impact';
import type { TeamSpeciesDto } from '../services/species/species-dto';
import { ApiError, apiFetch } from './api-fetch';

export interface SpeciesFilters {
  q: string;
  phase: '' | 'g' | 'l' | 's' | 'aq';
  origin: '' | 'library' | 'team';
  page: number;
  pageSize: number;
}

export const speciesKeys = {
  all: ['species'] as const,
  lists: () => [...speciesKeys.all, 'list'] as const,
  list: (f: SpeciesFilters) => [...speciesKeys.lists(), f] as const,
  detail: (key: string) => [...speciesKeys.all, 'detail', key] as const,
  team: (id: number) => [...speciesKeys.all, 'team', id] as const,
  imports: () => [...speciesKeys.all, 'imports'] as const,
  import: (id: number) => [...speciesKeys.imports(), id] as const,
};

const noRetryOn404 = (count: number, error: Error) => !(error instanceof ApiError && error.status === 404) && count < 1;

export const speciesListQuery = (f: SpeciesFilters) =>
  queryOptions({
    queryKey: speciesKeys.list(f),
    queryFn: () => {
      const params = new URLSearchParams({ page: String(f.page), pageSize: String(f.pageSize) });
      if (f.q.trim()) params.set('q', f.q.trim());
      if (f.phase) params.set('phase', f.phase);
      if (f.origin) params.set('origin', f.origin);
      return apiFetch<SpeciesPage>(`/api/species?${params}`);
    },
    placeholderData: (previous) => previous,
  });

export const speciesDetailQuery = (key: string) =>
  queryOptions({ queryKey: speciesKeys.detail(key), queryFn: () => apiFetch<SpeciesDetailDto>(`/api/species/${encodeURIComponent(key)}`), retry: noRetryOn404 });

export const teamSpeciesQuery = (id: number) =>
  queryOptions({ queryKey: speciesKeys.team(id), queryFn: () => apiFetch<TeamSpeciesDto>(`/api/species/team/${id}`), retry: noRetryOn404 });

export const speciesImportsQuery = () =>
  queryOptions({ queryKey: speciesKeys.imports(), queryFn: () => apiFetch<{ items: ImportPreviewDto[] }>('/api/species/imports') });

export const createTeamSpecies = (input: TeamSpeciesInput) => apiFetch<TeamSpeciesDto & { warnings: string[] }>('/api/species', { method: 'POST', body: input });

/** `smiles`: absent keeps the structure, null removes it, a SMILES sets it. */
export const updateTeamSpecies = (id: number, version: number, species: TeamSpeciesInput, smiles?: string | null) =>
  apiFetch<{ species: TeamSpeciesDto; warnings: string[]; impact: RouteImpact[] }>(`/api/species/team/${id}`, { method: 'PUT', body: { version, species, ...(smiles === undefined ? {} : { smiles }) } });

export const previewSpeciesImpact = (body: SpeciesImpactRequest) =>
  apiFetch<{ key: string; dfG_kJ: number; dfGDerived: boolean; warnings: string[]; impact: RouteImpact[] }>('/api/species/impact', { method: 'POST', body });

export const commitSpeciesImport = (id: number, body: SpeciesImportCommit) =>
  apiFetch<{ id: number; created: number; overridden: number; skipped: number }>(`/api/species/imports/${id}/commit`, { method: 'POST', body });

/** Sends the file as it is (text/csv), so the server stores exactly the bytes chosen. */
export async function uploadSpeciesCsv(file: File): Promise<ImportPreviewDto> {
  const response = await fetch(`/api/species/imports?fileName=${encodeURIComponent(file.name)}`, {
    method: 'POST', headers: { 'content-type': 'text/csv' }, body: file, credentials: 'same-origin',
  });
  const text = await response.text();
  let data: unknown;
  try {
    data = text ? JSON.parse(text) : undefined;
  } catch {
    data = undefined;
  }
  if (!response.ok) {
    const error = (data as { error?: { code: string; message: string; fields?: Record<string, string>; details?: Record<string, unknown> } } | undefined)?.error;
    throw new ApiError(response.status, error?.code ?? `HTTP_${response.status}`, error?.message ?? `Upload failed (${response.status}).`, error?.fields, error?.details);
  }
  return data as ImportPreviewDto;
}
