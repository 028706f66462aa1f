import type { Sequelize } from 'sequelize';
import type { Models } from '../models';
import { seedDemoRoutes } from './demo-routes';
import { seedDemoTeam } from './demo-team';

export async function runSeeders(db: { sequelize: Sequelize; models: Models }): Promise<string[]> {
  const done: string[] = [];
  if ((await seedDemoTeam(db)).created) done.push('demo-team');
  if ((await seedDemoRoutes(db)).created) done.push('demo-routes');
  return done;
}
