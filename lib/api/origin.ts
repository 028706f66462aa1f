import type { NextRequest } from 'next/server';
import { AppError } from './errors';

// A browser sends Origin on cross-site writes; refuse ones that don't match the host we serve.
export function checkOrigin(req: NextRequest): void {
  const origin = req.headers.get('origin');
  if (!origin) return;
  const host = req.headers.get('x-forwarded-host') ?? req.headers.get('host');
  let originHost: string;
  try {
    originHost = new URL(origin).host;
  } catch {
    throw new AppError('FORBIDDEN', 'The request came from an unknown origin.');
  }
  if (host && originHost !== host) throw new AppError('FORBIDDEN', 'Cross-site requests are not accepted.');
}
