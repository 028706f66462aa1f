// POST /api/me/sign-out-everywhere: end every session of the caller, on every device, this one included
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { revokeAllSessions } from '@/lib/auth/session-policy';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'user' }, async ({ user }) => {
  await revokeAllSessions({ userId: user.id });
  return { ok: true };
});

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
