import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';

export async function setActiveTeam({ userId, teamId }: { userId: number; teamId: number }) {
  const { Membership, UserPreference } = getDb().models;
  const membership = await Membership.findOne({ where: { userId, teamId } });
  if (!membership) throw new AppError('NOT_FOUND', 'No such team.');
  const [row] = await UserPreference.findOrCreate({ where: { userId }, defaults: { userId } });
  await row.update({ activeTeamId: teamId });
  return { activeTeamId: teamId, role: membership.role };
}
