import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { zodFields } from '../../api/error-response';
import { TeamSpeciesInput } from '../../schemas/species';
import { buildSpecies, type BuiltSpecies } from '../../species/build-species';
import { recordEvent } from '../audit/record-event';
import { findFitRow } from '../fits/read-fits';
import { toTeamSpeciesDto, type TeamSpeciesDto } from './species-dto';
import { invalidateTeamLookup } from './team-lookup';
import { columnsOf } from './team-species-record';

export type { TeamSpeciesInput } from '../../schemas/species';

/** Parses and checks one species as entered; VALIDATION with per-field messages otherwise. */
export function readTeamSpecies(input: unknown): { species: BuiltSpecies; warnings: string[] } {
  const parsed = TeamSpeciesInput.safeParse(input);
  if (!parsed.success) throw new AppError('VALIDATION', 'Some fields need attention.', { fields: zodFields(parsed.error) });
  const built = buildSpecies(parsed.data);
  if (!built.ok) throw new AppError('VALIDATION', 'Some values need attention.', { fields: built.errors });
  return { species: built.species, warnings: built.warnings };
}

/** A measured value may point at a saved fit of this team only; another team's fit answers 404 like any foreign id. */
export async function checkProvenanceFit({ teamId, species, transaction }: { teamId: number; species: BuiltSpecies; transaction: Transaction }): Promise<void> {
  const { provenance } = species;
  if (provenance.kind === 'measured' && provenance.fitId !== null) await findFitRow({ teamId, fitId: provenance.fitId, transaction });
}

/** Invalidates the team's lookup once the writing transaction has committed (and now, for readers in between). */
export function invalidateAfter(teamId: number, transaction: Transaction): void {
  invalidateTeamLookup(teamId);
  transaction.afterCommit(() => invalidateTeamLookup(teamId));
}

/**
 * Adds a team species. `input` is the form's shape (values with their units, provenance required).
 * Pass `transaction` to make it part of a larger write (e.g. creating a species from a saved fit).
 */
export async function createTeamSpecies({
  teamId, userId, input, importId = null, transaction,
}: { teamId: number; userId: number; input: TeamSpeciesInput | unknown; importId?: number | null; transaction?: Transaction }): Promise<TeamSpeciesDto & { warnings: string[] }> {
  const { species, warnings } = readTeamSpecies(input);
  const { sequelize, models } = getDb();
  const run = async (t: Transaction) => {
    await checkProvenanceFit({ teamId, species, transaction: t });
    const existing = await models.TeamSpecies.findOne({ where: { teamId, key: species.key }, transaction: t });
    if (existing) {
      throw new AppError('CONFLICT', `Your team already has ${species.key} (“${existing.name}”); edit that one instead.`, {
        fields: { formula: `${species.key} already exists in your team.` }, details: { teamSpeciesId: existing.id },
      });
    }
    const row = await models.TeamSpecies.create({ teamId, ...columnsOf(species), importId, createdById: userId, updatedById: userId }, { transaction: t });
    await recordEvent({ teamId, actorId: userId, action: 'species.created', targetType: 'team_species', targetId: row.id, data: { key: row.key } }, t);
    invalidateAfter(teamId, t);
    return { ...toTeamSpeciesDto(row), warnings };
  };
  return transaction ? run(transaction) : sequelize.transaction(run);
}
