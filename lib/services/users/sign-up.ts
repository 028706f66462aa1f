import 'server-only';
import { getDb } from '../../../db';
import type { SignUpInput } from '../../schemas/auth';
import { recordEvent } from '../audit/record-event';
import { createUser } from './create-user';

// Sign-up makes the person the lead of a new team, all or nothing.
export async function signUp(input: SignUpInput) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const user = await createUser(input, transaction);
    const team = await models.Team.create({ name: input.teamName }, { transaction });
    await models.Membership.create({ teamId: team.id, userId: user.id, role: 'lead' }, { transaction });
    await models.UserPreference.update({ activeTeamId: team.id }, { where: { userId: user.id }, transaction });
    await recordEvent({ teamId: team.id, actorId: user.id, action: 'team.created', targetType: 'team', targetId: team.id }, transaction);
    return { userId: user.id, teamId: team.id };
  });
}
