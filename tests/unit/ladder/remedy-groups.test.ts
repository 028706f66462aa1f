import { describe, expect, it } from 'vitest';
import { riserText, stepAriaLabel, stepFacts, stepLabelOf } from '@/components/ladder/ladder-describe';
import { buildLadder } from '@/components/ladder/ladder-geometry';
import { exportFileName } from '@/components/ladder/ladder-export';
import { groupRemedies, lnQExponent, samplesAround, stepCautions, warningWords } from '@/components/ladder/remedy-groups';
import { sampleEvaluation } from './ladder-fixture';

const evaluation = sampleEvaluation();
const step = (id: string) => evaluation.steps.find((s) => s.id === id)!;

describe('groupRemedies', () => {
  it('sorts the engine remedies into their kinds, keeping their order', () => {
    const g = groupRemedies(step('reform').remedies);
    expect(g.temperature).toHaveLength(1);
    expect(g.conditions.length).toBeGreaterThan(0);
    expect(g.coupling.length).toBeGreaterThan(1);
    // The engine's order is kept: the most plausible partner first (lib/thermo/route/coupling-partners.ts).
    const scores = g.coupling.map((r) => r.partnerScore);
    expect([...scores].sort((a, b) => b - a)).toEqual(scores);
    expect(g.coupling.map((r) => r.driverId)).toEqual(step('reform').remedies.filter((r) => r.kind === 'coupling').map((r) => (r as { driverId: string }).driverId));
  });

  it('reads unknown or malformed entries defensively', () => {
    const g = groupRemedies([null, 3, { kind: 'catalyst', summary: 'Try a catalyst' }, { kind: 'catalyst' }, { summary: 'no kind' }]);
    expect(g.other).toEqual([{ kind: 'catalyst', summary: 'Try a catalyst' }]);
    expect(groupRemedies(undefined).temperature).toEqual([]);
  });
});

describe('temperature samples', () => {
  it('finds ΔG at the current temperature and 50 K either side', () => {
    const t = groupRemedies(step('reform').remedies).temperature[0]!;
    const around = samplesAround(t);
    expect(around.at?.T_K).toBeCloseTo(298.15, 9);
    expect(around.below?.T_K).toBeCloseTo(248.15, 9);
    expect(around.above?.T_K).toBeCloseTo(348.15, 9);
    // Endothermic with ΔS° > 0: ΔG° falls as T rises.
    expect(around.above!.deltaG0_kJ).toBeLessThan(around.below!.deltaG0_kJ);
  });

  it('says null outside the data', () => {
    expect(samplesAround({ current_K: 300, samples: [] })).toEqual({ below: null, at: null, above: null });
  });
});

describe('words', () => {
  it('writes ln Q as a power of ten and warning codes in words', () => {
    expect(lnQExponent(Math.LN10 * 2)).toBe('2.0');
    expect(lnQExponent(-57.33)).toBe('−24.9');
    expect(lnQExponent(0.01)).toBe('0.0');
    expect(lnQExponent(Number.POSITIVE_INFINITY)).toBeNull();
    expect(warningWords(['PHASE_CHANGE', 'PHASE_CHANGE', 'NEW_CODE'])).toEqual(['a species changes phase', 'NEW_CODE']);
  });

  it('lists process-safety notes before engine warnings', () => {
    const c = stepCautions(step('reform'));
    expect(c[0]!.title).toBe('Gas evolution');
    expect(c.some((x) => x.title === 'Engine warning')).toBe(true);
    expect(stepCautions(step('loose'))[0]!.title).toBe('Heat release');
  });

  it('describes risers with glyph, value and class, not colour', () => {
    const model = buildLadder(evaluation.order, evaluation.steps, 'kJ');
    const [reform, synth, bad, loose] = model.steps;
    expect(riserText(reform!)).toBe('↑ +71.1');
    expect(riserText(synth!)).toBe('↓ −16.5');
    expect(riserText(bad!)).toBe('! check equation');
    expect(riserText(loose!)).toBe('not in totals');
    expect(stepAriaLabel(reform!, 'Reforming', 'kJ', true)).toBe('Step 1, Reforming; uphill; ΔG +71.1 kJ, running total +71.1 kJ; selected');
    expect(stepAriaLabel(bad!, 'bad', 'kJ', false)).toBe('Step 3, bad; not evaluated, check equation');
  });

  it('fills the tooltip from the step, energies in the chosen unit', () => {
    const facts = Object.fromEntries(stepFacts(step('reform'), 'kcal').map((f) => [f.term, f.value]));
    expect(facts['ΔG°']).toBe(`+${(142.124 / 4.184).toFixed(1)} kcal/mol`);
    expect(facts['Extent']).toBe('0.5 mol');
    expect(facts['Class']).toBe('↑ Uphill');
    expect(facts['Equation']).toContain('CH4(g)');
    expect(stepFacts(step('bad'), 'kJ')[0]!.value).toContain('Xx');
    expect(stepLabelOf('reform', { reform: '  ' })).toBe('reform');
  });

  it('makes safe export file names', () => {
    expect(exportFileName('Route 7 / ladder', 'svg')).toBe('route-7-ladder.svg');
    expect(exportFileName('  ', 'png')).toBe('free-energy-ladder.png');
  });
});
