import 'server-only';
import { getDb } from '../../../db';
import type { SpeciesResolveRequest } from '../../schemas/species-resolve';
import { describeSpecies, type SpeciesAnswer } from '../../thermo/structure/species-answer';
import { readStructure } from './read-structure';
import { teamLookup } from './team-lookup';

export type ResolvedSpecies = SpeciesAnswer & {
  /** the team's own species for this structure and phase, when it has one (its page and edit page use the id) */
  teamSpecies: { id: number; name: string } | null;
};

/** One species as this team's requests would use it: team species first, then the library, then an estimate. */
export async function resolveSpecies({ teamId, request }: { teamId: number; request: SpeciesResolveRequest }): Promise<ResolvedSpecies> {
  const { molfile, ...rest } = request;
  // A molfile is read by RDKit and goes on as its canonical SMILES; errors still name the molfile field.
  const asSmiles = molfile === undefined ? rest : { ...rest, smiles: (await readStructure({ molfile })).structure.smiles };
  const answer = describeSpecies(await teamLookup(teamId), asSmiles);
  const own = answer.inchikey
    ? await getDb().models.TeamSpecies.findOne({ where: { teamId, inchikey: answer.inchikey, phase: answer.phase }, attributes: ['id', 'name'] })
    : null;
  return { ...answer, teamSpecies: own ? { id: own.id, name: own.name } : null };
}
