// Crash safety: SIGKILL the production server mid-write, restart it on the same file; the database passes
// PRAGMA integrity_check and every save the server acknowledged is there as a revision.
import { expect, test } from '@playwright/test';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sqlite3 from 'sqlite3';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signInSession } from '../../bench/support/http-session';
import { prepareDatabase, startOwnServer } from './support/own-server';
import { createRoute, saveRoute } from './support/route-saves';
import { freePort } from '../../scripts/support/free-port';

const WRITERS = 4;

function query<T>(file: string, sql: string, params: unknown[] = []): Promise<T[]> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, (err) => err && reject(err));
    db.all(sql, params, (err, rows) => db.close(() => (err ? reject(err) : resolve(rows as T[]))));
  });
}

test('a SIGKILL mid-write loses no acknowledged save and leaves the database intact', async () => {
  test.setTimeout(60_000);
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'stepwell-crash-'));
  const dbFile = path.join(dir, 'stepwell.sqlite');
  prepareDatabase(dbFile);
  // A free port, never a fixed one another program (or a server left over) might hold.
  const port = await freePort();
  let server = await startOwnServer({ port, dbFile });
  try {
    const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
    const session = await signInSession(server.url, designer.email, DEMO_PASSWORD);
    const routes = await Promise.all(Array.from({ length: WRITERS }, (_, i) => createRoute(session, `Crash writer ${i}`)));
    const acked = routes.map((r) => r.version); // the last version each writer saw acknowledged
    let stopping = false;
    let saves = 0;
    // Each writer saves its own route back to back; a save in flight at the kill may or may not land.
    const writers = routes.map(async (route, w) => {
      while (!stopping) {
        const outcome = await saveRoute(session, route.id, acked[w]!, saves).catch(() => null);
        if (!outcome) return; // the connection died with the server
        if (outcome.kind !== 'saved') throw new Error(`writer ${w}: ${JSON.stringify(outcome)}`);
        acked[w] = outcome.version;
        saves += 1;
      }
    });
    // Kill at an uneven moment once the writers are well under way.
    await new Promise((r) => setTimeout(r, 2500 + Math.random() * 1500));
    await server.kill();
    stopping = true;
    await Promise.all(writers);
    expect(saves, 'saves before the kill').toBeGreaterThan(10);

    // The file as the crash left it (WAL and all), before anything opens it cleanly.
    expect(await query<{ integrity_check: string }>(dbFile, 'PRAGMA integrity_check')).toEqual([{ integrity_check: 'ok' }]);
    server = await startOwnServer({ port, dbFile });
    const after = await signInSession(server.url, designer.email, DEMO_PASSWORD);
    for (const [w, route] of routes.entries()) {
      const res = await after.fetch(`/api/routes/${route.id}`);
      expect(res.status).toBe(200);
      const version = ((await res.json()) as { version: number }).version;
      // At most the one save in flight at the kill landed without its answer.
      expect(version, `route of writer ${w}`).toBeGreaterThanOrEqual(acked[w]!);
      expect(version).toBeLessThanOrEqual(acked[w]! + 1);
      const revisions = await query<{ version: number }>(dbFile, 'SELECT version FROM route_revisions WHERE route_id = ? ORDER BY version', [route.id]);
      expect(revisions.map((r) => r.version), `revisions of writer ${w}`).toEqual(Array.from({ length: version }, (_, i) => i + 1));
    }
    expect(await query<{ integrity_check: string }>(dbFile, 'PRAGMA integrity_check')).toEqual([{ integrity_check: 'ok' }]);
  } finally {
    await server.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  }
});
