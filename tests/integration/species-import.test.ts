import fs from 'node:fs';
import path from 'node:path';
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as importsRoute from '@/app/api/species/imports/route';
import * as importRoute from '@/app/api/species/imports/[importId]/route';
import * as commitRoute from '@/app/api/species/imports/[importId]/commit/route';
import * as fileRoute from '@/app/api/species/imports/[importId]/file/route';
import { getDb } from '@/db';
import { MAX_IMPORT_BYTES } from '@/lib/species/csv-rows';
import { makeRoleSet } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { CSV_HEADER, csvRow, speciesInput } from './support/species-fixtures';
import { setupTestDb, teardownTestDb } from './support/test-db';

type World = Awaited<ReturnType<typeof makeRoleSet>>;
let dir = '';
let w: World;

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

const upload = (text: string | Buffer, userId = w.designerId, type = 'text/csv', fileName = 'kestrel-species.csv') =>
  callRoute(importsRoute.POST, {
    method: 'POST', userId, path: `/api/species/imports?fileName=${encodeURIComponent(fileName)}`,
    rawBody: text as string, headers: { 'content-type': type },
  });
const commit = (importId: number, body: unknown = {}, userId = w.designerId) =>
  callRoute(commitRoute.POST, { method: 'POST', userId, params: { importId: String(importId) }, body });
const teamCount = () => getDb().models.TeamSpecies.count({ where: { teamId: w.teamId } });
const storedFiles = () => {
  const root = path.join(process.env.STORAGE_DIR!, 'species-imports');
  return fs.existsSync(root) ? fs.readdirSync(root, { recursive: true }).filter((f) => String(f).endsWith('.csv')).length : 0;
};

interface Preview { id: number; checksum: string; status: string; counts: { rows: number; withErrors: number; duplicates: number }; rows: { row: number; key: string; errors: Record<string, string>; duplicate: { of: string } | null; consistency: string | null }[] }

