// POST /api/signup: create an account and a new team led by it
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SignUpInput } from '@/lib/schemas/auth';
import { clientAddress } from '@/lib/security/client-address';
import { enforceLimits, signUpLimiter } from '@/lib/security/rate-limit';
import { signUp } from '@/lib/services/users/sign-up';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'public', body: SignUpInput }, async ({ req, body }) => {
  await enforceLimits([[signUpLimiter(), clientAddress(req)]], (wait) => `Too many sign-ups from here. Wait ${wait} s.`);
  const result = await signUp(body);
  return Response.json(result, { status: 201 });
});

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
