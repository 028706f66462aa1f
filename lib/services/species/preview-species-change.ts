import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { BuiltSpecies } from '../../species/build-species';
import { layeredLookup } from '../../thermo/species-library';
import { readTeamSpecies } from './create-team-species';
import { speciesImpact, type RouteImpact } from './species-impact';
import { teamLookup, teamSpeciesRecords } from './team-lookup';
import { createdFromStructure } from './species-structure-key';
import { columnsOf, toSpeciesRecord, type StoredStructure } from './team-species-record';

/** The team's lookup and the one it would have with `species` saved (replacing `replacedKey`, if any). */
export async function lookupsForChange({ teamId, species, structure, replacedKey, id, version, transaction }: {
  teamId: number; species: BuiltSpecies; structure?: StoredStructure; replacedKey: string | null; id: number; version: number; transaction?: Transaction;
}) {
  const records = await teamSpeciesRecords(teamId, transaction);
  const proposed = toSpeciesRecord({ id, version, ...columnsOf(species, structure) });
  const kept = records.filter((r) => r.key !== replacedKey && r.key !== species.key);
  return { before: await teamLookup(teamId, transaction), after: layeredLookup([...kept, proposed]) };
}

export async function changeImpact(opts: { teamId: number; species: BuiltSpecies; structure?: StoredStructure; replacedKey: string | null; id: number; version: number; transaction?: Transaction }): Promise<RouteImpact[]> {
  const { before, after } = await lookupsForChange(opts);
  const keys = new Set([opts.species.key, ...(opts.replacedKey ? [opts.replacedKey] : [])]);
  return speciesImpact({ teamId: opts.teamId, keys, before, after, transaction: opts.transaction });
}

/** Which of the team's routes would change their ΔG if this species were saved; writes nothing. */
export async function previewSpeciesChange({ teamId, input, teamSpeciesId, smiles }: { teamId: number; input: unknown; teamSpeciesId: number | null; smiles?: string | null }) {
  const read = readTeamSpecies(input);
  const { warnings } = read;
  let replacedKey: string | null = null;
  let version = 1;
  let currentSmiles: string | null = null;
  if (teamSpeciesId !== null) {
    const row = await getDb().models.TeamSpecies.findOne({ where: { id: teamSpeciesId, teamId } });
    if (!row) throw new AppError('NOT_FOUND', 'No such team species.', { fields: { teamSpeciesId: 'Not a species of your team.' } });
    replacedKey = row.key;
    version = row.version + 1;
    currentSmiles = row.smiles;
  }
  // A species known by structure keeps its structure key, so the preview matches what the save would do.
  const { species, structure } = await createdFromStructure(read.species, smiles === undefined ? currentSmiles : smiles);
  const impact = await changeImpact({ teamId, species, structure, replacedKey, id: teamSpeciesId ?? 0, version });
  return { key: species.key, dfG_kJ: species.dfG_kJ, dfGDerived: species.dfGDerived, warnings, impact };
}
