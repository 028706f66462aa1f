// New species from a structure: the estimate before anything is saved, the save, and deleting a team species.
import { queryOptions } from '@tanstack/react-query';
import type { TeamSpeciesFromStructure } from '../schemas/species-structure';
import type { ResolvedSpecies } from '../services/species/resolve-species';
import type { TeamSpeciesDto } from '../services/species/species-dto';
import { apiFetch } from './api-fetch';
import { speciesKeys } from './species';

export type StructureText = { smiles: string } | { molfile: string };
export type StructureRequest = StructureText & { phase: 'g' | 'l' | 's' | 'aq' };

export const structureKeys = {
  estimate: (request: StructureRequest) => [...speciesKeys.all, 'structure', request] as const,
};

/** The engine's answer for a pasted structure (a POST, since a molfile is too long for a URL); nothing is saved. */
export const structureEstimateQuery = (request: StructureRequest) =>
  queryOptions({
    queryKey: structureKeys.estimate(request),
    queryFn: () => apiFetch<ResolvedSpecies>('/api/species/resolve', { method: 'POST', body: request }),
    // A bad structure stays bad: say so at once instead of asking again.
    retry: false,
    staleTime: 5 * 60_000,
  });

export const createSpeciesFromStructure = (body: TeamSpeciesFromStructure) =>
  apiFetch<TeamSpeciesDto & { warnings: string[] }>('/api/species/team', { method: 'POST', body });

export const deleteTeamSpecies = (id: number, version: number) =>
  apiFetch<{ deleted: true; key: string; name: string }>(`/api/species/team/${id}?version=${version}`, { method: 'DELETE' });

/** A route that uses a team species, as the 409 of a refused delete lists it. */
export type { SpeciesInUse } from '../services/species/delete-team-species';
