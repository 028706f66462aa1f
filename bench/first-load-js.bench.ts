// First-load JS of the route editor page, from the build output: the script files its HTML loads, read from
// .next/static and sized raw and gzipped, beside the sign-in page's. Prints figures, asserts nothing.
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { DEMO_PASSWORD, DEMO_USERS } from '../db/seeders/demo-team';
import { signInSession, type Session } from './support/http-session';
import { round } from './support/stats';

const STATIC_DIR = path.resolve(__dirname, '../.next/static');

function scriptSizes(html: string): { raw: number; gzip: number; files: number } {
  const srcs = [...new Set([...html.matchAll(/<script[^>]+src="\/_next\/static\/([^"?]+)/g)].map((m) => m[1]!))];
  let raw = 0;
  let gzip = 0;
  for (const src of srcs) {
    const bytes = fs.readFileSync(path.join(STATIC_DIR, decodeURIComponent(src)));
    raw += bytes.byteLength;
    gzip += zlib.gzipSync(bytes).byteLength;
  }
  return { raw, gzip, files: srcs.length };
}

async function pageHtml(session: Session | null, baseUrl: string, url: string): Promise<string> {
  const res = session ? await session.fetch(url) : await fetch(`${baseUrl}${url}`);
  if (!res.ok) throw new Error(`${url}: ${res.status}`);
  return res.text();
}

export async function runFirstLoadJsBench(baseUrl: string): Promise<Record<string, number>> {
  const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
  const session = await signInSession(baseUrl, designer.email, DEMO_PASSWORD);
  const list = (await (await session.fetch('/api/routes?pageSize=1')).json()) as { items: { id: number }[] };
  const editor = scriptSizes(await pageHtml(session, baseUrl, `/routes/${list.items[0]!.id}`));
  const signIn = scriptSizes(await pageHtml(null, baseUrl, '/sign-in'));
  return {
    route_editor_first_load_js_kb: round(editor.raw / 1024, 1),
    route_editor_first_load_js_gzip_kb: round(editor.gzip / 1024, 1),
    sign_in_first_load_js_gzip_kb: round(signIn.gzip / 1024, 1),
    route_editor_over_sign_in_js_ratio: round(editor.gzip / signIn.gzip, 2),
    route_editor_script_files: editor.files,
  };
}
