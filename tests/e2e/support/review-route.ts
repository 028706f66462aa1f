// The two-step methanol route the review specs put up for review, and the demo people who review it.
import { expect, type APIRequestContext } from '@playwright/test';
import { DEMO_USERS } from '../../../db/seeders/demo-team';

export const demoUser = (role: 'lead' | 'designer' | 'reviewer') => DEMO_USERS.find((u) => u.role === role)!;

const STEPS = [
  { id: 's1', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '1100 K', yieldPct: 100, notes: '', position: { x: 0, y: 40 } },
  { id: 's2', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K', yieldPct: 100, notes: '', position: { x: 340, y: 40 } },
];
const LINKS = [
  { from: 's1', to: 's2', species: 'CO(g)' },
  { from: 's1', to: 's2', species: 'H2(g)' },
];

/** Creates the route as the signed-in caller and saves its two linked steps; answers its id. */
export async function makeReviewRoute(request: APIRequestContext, name: string, target = 'CH3OH(g)'): Promise<number> {
  const created = await request.post('/api/routes', { data: { name, target, targetAmount: '1 mol' } });
  expect(created.status()).toBe(201);
  const { id, version } = (await created.json()) as { id: number; version: number };
  const saved = await request.put(`/api/routes/${id}`, { data: { version, name, target, targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: STEPS, links: LINKS } });
  expect(saved.status()).toBe(200);
  return id;
}
