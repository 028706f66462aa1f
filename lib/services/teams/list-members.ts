import 'server-only';
import { getDb } from '../../../db';
import type { Role } from '../../auth/roles';

export interface MemberDto {
  userId: number;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

export async function listMembers({ teamId }: { teamId: number }): Promise<MemberDto[]> {
  const { Membership, User } = getDb().models;
  const rows = await Membership.findAll({ where: { teamId }, include: [{ model: User, as: 'user' }], order: [['id', 'ASC']] });
  return rows.map((m) => {
    const user = m.get('user') as InstanceType<typeof User>;
    return { userId: m.userId, name: user.name, email: user.email, role: m.role, joinedAt: m.createdAt.toISOString() };
  });
}
