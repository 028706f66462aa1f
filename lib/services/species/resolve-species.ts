import 'server-only';
import type { SpeciesResolveRequest } from '../../schemas/species-resolve';
import { describeSpecies, type SpeciesAnswer } from '../../thermo/structure/species-answer';
import { teamLookup } from './team-lookup';

/** One species as this team's requests would use it: team species first, then the library, then an estimate. */
export async function resolveSpecies({ teamId, request }: { teamId: number; request: SpeciesResolveRequest }): Promise<SpeciesAnswer> {
  return describeSpecies(await teamLookup(teamId), request);
}
