// GET /api/me: the signed-in user, their teams and unit preferences
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { AppError } from '@/lib/api/errors';
import { getProfile } from '@/lib/services/users/get-profile';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'user' }, async ({ user }) => {
  const profile = await getProfile({ userId: user.id });
  if (!profile) throw new AppError('UNAUTHENTICATED', 'Sign in to continue.');
  return profile;
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
