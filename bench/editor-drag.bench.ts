// Editor drag benchmark: a 200-node route in Chromium, one node dragged continuously while the page records
// requestAnimationFrame intervals. Prints figures, asserts nothing. Run against a started server:
//   npx tsx scripts/e2e-server.ts &   then   npx tsx bench/editor-drag.bench.ts
import { chromium } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../db/seeders/demo-team';
import { E2E_BASE_URL } from '../tests/e2e/support/e2e-env';
import { signInSession } from './support/http-session';
import { percentile, round } from './support/stats';
import { syntheticChain } from './support/synthetic-route';

const NODES = 200;
/** ~125 Hz, a common mouse report rate */
const MOVE_INTERVAL_MS = 8;

type FrameWindow = Window & { __frames?: number[]; __recording?: boolean };

export async function runEditorDragBench(baseUrl: string, { moves = 300 } = {}): Promise<Record<string, number>> {
  const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
  const session = await signInSession(baseUrl, designer.email, DEMO_PASSWORD);
  const chain = syntheticChain(NODES);
  const name = `Bench: ${NODES}-node drag`;
  const created = (await (await session.fetch('/api/routes', { method: 'POST', body: { name, target: chain.target, targetAmount: '1 mol' } })).json()) as { id: number; version: number };
  const saved = await session.fetch(`/api/routes/${created.id}`, {
    method: 'PUT',
    body: { version: created.version, name, targetAmount: '1 mol', marginalThreshold_kJ: -17, ...chain },
  });
  if (!saved.ok) throw new Error(`saving the bench route failed: ${saved.status} ${await saved.text()}`);

  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking'],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    await context.addCookies(
      session.cookie.split('; ').map((pair) => {
        const [cookieName = '', ...rest] = pair.split('=');
        return { name: cookieName, value: rest.join('='), url: baseUrl };
      }),
    );
    const page = await context.newPage();
    const loadStarted = performance.now();
    await page.goto(`${baseUrl}/routes/${created.id}`);
    const nodes = page.locator('.react-flow__node');
    await nodes.nth(NODES - 1).waitFor({ state: 'attached', timeout: 60_000 });
    // The first evaluation has landed when no node says "not evaluated" any more.
    await page.waitForFunction(() => !document.querySelector('.react-flow')?.textContent?.includes('not evaluated'), undefined, { timeout: 60_000 });
    const loadMs = performance.now() - loadStarted;

    const handle = nodes.first().getByTestId('step-equation');
    const box = (await handle.boundingBox())!;
    const before = (await nodes.first().boundingBox())!;
    const x0 = box.x + box.width / 2;
    const y0 = box.y + box.height / 2;

    // A string, not a function: the bundler's helpers (keepNames) do not exist inside the page.
    await page.evaluate(`(() => {
      window.__frames = [];
      window.__recording = true;
      let last = 0;
      const tick = (t) => {
        if (last) window.__frames.push(t - last);
        last = t;
        if (window.__recording) requestAnimationFrame(tick);
      };
      requestAnimationFrame(tick);
    })()`);
    await page.mouse.move(x0, y0);
    await page.mouse.down();
    const started = performance.now();
    for (let i = 1; i <= moves; i += 1) {
      // A slow loop: out to the right and back, with a little vertical wobble.
      const phase = (i / moves) * Math.PI * 2;
      await page.mouse.move(x0 + Math.sin(phase / 2) * 260, y0 + Math.sin(phase * 3) * 40);
      const wait = started + i * MOVE_INTERVAL_MS - performance.now();
      if (wait > 0) await page.waitForTimeout(wait);
    }
    await page.mouse.move(x0 + 120, y0 + 60);
    await page.mouse.up();
    const dragMs = performance.now() - started;
    const frames = await page.evaluate(() => {
      const w = window as FrameWindow;
      w.__recording = false;
      return w.__frames ?? [];
    });
    const after = (await nodes.first().boundingBox())!;
    if (Math.abs(after.x - before.x) < 1 && Math.abs(after.y - before.y) < 1) throw new Error('the node did not move: the drag never reached it');

    // Condition edit → ladder redrawn: the debounce, the server evaluation of all 200 steps and the render.
    await nodes.nth(1).click();
    const temperature = page.getByLabel(/^Temperature/);
    const ladderHtml = () => page.evaluate(`document.querySelector('svg[aria-label^="Free-energy ladder"]')?.innerHTML ?? ''`) as Promise<string>;
    const updates: number[] = [];
    // Where the time goes: from the edit to the evaluate request leaving, and the request's round trip.
    const toRequest: number[] = [];
    const roundTrips: number[] = [];
    let editStarted = 0;
    let requestSent = 0;
    const isEvaluate = (url: string) => url.endsWith(`/api/routes/${created.id}/evaluate`);
    page.on('request', (req) => {
      if (!isEvaluate(req.url()) || !editStarted) return;
      requestSent = performance.now();
      toRequest.push(requestSent - editStarted);
    });
    page.on('requestfinished', (req) => {
      if (isEvaluate(req.url()) && requestSent) roundTrips.push(performance.now() - requestSent);
    });
    for (let i = 0; i < 8; i += 1) {
      const before = await ladderHtml();
      editStarted = performance.now();
      await temperature.fill(String(420 + (i % 2) * 60 + i));
      await page.waitForFunction(
        (old) => (document.querySelector('svg[aria-label^="Free-energy ladder"]')?.innerHTML ?? '') !== old,
        before,
        { timeout: 10_000, polling: 'raf' },
      );
      updates.push(performance.now() - editStarted);
    }

    return {
      nodes: NODES,
      load_to_evaluated_ms: round(loadMs, 0),
      drag_ms: round(dragMs, 0),
      moves,
      frames: frames.length,
      frame_p50_ms: round(percentile(frames, 50)),
      frame_p95_ms: round(percentile(frames, 95)),
      frame_max_ms: round(Math.max(...frames)),
      frames_over_50ms: frames.filter((f) => f > 50).length,
      ladder_update_p50_ms: round(percentile(updates, 50), 0),
      ladder_update_max_ms: round(Math.max(...updates), 0),
      ladder_update_edit_to_request_p50_ms: round(percentile(toRequest, 50), 0),
      ladder_update_round_trip_p50_ms: round(percentile(roundTrips, 50), 0),
    };
  } finally {
    await browser.close();
  }
}

if (process.argv[1] !== undefined && /editor-drag\.bench\.ts$/.test(process.argv[1])) {
  runEditorDragBench(E2E_BASE_URL).then(
    (figures) => {
      for (const [k, v] of Object.entries(figures)) console.log(`${k.padEnd(28)} ${v}`);
    },
    (err: unknown) => {
      console.error(err);
      process.exitCode = 1;
    },
  );
}
