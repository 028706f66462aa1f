// The route editor's JS budget: first-load JS of /routes/[routeId] read from the build output (no server needed) —
// the build manifest's root scripts and polyfills plus the entry chunks of the page and its layouts in the page's
// client reference manifest — gzipped, against 376 kB (the editor before structure drawings) + 60 kB.
// Counted as bench/first-load-js.bench.ts counts the page's <script> tags, polyfills included, so the two agree.
// `npx tsx bench/js-budget.ts` prints the figure and exits 1 when over budget or when there is no build.
import fs from 'node:fs';
import path from 'node:path';
import vm from 'node:vm';
import zlib from 'node:zlib';

export const BASELINE_GZIP_KB = 376;
export const BUDGET_GZIP_KB = BASELINE_GZIP_KB + 60;
export const EDITOR_PAGE = '/(app)/routes/[routeId]/page';
const DEFAULT_NEXT_DIR = path.resolve(__dirname, '../.next');

export class NoBuildError extends Error {}

export interface FirstLoadJs {
  files: string[];
  rawBytes: number;
  gzipBytes: number;
  /** the polyfill scripts alone (modern browsers skip them; the page still lists them) */
  polyfillGzipBytes: number;
}

interface BuildManifest {
  polyfillFiles?: string[];
  rootMainFiles?: string[];
}

interface ClientReferenceManifest {
  entryJSFiles?: Record<string, string[]>;
  clientModules?: Record<string, { chunks: string[]; async?: boolean }>;
}

function readJson<T>(file: string, what: string): T {
  if (!fs.existsSync(file)) throw new NoBuildError(`No ${what} at ${file}. Run \`next build\` (npm run build) first; this bench reads the build output.`);
  return JSON.parse(fs.readFileSync(file, 'utf8')) as T;
}

/** The manifest Next writes as `globalThis.__RSC_MANIFEST[page] = {...}`, run in a sandbox. */
export function readClientReferenceManifest(nextDir: string, page: string): ClientReferenceManifest {
  const file = path.join(nextDir, 'server', 'app', `${page}_client-reference-manifest.js`);
  if (!fs.existsSync(file)) throw new NoBuildError(`No client reference manifest for ${page} at ${file}. Run \`next build\` first (the page may have been renamed).`);
  const sandbox: Record<string, unknown> = {};
  sandbox.globalThis = sandbox;
  vm.runInNewContext(fs.readFileSync(file, 'utf8'), sandbox, { timeout: 5000 });
  const manifests = sandbox.__RSC_MANIFEST as Record<string, ClientReferenceManifest> | undefined;
  const manifest = manifests?.[page];
  if (!manifest) throw new NoBuildError(`${file} has no manifest for ${page}; this Next version writes it differently.`);
  return manifest;
}

/** "[project]/app/layout", "[project]/app/(app)/layout", … "[project]/app/(app)/routes/[routeId]/page": the page's own entries. */
function ownEntries(page: string): Set<string> {
  const segments = page.replace(/^\//, '').split('/').slice(0, -1);
  const out = new Set([`[project]/app/${page.replace(/^\//, '')}`, '[project]/app/layout']);
  for (let i = 1; i <= segments.length; i++) out.add(`[project]/app/${segments.slice(0, i).join('/')}/layout`);
  return out;
}

const fromPublicPath = (chunk: string) => chunk.replace(/^\/?_next\//, '');

export function firstLoadJs(nextDir = DEFAULT_NEXT_DIR, page = EDITOR_PAGE): FirstLoadJs {
  if (!fs.existsSync(nextDir)) throw new NoBuildError(`No build at ${nextDir}. Run \`next build\` (npm run build) first; this bench reads the build output.`);
  const build = readJson<BuildManifest>(path.join(nextDir, 'build-manifest.json'), 'build manifest');
  const manifest = readClientReferenceManifest(nextDir, page);
  const wanted = ownEntries(page);
  const pageChunks = manifest.entryJSFiles
    ? Object.entries(manifest.entryJSFiles).filter(([entry]) => wanted.has(entry)).flatMap(([, files]) => files)
    : // Older manifests: every synchronously loaded client module's chunks.
      Object.values(manifest.clientModules ?? {}).filter((m) => !m.async).flatMap((m) => m.chunks.map(fromPublicPath));
  const polyfills = build.polyfillFiles ?? [];
  const files = [...new Set([...polyfills, ...(build.rootMainFiles ?? []), ...pageChunks])];
  let rawBytes = 0;
  let gzipBytes = 0;
  let polyfillGzipBytes = 0;
  for (const file of files) {
    const full = path.join(nextDir, file);
    if (!fs.existsSync(full)) throw new NoBuildError(`${full} is listed in the manifests but missing: the build is incomplete; run \`next build\` again.`);
    const bytes = fs.readFileSync(full);
    const gz = zlib.gzipSync(bytes).byteLength;
    rawBytes += bytes.byteLength;
    gzipBytes += gz;
    if (polyfills.includes(file)) polyfillGzipBytes += gz;
  }
  return { files, rawBytes, gzipBytes, polyfillGzipBytes };
}

const kb = (bytes: number) => Math.round((bytes / 1024) * 10) / 10;

/** Figures for bench/run.ts; `failed: 1` when over budget, so `npm run bench` fails. */
export async function runJsBudget(nextDir = DEFAULT_NEXT_DIR): Promise<Record<string, number>> {
  const js = firstLoadJs(nextDir);
  const gzipKb = kb(js.gzipBytes);
  const figures: Record<string, number> = {
    route_editor_first_load_js_gzip_kb: gzipKb,
    route_editor_first_load_js_without_polyfills_gzip_kb: kb(js.gzipBytes - js.polyfillGzipBytes),
    route_editor_js_budget_gzip_kb: BUDGET_GZIP_KB,
    route_editor_js_headroom_kb: Math.round((BUDGET_GZIP_KB - gzipKb) * 10) / 10,
    route_editor_js_over_baseline_ratio: Math.round((gzipKb / BASELINE_GZIP_KB) * 100) / 100,
    route_editor_js_files: js.files.length,
  };
  if (gzipKb > BUDGET_GZIP_KB) figures.failed = 1;
  return figures;
}

async function main(): Promise<void> {
  try {
    const nextDir = process.argv[2] ? path.resolve(process.argv[2]) : DEFAULT_NEXT_DIR;
    const built = fs.existsSync(path.join(nextDir, 'BUILD_ID')) ? fs.statSync(path.join(nextDir, 'BUILD_ID')).mtime.toISOString() : 'unknown';
    const figures = await runJsBudget(nextDir);
    const gz = figures.route_editor_first_load_js_gzip_kb!;
    console.log(`Route editor first-load JS (build of ${built}): ${gz} kB gzipped (${figures.route_editor_first_load_js_without_polyfills_gzip_kb} kB without polyfills), ${figures.route_editor_js_files} files`);
    console.log(`Budget: ${BUDGET_GZIP_KB} kB (${BASELINE_GZIP_KB} kB + 60 kB): ${figures.failed ? `OVER by ${-figures.route_editor_js_headroom_kb!} kB` : `within, ${figures.route_editor_js_headroom_kb} kB to spare`}`);
    process.exitCode = figures.failed ? 1 : 0;
  } catch (error) {
    if (!(error instanceof NoBuildError)) throw error;
    console.error(`JS budget: ${error.message}`);
    process.exitCode = 1;
  }
}

if (require.main === module) void main();
