// The JS budget reads first-load JS from the build output: the build manifest's root scripts and polyfills plus the
// entry chunks of the page and its layouts, not other pages' chunks. Checked on a small fake build laid out as
// Next 16 writes it (build-manifest.json, server/app/…/page_client-reference-manifest.js, static/chunks).
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BUDGET_GZIP_KB, EDITOR_PAGE, NoBuildError, firstLoadJs, runJsBudget } from '@/bench/js-budget';

let dir: string;
const chunk = (name: string, size: number, seed: string) => {
  // Text that compresses but not to nothing, different per file.
  let text = '';
  for (let i = 0; text.length < size; i++) text += `${seed}${i * 7919}${(i * 104729) % 9973};`;
  fs.writeFileSync(path.join(dir, 'static/chunks', name), text.slice(0, size));
};
const gz = (name: string) => zlib.gzipSync(fs.readFileSync(path.join(dir, 'static/chunks', name))).byteLength;

function writeBuild(pageChunkSize: number) {
  fs.mkdirSync(path.join(dir, 'static/chunks'), { recursive: true });
  fs.mkdirSync(path.join(dir, 'server/app/(app)/routes/[routeId]'), { recursive: true });
  fs.writeFileSync(path.join(dir, 'BUILD_ID'), 'fake');
  for (const [name, size] of [['poly.js', 3000], ['root.js', 5000], ['layout.js', 2000], ['app-layout.js', 2500], ['other-page.js', 9000]] as const) chunk(name, size, name);
  chunk('editor.js', pageChunkSize, 'editor');
  fs.writeFileSync(path.join(dir, 'build-manifest.json'), JSON.stringify({ polyfillFiles: ['static/chunks/poly.js'], rootMainFiles: ['static/chunks/root.js'] }));
  const manifest = {
    clientModules: {},
    entryJSFiles: {
      '[project]/app/layout': ['static/chunks/layout.js'],
      '[project]/app/not-found': ['static/chunks/layout.js', 'static/chunks/other-page.js'],
      '[project]/app/(app)/layout': ['static/chunks/layout.js', 'static/chunks/app-layout.js'],
      [`[project]/app${EDITOR_PAGE}`]: ['static/chunks/layout.js', 'static/chunks/app-layout.js', 'static/chunks/editor.js'],
    },
  };
  fs.writeFileSync(
    path.join(dir, `server/app${EDITOR_PAGE}_client-reference-manifest.js`),
    `globalThis.__RSC_MANIFEST = globalThis.__RSC_MANIFEST || {};\nglobalThis.__RSC_MANIFEST[${JSON.stringify(EDITOR_PAGE)}] = ${JSON.stringify(manifest)};\n`,
  );
}

beforeAll(() => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'js-budget-'));
});
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

describe('js budget', () => {
  it('says clearly that there is no build', () => {
    expect(() => firstLoadJs(path.join(dir, 'missing'))).toThrow(NoBuildError);
    expect(() => firstLoadJs(path.join(dir, 'missing'))).toThrow(/Run `next build`/);
  });

  it('counts root scripts, polyfills and the page and layout entries once each, and no other page', async () => {
    writeBuild(4000);
    const js = firstLoadJs(dir);
    expect(js.files.sort()).toEqual(['static/chunks/app-layout.js', 'static/chunks/editor.js', 'static/chunks/layout.js', 'static/chunks/poly.js', 'static/chunks/root.js']);
    expect(js.gzipBytes).toBe(['poly.js', 'root.js', 'layout.js', 'app-layout.js', 'editor.js'].reduce((sum, f) => sum + gz(f), 0));
    expect(js.polyfillGzipBytes).toBe(gz('poly.js'));
    const figures = await runJsBudget(dir);
    expect(figures.route_editor_first_load_js_gzip_kb).toBeCloseTo(js.gzipBytes / 1024, 1);
    expect(figures.failed).toBeUndefined();
  });

  it('fails the run when the page goes over the budget', async () => {
    // Random bytes do not compress, so the gzipped size passes the budget.
    fs.writeFileSync(path.join(dir, 'static/chunks/editor.js'), crypto.randomBytes((BUDGET_GZIP_KB + 10) * 1024));
    const figures = await runJsBudget(dir);
    expect(figures.route_editor_first_load_js_gzip_kb).toBeGreaterThan(BUDGET_GZIP_KB);
    expect(figures.failed).toBe(1);
  });
});
