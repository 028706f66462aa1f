import 'server-only';
import { getDb } from '../../../db';
import type { Role } from '../../auth/roles';
import type { NotificationMutes } from '../../schemas/notification';
import type { EnergyUnit, PressureUnit, TemperatureUnit } from '../../schemas/preferences';
import { mutesOf } from '../notifications/recipients';

export interface MembershipDto {
  teamId: number;
  teamName: string;
  role: Role;
}

export interface ProfileDto {
  user: { id: number; email: string; name: string };
  memberships: MembershipDto[];
  activeTeamId: number | null;
  preferences: { energyUnit: EnergyUnit; temperatureUnit: TemperatureUnit; pressureUnit: PressureUnit };
  /** true stops that kind of e-mail; the in-app notification still appears. */
  notificationMutes: NotificationMutes;
  /** The long safety caution folded to one line (the short caution always shows). */
  cautionCollapsed: boolean;
}

export async function getProfile({ userId }: { userId: number }): Promise<ProfileDto | null> {
  const { User, Membership, Team, UserPreference } = getDb().models;
  const user = await User.findByPk(userId);
  if (!user) return null;
  const [rows, prefs] = await Promise.all([
    Membership.findAll({ where: { userId }, include: [{ model: Team, as: 'team' }], order: [['id', 'ASC']] }),
    UserPreference.findByPk(userId),
  ]);
  const memberships = rows.map((m) => ({
    teamId: m.teamId,
    teamName: (m.get('team') as InstanceType<typeof Team> | undefined)?.name ?? 'Team',
    role: m.role,
  }));
  const preferred = prefs?.activeTeamId ?? null;
  const activeTeamId = memberships.some((m) => m.teamId === preferred) ? preferred : (memberships[0]?.teamId ?? null);
  return {
    user: { id: user.id, email: user.email, name: user.name },
    memberships,
    activeTeamId,
    preferences: {
      energyUnit: prefs?.energyUnit ?? 'kJ',
      temperatureUnit: prefs?.temperatureUnit ?? 'K',
      pressureUnit: prefs?.pressureUnit ?? 'bar',
    },
    notificationMutes: mutesOf(prefs),
    cautionCollapsed: prefs?.cautionCollapsed ?? false,
  };
}
