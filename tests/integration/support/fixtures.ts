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

export const SAMPLE_STEPS = [
  { id: 's1', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '1100 K', yieldPct: 100, notes: '', position: { x: 0, y: 0 } },
  { id: 's2', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '298.15 K', yieldPct: 100, notes: '', position: { x: 300, y: 0 } },
];
export const SAMPLE_LINKS = [
  { from: 's1', to: 's2', species: 'CO(g)' },
  { from: 's1', to: 's2', species: 'H2(g)' },
];

export async function makeRoute(teamId: number, userId: number, withSteps = true) {
  const { createRoute } = await import('@/lib/services/routes/create-route');
  const { saveRoute } = await import('@/lib/services/routes/save-route');
  const route = await createRoute({ teamId, userId, input: { name: `Route ${(counter += 1)}`, target: 'CH3OH(g)', targetAmount: '1 mol' } });
  if (!withSteps) return route;
  const saved = await saveRoute({
    teamId,
    userId,
    routeId: route.id,
    input: { version: route.version, name: route.name, target: route.target, targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS, links: SAMPLE_LINKS },
  });
  return saved.route;
}
