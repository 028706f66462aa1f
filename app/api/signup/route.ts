// POST /api/signup: create an account and a new team led by it
import { withRoute } from '@/lib/api/with-route';
import { AppError } from '@/lib/api/errors';
import { SignUpInput } from '@/lib/schemas/auth';
import { clientIp, signUpLimiter } from '@/lib/security/rate-limit';
import { signUp } from '@/lib/services/users/sign-up';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'public', body: SignUpInput }, async ({ req, body }) => {
  const key = clientIp(req);
  const verdict = signUpLimiter().check(key);
  if (!verdict.allowed) {
    throw new AppError('RATE_LIMITED', `Too many sign-ups from here. Wait ${verdict.retryAfterSeconds} s.`, {
      headers: { 'Retry-After': String(verdict.retryAfterSeconds) },
    });
  }
  signUpLimiter().hit(key);
  const result = await signUp(body);
  return Response.json(result, { status: 201 });
});
