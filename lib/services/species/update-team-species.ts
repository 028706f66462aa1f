import 'server-only';
import { Op } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { recordEvent } from '../audit/record-event';
import { forUpdate } from '../row-lock';
import { checkProvenanceFit, invalidateAfter, readTeamSpecies } from './create-team-species';
import { changeImpact } from './preview-species-change';
import { toTeamSpeciesDto } from './species-dto';
import { columnsOf } from './team-species-record';

/** Saves an edit if the caller saw the latest version; the answer lists the routes whose ΔG changed. */
export async function updateTeamSpecies({ teamId, userId, id, version, input }: { teamId: number; userId: number; id: number; version: number; input: unknown }) {
  const { species, warnings } = readTeamSpecies(input);
  const { sequelize, models } = getDb();
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
    if (clash) throw new AppError('CONFLICT', `Your team already has ${species.key} (“${clash.name}”).`, { fields: { formula: `${species.key} already exists in your team.` } });
    const impact = await changeImpact({ teamId, species, replacedKey: row.key, id, version: version + 1, transaction });
    const previousKey = row.key;
    await row.update({ ...columnsOf(species), version: version + 1, updatedById: userId }, { transaction });
    await recordEvent({
      teamId, actorId: userId, action: 'species.updated', targetType: 'team_species', targetId: id,
      data: { key: row.key, ...(previousKey !== row.key ? { previousKey } : {}), version: row.version, routesChanged: impact.map((r) => r.routeId) },
    }, transaction);
    invalidateAfter(teamId, transaction);
    await row.reload({ include: [{ association: 'updatedBy', attributes: ['name'] }], transaction });
    return { species: toTeamSpeciesDto(row), warnings, impact };
  });
}
