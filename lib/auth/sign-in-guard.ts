import 'server-only';
import type { NextRequest } from 'next/server';
import { toErrorResponse } from '../api/error-response';
import { clientIp, enforceLimits, signInLimiter } from '../security/rate-limit';

// Wraps next-auth's credentials callback: ten failures a minute for one e-mail and IP get a 429 with the wait.
export async function guardCredentialSignIn(req: NextRequest, next: () => Promise<Response>): Promise<Response> {
  if (!req.nextUrl.pathname.endsWith('/callback/credentials')) return next();
  try {
    const form = await req.clone().formData();
    const email = String(form.get('email') ?? '').trim().toLowerCase();
    const key = `${email}|${clientIp(req)}`;
    const limiter = signInLimiter();
    // Counted before the attempt runs, so parallel guesses cannot all pass one check; a success clears the count.
    await enforceLimits([[limiter, key]], (wait) => `Too many failed sign-ins. Wait ${wait} s and try again.`);
    const response = await next();
    if (!(await isFailedSignIn(response))) await limiter.reset(key);
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
