// PATCH /api/me/preferences: the user's display units
import { withRoute } from '@/lib/api/with-route';
import { PreferencesInput } from '@/lib/schemas/preferences';
import { updatePreferences } from '@/lib/services/users/update-preferences';

export const runtime = 'nodejs';

export const PATCH = withRoute({ access: 'user', body: PreferencesInput }, async ({ user, body }) =>
  updatePreferences({ userId: user.id, preferences: body }),
);
