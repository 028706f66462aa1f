// A signed-in HTTP client for benchmarks: next-auth's credentials flow with a tiny cookie jar.
export interface Session {
  fetch(path: string, init?: { method?: string; body?: unknown }): Promise<Response>;
  cookie: string;
}

export async function signInSession(baseUrl: string, email: string, password: string): Promise<Session> {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const [name, ...rest] = (pair ?? '').split('=');
      if (name) jar.set(name.trim(), rest.join('='));
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const csrfRes = await fetch(`${baseUrl}/api/auth/csrf`);
  keep(csrfRes);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const login = await fetch(`${baseUrl}/api/auth/callback/credentials`, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookie() },
    body: new URLSearchParams({ email, password, csrfToken, json: 'true' }),
    redirect: 'manual',
  });
  keep(login);
  if (![...jar.keys()].some((k) => k.includes('session-token'))) throw new Error(`sign-in failed for ${email} (${login.status})`);
  return {
    get cookie() {
      return cookie();
    },
    fetch: (path, init = {}) =>
      fetch(`${baseUrl}${path}`, {
        method: init.method ?? 'GET',
        headers: { cookie: cookie(), ...(init.body === undefined ? {} : { 'content-type': 'application/json' }) },
        body: init.body === undefined ? undefined : JSON.stringify(init.body),
      }),
  };
}
