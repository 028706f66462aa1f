import 'server-only';
import { getDb } from '../../../db';
import type { Role } from '../../auth/roles';

export interface TeamContext {
  id: number;
  name: string;
  role: Role;
}

export async function findMembership({ userId, teamId }: { userId: number; teamId: number }): Promise<TeamContext | null> {
  const { Membership, Team } = getDb().models;
  const membership = await Membership.findOne({ where: { userId, teamId }, include: [{ model: Team, as: 'team' }] });
  if (!membership) return null;
  const team = membership.get('team') as InstanceType<typeof Team>;
  return { id: team.id, name: team.name, role: membership.role };
}

// The team a user works in now: their saved choice if still a member, else their first team.
export async function findActiveMembership({ userId }: { userId: number }): Promise<TeamContext | null> {
  const { Membership, UserPreference } = getDb().models;
  const prefs = await UserPreference.findByPk(userId);
  if (prefs?.activeTeamId) {
    const active = await findMembership({ userId, teamId: prefs.activeTeamId });
    if (active) return active;
  }
  const first = await Membership.findOne({ where: { userId }, order: [['id', 'ASC']] });
  return first ? findMembership({ userId, teamId: first.teamId }) : null;
}
