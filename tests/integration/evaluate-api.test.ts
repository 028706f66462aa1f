import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as evaluate } from '@/app/api/evaluate/route';
import { POST as fit } from '@/app/api/fit/route';
import { makeTeamWithLead } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let userId = 0;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  userId = (await makeTeamWithLead('thermo')).leadId;
});
afterAll(async () => teardownTestDb(dir));

const post = (handler: typeof evaluate, body: unknown) => callRoute(handler, { method: 'POST', userId, body });

describe('POST /api/evaluate', () => {
  it('evaluates a step with the contract fields', async () => {
    // NBS 1982: ΔfG°(H2O, l) = −237.129 kJ/mol
    const res = await post(evaluate, { equation: 'H2(g) + 1/2 O2(g) -> H2O(l)' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ equation: 'H2(g) + 1/2 O2(g) ⇌ H2O(l)', balanced: true, temperature_K: 298.15, direction: 'forward', deltaG_kJ: null, lnQ: null });
    expect((res.body as { deltaG0_kJ: number }).deltaG0_kJ).toBeCloseTo(-237.129, 3);
  });

  it('answers an array with one entry per item, an error object in place of a failure', async () => {
    const res = await post(evaluate, [{ equation: 'C(s) + O2(g) -> CO2(g)' }, { equation: 'C(s) + O2(g) -> CO(g)' }, { nonsense: true }]);
    expect(res.status).toBe(200);
    const items = res.body as Array<Record<string, unknown>>;
    expect(items).toHaveLength(3);
    expect(items[0]).toHaveProperty('deltaG0_kJ');
    expect(items[1]).toMatchObject({ error: { code: 'UNBALANCED' } });
    expect(items[2]).toMatchObject({ error: { code: 'VALIDATION' } });
  });

  it('names the unbalanced elements and offers the balanced form', async () => {
    const res = await post(evaluate, { equation: 'H2(g) + O2(g) -> H2O(l)' });
    expect(res.status).toBe(400);
    expect(errorOf(res.body).code).toBe('UNBALANCED');
    expect(errorOf(res.body).message).toContain('2 H2(g) + O2(g) ⇌ 2 H2O(l)');
  });

  it('refuses T ≤ 0 K, negative pressures and unknown units with a 400 that names the field', async () => {
    for (const body of [
      { equation: 'N2O4(g) -> 2 NO2(g)', temperature: '-5 K' },
      { equation: 'N2O4(g) -> 2 NO2(g)', pressures: { 'NO2(g)': '-1 bar' } },
      { equation: 'N2O4(g) -> 2 NO2(g)', temperature: '300 furlongs' },
    ]) {
      const res = await post(evaluate, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(errorOf(res.body).message.length).toBeGreaterThan(5);
    }
  });

  it('never answers 5xx, and every 4xx has the error shape, over 2,000 generated bodies', async () => {
    const species = fc.constantFrom('H2(g)', 'O2(g)', 'H2O(l)', 'H2O(g)', 'CO2(g)', 'NH3(g)', 'N2(g)', 'Xq(g)', 'NaCl(s)', 'Na+(aq)', 'Cl-(aq)', 'ethanol(l)');
    const quantity = fc.oneof(fc.constantFrom('1 bar', '0 bar', '-2 atm', '25 degC', '700 K', '0 K', '1e400 K', 'abc', '3 mol/L', ''), fc.string());
    const body = fc.oneof(
      fc.record(
        {
          equation: fc.oneof(fc.string(), fc.tuple(species, species, species).map(([a, b, c]) => `${a} + ${b} -> ${c}`)),
          temperature: quantity,
          standardPressure: fc.constantFrom('1 bar', '1 atm', '2 bar'),
          heatCapacity: fc.boolean(),
          pressures: fc.dictionary(species, quantity, { maxKeys: 3 }),
          electrons: fc.oneof(fc.integer(), fc.double()),
        },
        { requiredKeys: [] },
      ),
      fc.anything(),
    );
    await fc.assert(
      fc.asyncProperty(body, async (b) => {
        const res = await post(evaluate, b);
        expect(res.status).toBeLessThan(500);
        if (res.status >= 400) expect(res.body).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
        else expect(JSON.stringify(res.body)).not.toMatch(/NaN|Infinity/);
      }),
      { numRuns: 2000 },
    );
  }, 120_000);
});

describe('POST /api/fit', () => {
  it('fits ΔH° and ΔS° and refuses fewer than three points', async () => {
    const ok = await post(fit, { points: [{ temperature: '400 K', lnK: 5 }, { temperature: '500 K', lnK: 3 }, { temperature: '600 K', lnK: 1.667 }] });
    expect(ok.status).toBe(200);
    // ln K = −5 + 4000/T: slope −ΔH°/R = 4000 K, intercept ΔS°/R = −5 (R = 8.314462618, CODATA 2018)
    expect(ok.body).toMatchObject({ n: 3, residuals_lnK: expect.any(Array) });
    const result = ok.body as { deltaH0_kJ: number; deltaS0_J_per_K: number };
    expect(result.deltaH0_kJ).toBeCloseTo(-33.258, 1);
    expect(result.deltaS0_J_per_K).toBeCloseTo(-41.57, 0);
    const few = await post(fit, { points: [{ temperature: '400 K', lnK: 5 }, { temperature: '500 K', lnK: 3 }] });
    expect(few.status).toBe(400);
  });
});
