import 'server-only';
import { getDb } from '../../../db';
import type { NotificationMutes } from '../../schemas/notification';
import type { PreferencesInput, PreferencesPatch } from '../../schemas/preferences';
import { mutesOf } from '../notifications/recipients';

export interface PreferencesDto extends PreferencesInput {
  notificationMutes: NotificationMutes;
  cautionCollapsed: boolean;
}

const MUTE_FIELDS = {
  review_request: 'muteReviewRequest',
  mention: 'muteMention',
  status_change: 'muteStatusChange',
  comment_on_owned_route: 'muteCommentOnOwnedRoute',
} as const satisfies Record<keyof NotificationMutes, string>;

export async function updatePreferences({ userId, preferences }: { userId: number; preferences: PreferencesPatch }): Promise<PreferencesDto> {
  const { UserPreference } = getDb().models;
  // Units and the caution fold are columns of the same name; mutes map to one column per kind.
  const { notificationMutes, ...columns } = preferences;
  const mutes = Object.fromEntries(
    Object.entries(notificationMutes ?? {}).map(([kind, muted]) => [MUTE_FIELDS[kind as keyof NotificationMutes], muted]),
  );
  const [row] = await UserPreference.findOrCreate({ where: { userId }, defaults: { userId } });
  await row.update({ ...columns, ...mutes });
  return { energyUnit: row.energyUnit, temperatureUnit: row.temperatureUnit, pressureUnit: row.pressureUnit, notificationMutes: mutesOf(row), cautionCollapsed: row.cautionCollapsed };
}
