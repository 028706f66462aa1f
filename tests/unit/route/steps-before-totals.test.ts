// Every step is evaluated from the moment it is added, before the route reaches its target or is linked; only the
// totals wait. ΔfG° values from NBS 1982 (Wagman et al., J. Phys. Chem. Ref. Data 11, Suppl. 2), worked by hand.
import { describe, expect, it } from 'vitest';
import { evaluateStep } from '@/lib/thermo';
import { evaluateRoute } from '@/lib/thermo/route';
import { nbsLookup } from '@/lib/thermo/species-library';

const REFORMING = 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)';
const METHANOL = 'CO(g) + 2 H2(g) -> CH3OH(g)';

describe('a new route', () => {
  it('evaluates its first step although no step makes the target yet', () => {
    const r = evaluateRoute({ target: 'CH3OH(g)', steps: [{ id: 'a', equation: REFORMING }] }, { lookup: nbsLookup });
    const step = r.steps[0]!;
    // ΔrG° = −137.168 − (−50.72 − 228.572) = 142.124 kJ/mol (NBS 1982).
    expect(step.result!.deltaG0_kJ).toBeCloseTo(142.124, 2);
    expect(Math.log10(step.result!.K!)).toBeCloseTo(-142124 / (8.314462618 * 298.15 * Math.LN10), 2);
    expect(step.class).toBe('uphill');
    expect(step.error).toBeNull();
    expect(step.remedies.length).toBeGreaterThan(0);
    expect(step.extent_mol).toBeNull();
    expect(r.totalsWithheld).toMatchObject({ code: 'INVALID_VALUE', field: 'target' });
    expect(r.totalsWithheld!.message).toContain('No step makes the target CH3OH(g)');
  });

  it('evaluates unlinked steps each on their own, the same as alone', () => {
    const r = evaluateRoute({ target: 'CH3OH(g)', steps: [{ id: 'a', equation: REFORMING }, { id: 'b', equation: METHANOL, temperature: '500 K' }] }, { lookup: nbsLookup });
    const alone = evaluateStep({ equation: METHANOL, temperature: '500 K' }, { lookup: nbsLookup });
    expect(r.steps.find((s) => s.id === 'b')!.result!.deltaG0_kJ).toBe(alone.deltaG0_kJ);
    expect(r.steps.find((s) => s.id === 'a')!.result).not.toBeNull();
    // b makes the target, so the totals stand; a is disconnected and left out of them.
    expect(r.totalsWithheld).toBeNull();
    expect(r.warnings.map((w) => w.code)).toContain('DISCONNECTED');
  });

  it('keeps the steps when the target is not a species at all, and says so at the target', () => {
    const r = evaluateRoute({ target: 'Unobtainium(g)', steps: [{ id: 'a', equation: METHANOL }] }, { lookup: nbsLookup });
    expect(r.steps[0]!.result).not.toBeNull();
    expect(r.totalsWithheld?.field).toBe('target');
    expect(['UNKNOWN_SPECIES', 'PARSE_ERROR']).toContain(r.totalsWithheld?.code);
    expect(r.totalsWithheld?.message).toMatch(/^target: /);
  });

  it('still refuses a request that is malformed as a whole (duplicate step ids)', () => {
    expect(() => evaluateRoute({ target: 'CH3OH(g)', steps: [{ id: 'a', equation: METHANOL }, { id: 'a', equation: METHANOL }] }, { lookup: nbsLookup })).toThrow(/used by steps 0 and 1/);
  });
});
