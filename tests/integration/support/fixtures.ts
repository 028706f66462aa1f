import { getDb } from '@/db';
import type { Role } from '@/lib/auth/roles';
import { signUp } from '@/lib/services/users/sign-up';

let counter = 0;

export async function makeTeamWithLead(label = 'team') {
  counter += 1;
  const email = `${label}-lead-${counter}@example.test`;
  const { userId, teamId } = await signUp({ name: `Lead ${counter}`, email, password: 'a-strong-password-1', teamName: `${label} ${counter}` });
  return { teamId, leadId: userId, leadEmail: email };
}

export async function addMember(teamId: number, role: Role) {
  counter += 1;
  const { User, Membership, UserPreference } = getDb().models;
  const user = await User.create({ email: `${role}-${counter}@example.test`, name: `${role} ${counter}`, passwordHash: 'x' });
  await Membership.create({ teamId, userId: user.id, role });
  await UserPreference.create({ userId: user.id, activeTeamId: teamId });
  return user.id;
}

export async function makeRoleSet() {
  const main = await makeTeamWithLead('main');
  const designerId = await addMember(main.teamId, 'designer');
  const reviewerId = await addMember(main.teamId, 'reviewer');
  const foreign = await makeTeamWithLead('other');
  return { teamId: main.teamId, leadId: main.leadId, designerId, reviewerId, foreignId: foreign.leadId, foreignTeamId: foreign.teamId };
}
