import { randomUUID } from 'node:crypto';
import { encode } from 'next-auth/jwt';
import { NextRequest } from 'next/server';
import { getDb } from '@/db';
import { TEST_SECRET } from './test-db';

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

export interface CallOptions {
  method?: string;
  path?: string;
  body?: unknown;
  rawBody?: string;
  headers?: Record<string, string>;
  params?: Record<string, string>;
  userId?: number | null;
}

// Like a real sign-in, the token carries the user's current session epoch, the sign-in time and a session id.
export async function sessionCookie(userId: number): Promise<string> {
  const user = await getDb().models.User.findByPk(userId);
  const token = await encode({
    token: { sub: String(userId), epoch: user?.sessionEpoch ?? 0, authAt: Math.floor(Date.now() / 1000), sid: randomUUID() },
    secret: TEST_SECRET,
  });
  return `next-auth.session-token=${token}`;
}

// Calls a route handler in-process with a real NextRequest and a real signed session cookie.
export async function callRoute(handler: Handler, opts: CallOptions = {}): Promise<{ status: number; body: unknown; headers: Headers }> {
  const headers = new Headers(opts.headers);
  if (opts.userId) headers.set('cookie', await sessionCookie(opts.userId));
  let body: string | undefined = opts.rawBody;
  if (opts.body !== undefined) {
    body = JSON.stringify(opts.body);
    headers.set('content-type', 'application/json');
  }
  const req = new NextRequest(new URL(opts.path ?? '/api/test', 'http://localhost:3000'), { method: opts.method ?? 'GET', headers, body });
  const res = await handler(req, { params: Promise.resolve(opts.params ?? {}) });
  const text = await res.text();
  let parsed: unknown = text;
  try {
    parsed = text ? JSON.parse(text) : undefined;
  } catch {
    // not JSON; keep the text
  }
  return { status: res.status, body: parsed, headers: res.headers };
}

export function errorOf(body: unknown): { code: string; message: string; fields?: Record<string, string> } {
  return (body as { error: { code: string; message: string; fields?: Record<string, string> } }).error;
}
