import { describe, expect, it } from 'vitest';
import type { StepInput } from '@/lib/schemas/route';
import { diffRevisions, isLayoutOnly } from '@/lib/services/revisions/revision-diff';
import { diffStepLabels, mayNameStepIds, readableSummary } from '@/lib/services/revisions/revision-labels';
import type { RevisionState, RouteSnapshot } from '@/lib/services/revisions/revision-snapshot';

const step = (id: string, equation: string, patch: Partial<StepInput> = {}): StepInput => ({ id, equation, temperature: '500 K', yieldPct: 100, notes: '', position: { x: 0, y: 0 }, ...patch });
const shift = step('s-8ab5e2fd', 'CO(g) + H2O(g) -> CO2(g) + H2(g)');
const ethanal = step('s-c522bf8f', 'C2H5OH(g) -> CH3CHO(g) + H2(g)');
const snap = (steps: StepInput[], links: RouteSnapshot['links'] = []): RouteSnapshot => ({ name: 'R', target: 'CH3CHO(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps, links });
const state = (s: RouteSnapshot, overall: number | null = -10, stepDeltaG: Record<string, number | null> = {}): RevisionState => ({ snapshot: s, stepDeltaG, overallDeltaG_kJ: overall });

describe('stored summaries written with ids', () => {
  it('read with labels from their own revision\'s document', () => {
    const doc = snap([shift, ethanal]);
    expect(readableSummary('T of s-c522bf8f 500 → 650 K, moved s-8ab5e2fd, s-c522bf8f', doc)).toBe(
      'T of Step 2 (ethanol dehydrogenation) 500 → 650 K, moved Step 1 (water–gas shift), Step 2 (ethanol dehydrogenation)',
    );
    expect(readableSummary('equation of reform changed', snap([step('reform', 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)')]))).toBe('equation of Step 1 (steam reforming of methane) changed');
  });

  it('leave newer summaries and route names alone', () => {
    expect(mayNameStepIds('T of Step 2 (ethanol dehydrogenation) 500 → 650 K')).toBe(false);
    expect(mayNameStepIds('Created')).toBe(false);
    expect(readableSummary('renamed "reform" → "Reform B"', snap([step('reform', 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)')]))).toBe('renamed "reform" → "Reform B"');
  });

  it('label a diff\'s steps, removed ones as they were numbered before', () => {
    const labels = diffStepLabels(snap([ethanal, shift]), snap([shift]));
    expect(labels).toEqual({ 's-8ab5e2fd': 'Step 1 (water–gas shift)', 's-c522bf8f': 'Step 1 (ethanol dehydrogenation)' });
  });
});

describe('dragging a node', () => {
  it('is layout only, so no revision of its own', () => {
    const before = state(snap([shift, ethanal]), -10, { 's-8ab5e2fd': -28.6 });
    const moved = state(snap([{ ...shift, position: { x: 140, y: -20 } }, ethanal]), -10, { 's-8ab5e2fd': -28.6 });
    expect(isLayoutOnly(diffRevisions(before, moved))).toBe(true);
  });

  it('is a real change once anything else changed with it, or nothing moved at all', () => {
    const before = state(snap([shift, ethanal]));
    const movedAndHeated = state(snap([{ ...shift, position: { x: 140, y: 0 }, temperature: '650 K' }, ethanal]));
    const movedAndLinked = state(snap([{ ...shift, position: { x: 140, y: 0 } }, ethanal], [{ from: 's-8ab5e2fd', to: 's-c522bf8f', species: 'H2(g)' }]));
    const movedAndNewEnergy = state(snap([{ ...shift, position: { x: 140, y: 0 } }, ethanal]), -12);
    expect(isLayoutOnly(diffRevisions(before, movedAndHeated))).toBe(false);
    expect(isLayoutOnly(diffRevisions(before, movedAndLinked))).toBe(false);
    expect(isLayoutOnly(diffRevisions(before, movedAndNewEnergy))).toBe(false);
    expect(isLayoutOnly(diffRevisions(before, before))).toBe(false);
  });
});
