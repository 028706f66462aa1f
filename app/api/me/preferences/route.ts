// PATCH /api/me/preferences: the user's display units, e-mail mutes and the safety caution's fold (any subset)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { PreferencesPatch } from '@/lib/schemas/preferences';
import { updatePreferences } from '@/lib/services/users/update-preferences';

export const runtime = 'nodejs';

export const PATCH = withRoute({ access: 'user', body: PreferencesPatch }, async ({ user, body }) =>
  updatePreferences({ userId: user.id, preferences: body }),
);

export const { GET, POST, PUT, DELETE, OPTIONS } = refuseOtherMethods({ PATCH });
