import { describe, expect, it } from 'vitest';
import { diffRevisions, isEmptyDiff } from '@/lib/services/revisions/revision-diff';
import type { RevisionState, RouteSnapshot } from '@/lib/services/revisions/revision-snapshot';
import type { StepInput } from '@/lib/schemas/route';

const step = (id: string, patch: Partial<StepInput> = {}): StepInput => ({
  id, equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K', yieldPct: 100, notes: '', position: { x: 0, y: 0 }, ...patch,
});

const snapshot = (steps: StepInput[], patch: Partial<RouteSnapshot> = {}): RouteSnapshot => ({
  name: 'Methanol via syngas', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps, links: [], ...patch,
});

const state = (snap: RouteSnapshot, stepDeltaG: Record<string, number | null> = {}, overall: number | null = null): RevisionState => ({
  snapshot: snap, stepDeltaG, overallDeltaG_kJ: overall,
});

describe('revision diff', () => {
  it('is empty for the same state', () => {
    const s = state(snapshot([step('s1')]), { s1: -10 }, -10);
    const diff = diffRevisions(s, s);
    expect(isEmptyDiff(diff)).toBe(true);
    expect(diff.steps).toEqual({ added: [], removed: [], changed: [] });
  });

  it('lists added and removed steps with their ΔG from their own side', () => {
    const a = state(snapshot([step('s1'), step('s2', { equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)' })]), { s1: -5, s2: 140 }, 135);
    const b = state(snapshot([step('s1'), step('s3', { equation: 'CO(g) + H2O(g) -> CO2(g) + H2(g)' })]), { s1: -5, s3: -28.6 }, -33.6);
    const diff = diffRevisions(a, b);
    expect(diff.steps.added).toEqual([{ id: 's3', equation: 'CO(g) + H2O(g) -> CO2(g) + H2(g)', deltaG_kJ: -28.6 }]);
    expect(diff.steps.removed).toEqual([{ id: 's2', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', deltaG_kJ: 140 }]);
    expect(diff.steps.changed).toEqual([]);
    expect(diff.overallDeltaG_kJ).toEqual({ from: 135, to: -33.6 });
  });

  it('names each changed field of a step, old → new, and its ΔG old → new', () => {
    const a = state(snapshot([step('s1', { pressures: { 'H2(g)': '10 bar' } })]), { s1: -12.4 });
    const b = state(snapshot([step('s1', { temperature: '650 K', yieldPct: 80, pressures: { 'H2(g)': '50 bar', 'CO(g)': '25 bar' } })]), { s1: 3.1 });
    const [changed] = diffRevisions(a, b).steps.changed;
    expect(changed!.id).toBe('s1');
    expect(changed!.fields).toEqual([
      { field: 'temperature', from: '500 K', to: '650 K' },
      { field: 'yieldPct', from: 100, to: 80 },
      { field: 'pressures.CO(g)', from: null, to: '25 bar' },
      { field: 'pressures.H2(g)', from: '10 bar', to: '50 bar' },
    ]);
    expect(changed!.deltaG_kJ).toEqual({ from: -12.4, to: 3.1 });
  });

  it('treats an absent optional field and a cleared one alike, and reports moves as position', () => {
    const a = state(snapshot([step('s1', { heatCapacity: true })]));
    const b = state(snapshot([step('s1', { position: { x: 40, y: -20 } })]));
    expect(diffRevisions(a, b).steps.changed[0]!.fields).toEqual([
      { field: 'heatCapacity', from: true, to: null },
      { field: 'position', from: { x: 0, y: 0 }, to: { x: 40, y: -20 } },
    ]);
  });

  it('keeps a step whose ΔG moved though no field did (the data behind it changed)', () => {
    const a = state(snapshot([step('s1')]), { s1: -10 });
    const b = state(snapshot([step('s1')]), { s1: -11 });
    expect(diffRevisions(a, b).steps.changed).toEqual([{ id: 's1', fields: [], deltaG_kJ: { from: -10, to: -11 } }]);
  });

  it('reports route-level fields and links', () => {
    const link = { from: 's1', to: 's2', species: 'CO(g)' };
    const a = state(snapshot([step('s1'), step('s2')], { links: [link] }));
    const b = state(snapshot([step('s1'), step('s2')], { name: 'Methanol, hotter', marginalThreshold_kJ: -20, links: [{ ...link, species: 'H2(g)' }] }));
    const diff = diffRevisions(a, b);
    expect(diff.route).toEqual([
      { field: 'name', from: 'Methanol via syngas', to: 'Methanol, hotter' },
      { field: 'marginalThreshold_kJ', from: -17, to: -20 },
    ]);
    expect(diff.links).toEqual({ added: [{ ...link, species: 'H2(g)' }], removed: [link] });
  });
});
