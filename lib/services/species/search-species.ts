import 'server-only';
import type { SpeciesSearchQuery } from '../../schemas/species-search';
import { librarySearchIndex, searchSpecies, teamSearchIndex, type SpeciesSearchHit } from '../../thermo/structure/species-search';
import { teamSpeciesRecords } from './team-lookup';

export interface SpeciesSearchAnswer {
  query: string;
  items: SpeciesSearchHit[];
}

/** Library, identifier-table and this team's species matching what the user typed, best first. */
export async function searchSpeciesForTeam({ teamId, query }: { teamId: number; query: SpeciesSearchQuery }): Promise<SpeciesSearchAnswer> {
  // The team's records are cached per change of its rows, so its index is built once per change.
  const records = await teamSpeciesRecords(teamId);
  const items = searchSpecies({ query: query.q, limit: query.limit, library: librarySearchIndex(), team: records.length > 0 ? teamSearchIndex(records) : undefined });
  return { query: query.q, items };
}
