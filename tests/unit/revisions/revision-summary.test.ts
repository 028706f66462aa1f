import { describe, expect, it } from 'vitest';
import { diffRevisions } from '@/lib/services/revisions/revision-diff';
import type { RevisionState, RouteSnapshot } from '@/lib/services/revisions/revision-snapshot';
import { formatKj, joinCapped, MAX_SUMMARY_LENGTH, summariseRevision, summaryParts } from '@/lib/services/revisions/revision-summary';
import type { StepInput } from '@/lib/schemas/route';

const step = (id: string, patch: Partial<StepInput> = {}): StepInput => ({
  id, equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K', yieldPct: 100, notes: '', position: { x: 0, y: 0 }, ...patch,
});
const snap = (steps: StepInput[], patch: Partial<RouteSnapshot> = {}): RouteSnapshot => ({
  name: 'Kestrel methanol', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps, links: [], ...patch,
});
const state = (s: RouteSnapshot, overall: number | null = null, stepDeltaG: Record<string, number | null> = {}): RevisionState => ({
  snapshot: s, stepDeltaG, overallDeltaG_kJ: overall,
});

describe('revision summary', () => {
  it('reads like the brief: added step, temperature change with one unit, overall ΔG with a real minus sign', () => {
    const before = state(snap([step('s1'), step('s3')]), -12.4);
    const after = state(snap([step('s1'), step('s3', { temperature: '650 K' }), step('s4')]), -20.1);
    expect(summariseRevision(before, after)).toBe('+1 step, T of Step 2 (methanol from carbon monoxide) 500 → 650 K, ΔG overall \u221212.4 → \u221220.1 kJ');
  });

  it('puts the head first and says when nothing changed', () => {
    const s = state(snap([step('s1')]), -3);
    expect(summariseRevision(s, s)).toBe('No changes');
    expect(summariseRevision(s, s, 'Restored revision 2')).toBe('Restored revision 2');
    expect(summariseRevision(null, s, 'Created')).toBe('Created');
    const renamed = state(snap([step('s1')], { name: 'Kestrel methanol B' }), -3);
    expect(summariseRevision(s, renamed, 'Restored revision 2')).toBe('Restored revision 2: renamed "Kestrel methanol" → "Kestrel methanol B"');
  });

  it('words fields set, cleared, moved, and links', () => {
    const before = state(snap([step('s1'), step('s2')], { links: [{ from: 's1', to: 's2', species: 'CO(g)' }] }));
    const after = state(snap([step('s1', { totalPressure: '50 bar', temperature: undefined }), step('s2', { position: { x: 10, y: 0 } })]));
    expect(summaryParts(diffRevisions(before, after))).toEqual(['T of s1 cleared', 'total P of s1 set to 50 bar', '1 step moved on the board', '\u22121 link']);
  });

  it('names steps by their place in route order and what they do, never by id', () => {
    const before = state(snap([step('s-8ab5e2fd'), step('s-c522bf8f', { equation: 'C2H5OH(g) -> CH3CHO(g) + H2(g)' })]));
    const after = state(snap([step('s-8ab5e2fd'), step('s-c522bf8f', { equation: 'C2H5OH(g) -> CH3CHO(g) + H2(g)', temperature: '600 K', position: { x: 5, y: 5 } })]));
    const line = summariseRevision(before, after);
    expect(line).toBe('T of Step 2 (ethanol dehydrogenation) 500 → 600 K, 1 step moved on the board');
    expect(line).not.toMatch(/\bs-[0-9a-f]{6,}\b/);
  });

  it('leaves out an overall ΔG change that rounds away, and notes one that appears', () => {
    expect(summaryParts(diffRevisions(state(snap([step('s1')]), -12.41), state(snap([step('s1')]), -12.44)))).toEqual([]);
    expect(summaryParts(diffRevisions(state(snap([step('s1')]), null), state(snap([step('s1')]), -0.04)))).toEqual(['ΔG overall now 0.0 kJ']);
  });

  it('never passes the cap, and says how many parts it left out', () => {
    const many = Array.from({ length: 60 }, (_, i) => `s${i}`);
    const before = state(snap(many.map((id) => step(id))));
    const after = state(snap(many.map((id) => step(id, { temperature: '650.25 K' }))));
    const line = summariseRevision(before, after, 'Restored revision 12');
    expect(line.length).toBeLessThanOrEqual(MAX_SUMMARY_LENGTH);
    expect(line).toMatch(/^Restored revision 12: T of Step 1 \(methanol from carbon monoxide\) 500 → 650\.25 K, .*, \+\d+ more$/);
    const shown = line.split(', ').length - 1;
    expect(Number(/\+(\d+) more$/.exec(line)![1]) + shown).toBe(60);
  });

  it('caps a single over-long part and a long head', () => {
    expect(joinCapped('', ['x'.repeat(500)]).length).toBeLessThanOrEqual(MAX_SUMMARY_LENGTH);
    expect(joinCapped('', ['x'.repeat(500)])).toBe('+1 more');
    expect(joinCapped('D'.repeat(400), []).length).toBe(MAX_SUMMARY_LENGTH);
  });

  it('formats kJ with one decimal, no negative zero', () => {
    expect(formatKj(-0.04)).toBe('0.0');
    expect(formatKj(-20.06)).toBe('\u221220.1');
    expect(formatKj(135)).toBe('135.0');
  });
});

describe('revision summary numbers', () => {
  it('write e-notation as typed into a field as a power of ten, and a negative as typed with the true minus', () => {
    const before = state(snap([step('s1', { pressures: { 'CO(g)': '1e-7 bar' } })]));
    const after = state(snap([step('s1', { pressures: { 'CO(g)': '2.5e-6 bar' } })]));
    expect(summariseRevision(before, after)).toBe('p(CO(g)) of Step 1 (methanol from carbon monoxide) 10⁻⁷ → 2.5 × 10⁻⁶ bar');
    const threshold = summariseRevision(state(snap([step('s1')])), state(snap([step('s1')], { marginalThreshold_kJ: -20 })));
    expect(threshold).toBe('threshold \u221217 → \u221220 kJ');
  });
});
