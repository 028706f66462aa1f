import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

// A fresh clone has no secret; write a development one to .env.local (never committed).
export function ensureDevSecret(): void {
  if (process.env.NEXTAUTH_SECRET) return;
  const file = path.resolve(process.cwd(), '.env.local');
  const current = fs.existsSync(file) ? fs.readFileSync(file, 'utf8') : '';
  const found = current.match(/^NEXTAUTH_SECRET=(.+)$/m);
  if (found?.[1]) {
    process.env.NEXTAUTH_SECRET = found[1];
    return;
  }
  const secret = crypto.randomBytes(32).toString('base64url');
  fs.writeFileSync(file, `${current}${current && !current.endsWith('\n') ? '\n' : ''}NEXTAUTH_SECRET=${secret}\n`);
  process.env.NEXTAUTH_SECRET = secret;
  console.log('[env] wrote a development NEXTAUTH_SECRET to .env.local');
}
