import { ApiError } from '../queries/api-fetch';
import { safeNextPath } from '../security/safe-next-path';

// Talks to next-auth's endpoints directly so a 429 from the sign-in guard reaches the form intact.
// Answers the page to open next: `next` when it is a path of ours, the routes list otherwise.
export async function signInWithPassword({ email, password, next }: { email: string; password: string; next?: string }): Promise<string> {
  const destination = safeNextPath(next, typeof window === 'undefined' ? undefined : window.location.origin);
  const csrf = (await (await fetch('/api/auth/csrf', { credentials: 'same-origin' })).json()) as { csrfToken: string };
  const form = new URLSearchParams({ email, password, csrfToken: csrf.csrfToken, callbackUrl: destination, json: 'true' });
  const response = await fetch('/api/auth/callback/credentials', {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-auth-return-redirect': '1' },
    body: form,
    credentials: 'same-origin',
  });
  const data = (await response.json().catch(() => ({}))) as { url?: string; error?: { code: string; message: string } };
  if (response.status === 429 && data.error) throw new ApiError(429, data.error.code, data.error.message);
  if (!response.ok || !data.url || data.url.includes('error=')) {
    throw new ApiError(401, 'INVALID_CREDENTIALS', 'That e-mail and password do not match an account.');
  }
  return destination;
}
