// Content-Security-Policy values. Pure, so proxy.ts, next.config.mjs's twin and the tests share one source.

/** 16 random bytes, base64: a fresh nonce per page request. */
export function newNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}

/**
 * Pages: scripts only with this request's nonce (Next puts it on its own scripts), never 'unsafe-inline'.
 * Styles keep 'unsafe-inline': React Flow and server-rendered markup use style attributes, which a nonce cannot cover.
 * Development adds 'unsafe-eval' (React's dev tooling) and the HMR websocket.
 */
export function pageCsp({ nonce, isDev }: { nonce: string; isDev: boolean }): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${isDev ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self' data:",
    `connect-src 'self'${isDev ? ' ws: wss:' : ''}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** API answers and other non-page responses: nothing may load from them or frame them. */
export const NON_PAGE_CSP = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";