describe('species CSV import', () => {
  it('previews a good file, stores it with checksum and importer, and commits it', async () => {
    const text = `${CSV_HEADER}\n${csvRow()}\n${csvRow()}\n${csvRow()}\n`;
    const res = await upload(text);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const p = res.body as Preview & { importedBy: string; fileName: string };
    expect(p.counts).toMatchObject({ rows: 3, withErrors: 0, duplicates: 0 });
    expect(p.rows.every((r) => r.consistency === 'derived')).toBe(true);
    expect(p.checksum).toBe(createHash('sha256').update(text).digest('hex'));
    expect(p).toMatchObject({ status: 'preview', fileName: 'kestrel-species.csv', importedBy: expect.any(String) });
    expect(await teamCount()).toBe(0);

    const done = await commit(p.id);
    expect(done.status, JSON.stringify(done.body)).toBe(200);
    expect(done.body).toMatchObject({ created: 3, overridden: 0, skipped: 0 });
    expect(await teamCount()).toBe(3);
    expect((await commit(p.id)).status).toBe(409); // once only

    const file = await callRoute(fileRoute.GET, { userId: w.reviewerId, params: { importId: String(p.id) } });
    expect(file.status).toBe(200);
    expect(file.body).toBe(text);
    expect(file.headers.get('x-content-sha256')).toBe(p.checksum);
    expect(file.headers.get('content-disposition')).toContain('kestrel-species.csv');
    const listed = (await callRoute(importsRoute.GET, { userId: w.reviewerId })).body as { items: { id: number; status: string; counts: { created: number } }[] };
    expect(listed.items.find((i) => i.id === p.id)).toMatchObject({ status: 'committed', counts: { created: 3 } });
  });

  it('imports nothing when one row is bad, and says which row and field', async () => {
    const before = await teamCount();
    const text = `${CSV_HEADER}\n${csvRow()}\nC2H6,g,bad ethane,-84.68,,not-a-number,citation,NBS 1982\n${csvRow()}\n`;
    const p = (await upload(text)).body as Preview;
    expect(p.counts.withErrors).toBe(1);
    expect(p.rows[1]).toMatchObject({ row: 2, errors: { S: expect.stringMatching(/“not-a-number” is not a number/) } });
    const res = await commit(p.id);
    expect(res.status).toBe(422);
    expect(errorOf(res.body).message).toMatch(/1 row has errors, so nothing was imported/);
    expect(await teamCount()).toBe(before);
  });

  it('shows duplicates of team and built-in species and applies skip or override', async () => {
    const { createTeamSpecies } = await import('@/lib/services/species/create-team-species');
    const mine = await createTeamSpecies({ teamId: w.teamId, userId: w.leadId, input: speciesInput() });
    const formula = mine.formula;
    // CO2(g) as in NBS 1982 (ΔfH° −393.509, ΔfG° −394.359, S° 213.74) duplicates the built-in row.
    const text = [
      CSV_HEADER,
      `${formula},g,re-estimated chain,-150,,450,estimated,Second worksheet`,
      'CO2,g,carbon dioxide (team copy),-393.509,-394.359,213.74,citation,NBS 1982',
      csvRow(),
    ].join('\n');
    const p = (await upload(text)).body as Preview;
    expect(p.rows.map((r) => r.duplicate?.of ?? null)).toEqual(['team', 'library', null]);

    const undecided = await commit(p.id);
    expect(undecided.status).toBe(400);
    expect(Object.keys(errorOf(undecided.body).fields ?? {})).toEqual([`choices.${mine.key}`, 'choices.CO2(g)']);

    const before = await teamCount();
    const res = await commit(p.id, { choices: { [mine.key]: 'override' }, otherwise: 'skip' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ created: 1, overridden: 1, skipped: 1 });
    expect(await teamCount()).toBe(before + 1);
    const updated = await getDb().models.TeamSpecies.findByPk(mine.id);
    expect(updated).toMatchObject({ name: 're-estimated chain', dfhKj: -150, version: mine.version + 1, importId: p.id });
    expect(await getDb().models.TeamSpecies.count({ where: { teamId: w.teamId, key: 'CO2(g)' } })).toBe(0);
  });

  it('refuses a file over 2 MB and stores nothing', async () => {
    const files = storedFiles();
    const line = `${csvRow()}\n`;
    const big = `${CSV_HEADER}\n${line.repeat(Math.ceil(MAX_IMPORT_BYTES / line.length) + 1)}`;
    const res = await upload(big);
    expect(res.status).toBe(413);
    expect(errorOf(res.body).message).toMatch(/larger than 2 MB/);
    expect(storedFiles()).toBe(files);
  });

  it('refuses more than 5,000 rows with a clear message', async () => {
    const rows = Array.from({ length: 5001 }, (_, i) => `C${i + 1}H${2 * i + 4},g,n${i},-100,,300,estimated,x`);
    const res = await upload(`${CSV_HEADER}\n${rows.join('\n')}\n`);
    expect(res.status).toBe(422);
    expect(errorOf(res.body).message).toMatch(/5,001 rows; one import takes at most 5,000/);
  });

  it('refuses binary, non-UTF-8, non-CSV types and a wrong header, storing nothing', async () => {
    const files = storedFiles();
    const imports = await getDb().models.SpeciesImport.count();
    expect((await upload(Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x00, 0x00]).toString('latin1'))).status).toBe(415);
    const latin1 = Buffer.concat([Buffer.from(`${CSV_HEADER}\nH2O,l,eau `), Buffer.from([0xe9]), Buffer.from(',-285.83,,69.91,citation,NBS 1982\n')]);
    const req = await callRoute(importsRoute.POST, { method: 'POST', userId: w.designerId, rawBody: latin1 as unknown as string, headers: { 'content-type': 'text/csv' } });
    expect(req.status).toBe(400);
    expect(errorOf(req.body).message).toMatch(/not UTF-8/);
    expect((await upload('{"a":1}', w.designerId, 'application/json')).status).toBe(415);
    const header = await upload('name,colour\nwater,blue\n');
    expect(header.status).toBe(422);
    expect(errorOf(header.body).message).toMatch(/not one we know/);
    expect(storedFiles()).toBe(files);
    expect(await getDb().models.SpeciesImport.count()).toBe(imports);
  });

  it('keeps imports to their team and their editors', async () => {
    const p = (await upload(`${CSV_HEADER}\n${csvRow()}\n`)).body as Preview;
    expect((await callRoute(importRoute.GET, { userId: w.foreignId, params: { importId: String(p.id) } })).status).toBe(404);
    expect((await callRoute(fileRoute.GET, { userId: w.foreignId, params: { importId: String(p.id) } })).status).toBe(404);
    expect((await commit(p.id, {}, w.foreignId)).status).toBe(404);
    expect((await commit(p.id, {}, w.reviewerId)).status).toBe(403);
    expect((await upload(`${CSV_HEADER}\n${csvRow()}\n`, w.reviewerId)).status).toBe(403);
    const again = (await callRoute(importRoute.GET, { userId: w.reviewerId, params: { importId: String(p.id) } })).body as Preview;
    expect(again.counts.rows).toBe(1);
  });
});
