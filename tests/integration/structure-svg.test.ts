// GET /api/structures/svg: RDKit's drawing of a structure as an SVG image, cached per InChIKey and size.
// Structural facts checked: ethanol (CH3CH2OH) has 3 heavy atoms and 2 bonds between them; benzene 6 ring bonds
// (any organic chemistry text); InChIKey of ethanol LFQSCWFLJHTTHZ-UHFFFAOYSA-N (PubChem CID 702).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as svgRoute } from '@/app/api/structures/svg/route';
import { pageCsp } from '@/lib/security/csp';
import { drawStructure, styleToAttributes } from '@/lib/services/structures/draw-structure';
import { makeTeamWithLead } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let userId = 0;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  userId = (await makeTeamWithLead('drawings')).leadId;
});
afterAll(async () => teardownTestDb(dir));

const get = (query: Record<string, string>, who: number | null = userId) =>
  callRoute(svgRoute, { userId: who, path: `/api/structures/svg?${new URLSearchParams(query).toString()}` });

const bondsIn = (svg: string) => new Set([...svg.matchAll(/class='bond-(\d+)/g)].map((m) => m[1])).size;

describe('styleToAttributes', () => {
  it('turns each style declaration into an attribute, the style winning over an attribute of the same name', () => {
    expect(styleToAttributes("<path d='M 1,2 L 3,4' fill='#000' style='fill:none;stroke:#4A5853;stroke-width:2.0px' />")).toBe(
      "<path d='M 1,2 L 3,4' fill='none' stroke='#4A5853' stroke-width='2.0px' />",
    );
    expect(styleToAttributes("<rect style='opacity:1.0;fill:#FFFFFF' width='10'> </rect>")).toBe("<rect width='10' opacity='1.0' fill='#FFFFFF'> </rect>");
    expect(styleToAttributes("<?xml version='1.0'?><g class='x'/>")).toBe("<?xml version='1.0'?><g class='x'/>");
  });
});

describe('GET /api/structures/svg', () => {
  it('answers an SVG image of the structure at the size asked, without a background, in our ink, cacheable', async () => {
    const res = await get({ smiles: 'CCO', w: '120', h: '90' });
    expect(res.status, String(res.body)).toBe(200);
    expect(res.headers.get('content-type')).toBe('image/svg+xml');
    expect(res.headers.get('cache-control')).toMatch(/max-age=31536000/);
    const svg = res.body as string;
    expect(svg).toMatch(/<svg[^>]*width='120px' height='90px'/);
    expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
    expect(bondsIn(svg)).toBe(2);
    // clearBackground: false leaves out RDKit's white rectangle; the palette puts every atom and bond in #4A5853.
    expect(svg).not.toMatch(/<rect[^>]*fill:#FFFFFF/i);
    expect(svg).toMatch(/#4A5853/i);
    expect(svg).not.toMatch(/#FF0000/i);
    expect(svg).not.toMatch(/<script/i);
    // paint as attributes, not styles, so a strict CSP on the image cannot strip it; no tag repeats an attribute
    expect(svg).not.toMatch(/style=/);
    expect(svg).toMatch(/<path class='bond-0[^>]* stroke='#4A5853'/);
    for (const tag of svg.match(/<[a-z][^<>]*>/g) ?? []) {
      const names = [...tag.matchAll(/\s([a-zA-Z:-]+)='/g)].map((m) => m[1]);
      expect(new Set(names).size, tag).toBe(names.length);
    }
  });

  it('draws benzene with its six ring bonds', async () => {
    const res = await get({ smiles: 'c1ccccc1' });
    expect(res.status).toBe(200);
    expect(bondsIn(res.body as string)).toBe(6);
    // default size 160 × 120
    expect(res.body as string).toMatch(/width='160px' height='120px'/);
  });

  it('answers identical bytes for the same structure however it is written, from the cache the second time', async () => {
    const first = await drawStructure({ smiles: 'OCC', width: 100, height: 80 });
    const second = await drawStructure({ smiles: 'C(O)C', width: 100, height: 80 });
    expect(first.inchikey).toBe('LFQSCWFLJHTTHZ-UHFFFAOYSA-N');
    expect(second.cached).toBe(true);
    expect(second.svg).toBe(first.svg);
    const a = await get({ smiles: 'OCC', w: '100', h: '80' });
    const b = await get({ smiles: 'CCO', w: '100', h: '80' });
    expect(b.body).toBe(a.body);
    expect(a.body).toBe(first.svg);
  });

  it('keeps sizes apart in the cache', async () => {
    const small = await drawStructure({ smiles: 'CC(=O)O', width: 60, height: 45 });
    const large = await drawStructure({ smiles: 'CC(=O)O', width: 300, height: 200 });
    expect(large.cached).toBe(false);
    expect(large.svg).not.toBe(small.svg);
    expect(large.svg).toMatch(/width='300px'/);
  });

  it('refuses an unreadable SMILES with 400 in the error shape', async () => {
    for (const smiles of ['C1CC', 'C(C', 'Xx']) {
      const res = await get({ smiles });
      expect(res.status, smiles).toBe(400);
      expect(errorOf(res.body).code).toBe('INVALID_STRUCTURE');
      expect(errorOf(res.body).message).toMatch(/SMILES/);
    }
  });

  it('refuses sizes outside 24–640 px and unknown parameters with 400 VALIDATION', async () => {
    const queries: Record<string, string>[] = [{ smiles: 'CCO', w: '5000' }, { smiles: 'CCO', h: '3' }, { smiles: 'CCO', w: 'wide' }, { smiles: '' }, { smiles: 'CCO', colour: 'red' }];
    for (const query of queries) {
      const res = await get(query);
      expect(res.status, JSON.stringify(query)).toBe(400);
      expect(errorOf(res.body).code).toBe('VALIDATION');
    }
  });

  it('is allowed as an image by the pages’ CSP (same origin)', () => {
    for (const isDev of [false, true]) expect(pageCsp({ nonce: 'n', isDev }).split('; ')).toContain("img-src 'self' blob: data:");
  });

  it('answers 401 to a caller who is not signed in', async () => {
    const res = await get({ smiles: 'CCO' }, null);
    expect(res.status).toBe(401);
    expect(errorOf(res.body).code).toBe('UNAUTHENTICATED');
  });
});
