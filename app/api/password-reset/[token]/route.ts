// POST /api/password-reset/[token]: set a new password with a mailed link; spends the link and signs out every session
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { ResetPasswordInput } from '@/lib/schemas/password-reset';
import { resetPassword } from '@/lib/services/password-reset/reset-password';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'public', body: ResetPasswordInput }, async ({ params, body }) => {
  await resetPassword({ token: params.token ?? '', password: body.password });
  return { ok: true, message: 'Your password is changed. Sign in with the new one.' };
});

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
