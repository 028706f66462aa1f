// POST /api/password-reset: mail a single-use reset link; the same 202 answer whether or not the address has an account
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { RequestPasswordResetInput, RESET_REQUESTED_MESSAGE } from '@/lib/schemas/password-reset';
import { clientAddress } from '@/lib/security/client-address';
import { enforceLimits, resetByEmailLimiter, resetByIpLimiter } from '@/lib/security/rate-limit';
import { startPasswordResetRequest } from '@/lib/services/password-reset/request-password-reset';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'public', body: RequestPasswordResetInput }, async ({ req, body }) => {
  await enforceLimits(
    [
      [resetByEmailLimiter(), body.email],
      [resetByIpLimiter(), clientAddress(req)],
    ],
    (wait) => `Too many reset requests. Wait ${wait} s and try again.`,
  );
  // Runs after the answer, so neither the answer nor its timing reveals whether the account exists.
  startPasswordResetRequest({ email: body.email });
  return Response.json({ ok: true, message: RESET_REQUESTED_MESSAGE }, { status: 202 });
});

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
