import { NextResponse, type NextRequest } from 'next/server';
import { newNonce, pageCsp } from './lib/security/csp';

// Next 16's request hook, used only for a per-request CSP nonce on pages (API routes keep next.config's static CSP).
export function proxy(request: NextRequest) {
  const nonce = newNonce();
  const csp = pageCsp({ nonce, isDev: process.env.NODE_ENV === 'development' });
  // Next reads the nonce from the request's CSP header while rendering and puts it on its scripts.
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set('x-nonce', nonce);
  requestHeaders.set('content-security-policy', csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set('content-security-policy', csp);
  return response;
}

export const config = {
  matcher: [
    {
      source: '/((?!api/|_next/static|_next/image|favicon.ico).*)',
      missing: [
        { type: 'header', key: 'next-router-prefetch' },
        { type: 'header', key: 'purpose', value: 'prefetch' },
      ],
    },
  ],
};
