import 'server-only';
import type { NextRequest } from 'next/server';
import { toErrorResponse } from '../api/error-response';
import { clientAddress } from '../security/client-address';
import { enforceLimits, signInByAccountLimiter, signInByAddressLimiter, signInLimiter } from '../security/rate-limit';

// Wraps next-auth's credentials callback: too many failures (see rate-limit.ts) get a 429 with the wait.
export async function guardCredentialSignIn(req: NextRequest, next: () => Promise<Response>): Promise<Response> {
  if (!req.nextUrl.pathname.endsWith('/callback/credentials')) return next();
  try {
    const form = await req.clone().formData();
    const email = String(form.get('email') ?? '').trim().toLowerCase();
    const address = clientAddress(req);
    const key = `${email}|${address}`;
    const limiter = signInLimiter();
    // Counted before the attempt runs, so parallel guesses cannot all pass one check; a success counts nowhere and
    // clears the account-and-address count.
    const counted = await enforceLimits(
      [
        [limiter, key],
        [signInByAddressLimiter(), address],
        [signInByAccountLimiter(), email],
      ],
      (wait) => `Too many failed sign-ins. Wait ${wait} s and try again.`,
    );
    const response = await next();
    if (!(await isFailedSignIn(response))) {
      await counted.refund();
      await limiter.reset(key);
    }
    return response;
  } catch (error) {
    return toErrorResponse(error);
  }
}

async function isFailedSignIn(response: Response): Promise<boolean> {
  if (response.status >= 400) return true;
  const location = response.headers.get('location');
  if (location) return location.includes('error=');
  try {
    const body = (await response.clone().json()) as { url?: string };
    return typeof body.url === 'string' && body.url.includes('error=');
  } catch {
    return false;
  }
}
