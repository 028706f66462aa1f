import type { Sequelize } from 'sequelize';
import type { Models } from '../models';
import { hashPassword } from '../../lib/auth/password';
import type { Role } from '../../lib/auth/roles';

// Invented scenario for the demo only: a process-development group at a fictional contract manufacturer.
export const DEMO_TEAM_NAME = 'Kestrel Ridge Fine Chemicals — Process Development';
export const DEMO_PASSWORD = 'stepwell-demo-2026';
export const DEMO_USERS: ReadonlyArray<{ email: string; name: string; role: Role }> = [
  { email: 'lead@kestrel-ridge.example', name: 'Ottilie Marchetti', role: 'lead' },
  { email: 'designer@kestrel-ridge.example', name: 'Baptiste Osei', role: 'designer' },
  { email: 'reviewer@kestrel-ridge.example', name: 'Hanne Vasquez-Lind', role: 'reviewer' },
];

// Idempotent: running it twice leaves one demo team.
export async function seedDemoTeam({ sequelize, models }: { sequelize: Sequelize; models: Models }): Promise<{ created: boolean }> {
  const existing = await models.Team.findOne({ where: { name: DEMO_TEAM_NAME } });
  if (existing) return { created: false };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction(async (transaction) => {
    const team = await models.Team.create({ name: DEMO_TEAM_NAME }, { transaction });
    for (const demo of DEMO_USERS) {
      const [user] = await models.User.findOrCreate({
        where: { email: demo.email },
        defaults: { email: demo.email, name: demo.name, passwordHash },
        transaction,
      });
      await models.Membership.create({ teamId: team.id, userId: user.id, role: demo.role }, { transaction });
      await models.UserPreference.findOrCreate({ where: { userId: user.id }, defaults: { userId: user.id, activeTeamId: team.id }, transaction });
    }
    await models.AuditEvent.create({ teamId: team.id, actorId: null, action: 'team.seeded', targetType: 'team', targetId: String(team.id), data: null }, { transaction });
  });
  return { created: true };
}
