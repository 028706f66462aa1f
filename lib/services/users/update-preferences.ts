import 'server-only';
import { getDb } from '../../../db';
import type { PreferencesInput } from '../../schemas/preferences';

export async function updatePreferences({ userId, preferences }: { userId: number; preferences: PreferencesInput }) {
  const { UserPreference } = getDb().models;
  const [row] = await UserPreference.findOrCreate({ where: { userId }, defaults: { userId } });
  await row.update(preferences);
  return { energyUnit: row.energyUnit, temperatureUnit: row.temperatureUnit, pressureUnit: row.pressureUnit };
}
