import { NextRequest } from 'next/server';
import type { NextConfig } from 'next';
import { describe, expect, it } from 'vitest';
import { config as proxyConfig, proxy } from '@/proxy';
import { NON_PAGE_CSP, pageCsp } from '@/lib/security/csp';

type HeaderRule = { source: string; headers: { key: string; value: string }[] };

// The .mjs config has no type declarations; its shape is Next's own NextConfig.
async function loadNextConfig(): Promise<NextConfig> {
  const mod = (await import(/* @vite-ignore */ '../../next.config.mjs' as string)) as { default: NextConfig };
  return mod.default;
}

// Headers next.config.mjs gives a path, by Next's own path-to-regexp rules reduced to the two forms used there.
async function configHeaders(path: string): Promise<Record<string, string>> {
  const rules = (await (await loadNextConfig()).headers!()) as HeaderRule[];
  const out: Record<string, string> = {};
  for (const rule of rules) {
    const prefix = rule.source.replace('/:path*', '');
    if (path === prefix || path.startsWith(`${prefix}/`) || prefix === '') for (const h of rule.headers) out[h.key.toLowerCase()] = h.value;
  }
  return out;
}

function directive(csp: string, name: string): string {
  return csp.split(';').map((d) => d.trim()).find((d) => d.startsWith(`${name} `)) ?? '';
}

function proxyMatches(path: string): boolean {
  const source = (proxyConfig.matcher[0] as { source: string }).source;
  return new RegExp(`^${source}$`).test(path);
}

describe('security headers', () => {
  it('a page gets a nonce CSP from the proxy: no unsafe-inline scripts, no framing, and a fresh nonce each time', async () => {
    const first = proxy(new NextRequest('http://localhost:3000/routes'));
    const second = proxy(new NextRequest('http://localhost:3000/routes'));
    const csp = first.headers.get('content-security-policy')!;
    const script = directive(csp, 'script-src');
    expect(script).toMatch(/'nonce-[A-Za-z0-9+/=]{20,}'/);
    expect(script).not.toContain("'unsafe-inline'");
    expect(script).not.toContain("'unsafe-eval'");
    expect(directive(csp, 'frame-ancestors')).toBe("frame-ancestors 'none'");
    expect(directive(csp, 'object-src')).toBe("object-src 'none'");
    expect(second.headers.get('content-security-policy')).not.toBe(csp);
    // Next renders with the request's copy of the policy, which must carry the same nonce.
    expect(first.headers.get('x-middleware-request-content-security-policy')).toBe(csp);
    const nonce = script.match(/'nonce-([^']+)'/)![1];
    expect(first.headers.get('x-middleware-request-x-nonce')).toBe(nonce);
  });

  it('a page also gets nosniff, the referrer policy and DENY framing from next.config, but no second CSP', async () => {
    const headers = await configHeaders('/routes');
    expect(headers).toMatchObject({ 'x-content-type-options': 'nosniff', 'referrer-policy': 'strict-origin-when-cross-origin', 'x-frame-options': 'DENY' });
    expect(headers).not.toHaveProperty('content-security-policy');
    expect(proxyMatches('/routes')).toBe(true);
    expect(proxyMatches('/')).toBe(true);
    expect(proxyMatches('/reset-password/abc')).toBe(true);
  });

  it('an API answer gets a deny-all CSP with frame-ancestors none, nosniff and the referrer policy, and skips the proxy', async () => {
    const headers = await configHeaders('/api/routes');
    expect(headers['content-security-policy']).toBe(NON_PAGE_CSP);
    expect(directive(NON_PAGE_CSP, 'frame-ancestors')).toBe("frame-ancestors 'none'");
    expect(headers).toMatchObject({ 'x-content-type-options': 'nosniff', 'referrer-policy': 'strict-origin-when-cross-origin' });
    expect(proxyMatches('/api/routes')).toBe(false);
    expect(proxyMatches('/_next/static/chunks/main.js')).toBe(false);
  });

  it('development adds only what React dev tooling needs', () => {
    const dev = pageCsp({ nonce: 'abc', isDev: true });
    expect(directive(dev, 'script-src')).toBe("script-src 'self' 'nonce-abc' 'strict-dynamic' 'unsafe-eval'");
    expect(directive(dev, 'script-src')).not.toContain("'unsafe-inline'");
  });
});
