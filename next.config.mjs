// Kept in step with lib/security/csp.ts (NON_PAGE_CSP); tests/integration/security-headers.test.ts checks both.
const NON_PAGE_CSP = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

const common = [
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Cross-Origin-Opener-Policy', value: 'same-origin' },
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(), payment=()' },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // @rdkit/rdkit loads its WebAssembly file from beside its own script, so it must stay in node_modules, not the bundle.
  serverExternalPackages: ['sequelize', 'sqlite3', 'pg', 'pg-hstore', 'umzug', 'nodemailer', 'bcryptjs', '@rdkit/rdkit'],
  async headers() {
    return [
      { source: '/:path*', headers: common },
      // Pages get their CSP, with a nonce, from proxy.ts; a second policy here would be enforced as well and block their scripts.
      { source: '/api/:path*', headers: [{ key: 'Content-Security-Policy', value: NON_PAGE_CSP }] },
    ];
  },
};

export default nextConfig;
