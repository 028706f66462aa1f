import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { toTeamSpeciesDto } from './species-dto';

export async function getTeamSpecies({ teamId, id }: { teamId: number; id: number }) {
  const row = await getDb().models.TeamSpecies.findOne({ where: { id, teamId }, include: [{ association: 'updatedBy', attributes: ['name'] }] });
  if (!row) throw new AppError('NOT_FOUND', 'No such team species.');
  return toTeamSpeciesDto(row);
}
