import 'server-only';
import { Op } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { recordEvent } from '../audit/record-event';
import { forUpdate } from '../row-lock';
import { checkProvenanceFit, invalidateAfter, readTeamSpecies } from './create-team-species';
import { changeImpact } from './preview-species-change';
import { toTeamSpeciesDto } from './species-dto';
import { createdFromStructure } from './species-structure-key';
import { columnsOf } from './team-species-record';

/**
 * Saves an edit if the caller saw the latest version; the answer lists the routes whose ΔG changed.
 * `smiles` changes the structure (null removes it; absent keeps it); a structure sets the formula and the key.
 */
export async function updateTeamSpecies({ teamId, userId, id, version, input, smiles }: { teamId: number; userId: number; id: number; version: number; input: unknown; smiles?: string | null }) {
  const read = readTeamSpecies(input);
  const { warnings } = read;
  const { sequelize, models } = getDb();
  const current = await models.TeamSpecies.findOne({ where: { id, teamId }, attributes: ['smiles'] });
  const wanted = smiles === undefined ? (current?.smiles ?? null) : smiles;
  const { species, structure } = await createdFromStructure(read.species, wanted);
  return sequelize.transaction(async (transaction) => {
    const row = await models.TeamSpecies.findOne({ where: { id, teamId }, ...forUpdate(transaction) });
    if (!row) throw new AppError('NOT_FOUND', 'No such team species.');
    await checkProvenanceFit({ teamId, species, transaction });
    if (row.version !== version) {
      throw new AppError('CONFLICT', `Someone saved this species since you opened it (version ${row.version}, you had ${version}). Reload to see their values.`, {
        details: { currentVersion: row.version },
      });
    }
    const clash = await models.TeamSpecies.findOne({ where: { teamId, key: species.key, id: { [Op.ne]: id } }, transaction });
    if (clash) {
      const field = structure.smiles ? 'smiles' : 'formula';
      throw new AppError('CONFLICT', `Your team already has ${structure.smiles ? 'this structure in this phase' : species.key} (“${clash.name}”).`, { fields: { [field]: `Already in your team as “${clash.name}”.` } });
    }
    const impact = await changeImpact({ teamId, species, structure, replacedKey: row.key, id, version: version + 1, transaction });
    const previousKey = row.key;
    await row.update({ ...columnsOf(species, structure), version: version + 1, updatedById: userId }, { transaction });
    await recordEvent({
      teamId, actorId: userId, action: 'species.updated', targetType: 'team_species', targetId: id,
      data: { key: row.key, ...(previousKey !== row.key ? { previousKey } : {}), version: row.version, routesChanged: impact.map((r) => r.routeId) },
    }, transaction);
    invalidateAfter(teamId, transaction);
    await row.reload({ include: [{ association: 'updatedBy', attributes: ['name'] }], transaction });
    return { species: toTeamSpeciesDto(row), warnings, impact };
  });
}
