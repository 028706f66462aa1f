import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { formationSeries, type FormationSeries } from '../../species/formation-series';
import { builtinLookup } from '../../thermo/species-library';
import type { SpeciesRecord } from '../../thermo/species-types';
import { toTeamSpeciesDto, type TeamSpeciesDto } from './species-dto';
import { speciesUses, type SpeciesUse } from './species-usage';
import { teamLookup } from './team-lookup';

export interface SpeciesDetailDto {
  key: string;
  /** the record this team's evaluations use */
  inUse: 'library' | 'team';
  team: TeamSpeciesDto | null;
  /** the built-in record of the same key, whether or not the team's replaces it */
  builtin: SpeciesRecord | null;
  series: FormationSeries;
  /** series of the built-in record when the team's replaces it, to compare */
  builtinSeries: FormationSeries | null;
  routes: SpeciesUse[];
}

/** Every value of one species with its uncertainty and source, its Cp°(T) and ΔfG°(T), and the team's routes using it. */
export async function getSpecies({ teamId, key }: { teamId: number; key: string }): Promise<SpeciesDetailDto> {
  const row = await getDb().models.TeamSpecies.findOne({ where: { teamId, key }, include: [{ association: 'updatedBy', attributes: ['name'] }] });
  const builtin = builtinLookup.get(key) ?? null;
  if (!row && !builtin) throw new AppError('NOT_FOUND', `No species ${key} in the library or in your team.`);
  const lookup = await teamLookup(teamId);
  const record = lookup.get(key) ?? builtin!;
  const uses = await speciesUses({ teamId, lookup, keys: new Set([key]) });
  return {
    key,
    inUse: row ? 'team' : 'library',
    team: row ? toTeamSpeciesDto(row) : null,
    builtin,
    series: formationSeries(record, lookup),
    builtinSeries: row && builtin ? formationSeries(builtin, builtinLookup) : null,
    routes: uses.get(key) ?? [],
  };
}
