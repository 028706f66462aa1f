import { afterEach, describe, expect, it, vi } from 'vitest';
import type { RouteDraft } from '@/lib/schemas/route';
import { createRouteEditorStore, HISTORY_LIMIT } from '@/stores/route-editor-store';

const EMPTY: RouteDraft = { name: 'R', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: [], links: [] };

afterEach(() => vi.useRealTimers());

describe('route editor store', () => {
  it('adds, updates and removes steps with their links, and undoes each', () => {
    const store = createRouteEditorStore(EMPTY, 1);
    const a = store.getState().addStep({ equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', position: { x: 0, y: 0 } });
    const b = store.getState().addStep({ equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', position: { x: 300, y: 0 } });
    expect(store.getState().addLink({ from: a, to: b, species: 'CO(g)' })).toBe(true);
    expect(store.getState().addLink({ from: a, to: b, species: 'CO(g)' })).toBe(false);
    store.getState().updateStep(a, { temperature: '900 K' });
    store.getState().removeStep(a);
    expect(store.getState().doc.steps.map((s) => s.id)).toEqual([b]);
    expect(store.getState().doc.links).toEqual([]);
    expect(store.getState().isDirty).toBe(true);

    store.getState().undo();
    expect(store.getState().doc.steps).toHaveLength(2);
    expect(store.getState().doc.links).toHaveLength(1);
    expect(store.getState().doc.steps[0]!.temperature).toBe('900 K');
    store.getState().undo();
    expect(store.getState().doc.steps[0]!.temperature).toBeUndefined();
    store.getState().redo();
    expect(store.getState().doc.steps[0]!.temperature).toBe('900 K');
  });

  it('makes one undo entry of a continuous drag, and a new one for the next drag', () => {
    const store = createRouteEditorStore(EMPTY, 1);
    const id = store.getState().addStep({ equation: '', position: { x: 0, y: 0 } });
    const before = store.getState().past.length;
    for (let i = 1; i <= 30; i++) store.getState().moveStep(id, { x: i * 5, y: i }, { dragging: true });
    store.getState().moveStep(id, undefined, { dragging: false });
    expect(store.getState().past.length).toBe(before + 1);
    store.getState().moveStep(id, { x: 500, y: 500 }, { dragging: true });
    store.getState().moveStep(id, undefined, { dragging: false });
    expect(store.getState().past.length).toBe(before + 2);
    store.getState().undo();
    expect(store.getState().doc.steps[0]!.position).toEqual({ x: 150, y: 30 });
    store.getState().undo();
    expect(store.getState().doc.steps[0]!.position).toEqual({ x: 0, y: 0 });
  });

  it('coalesces typing in one field within a second, not across a pause', () => {
    vi.useFakeTimers();
    const store = createRouteEditorStore(EMPTY, 1);
    const id = store.getState().addStep({ equation: '', position: { x: 0, y: 0 } });
    const before = store.getState().past.length;
    for (const text of ['C', 'CO', 'CO(', 'CO(g']) store.getState().updateStep(id, { equation: text }, { coalesceKey: `step:${id}:equation` });
    expect(store.getState().past.length).toBe(before + 1);
    vi.advanceTimersByTime(1500);
    store.getState().updateStep(id, { equation: 'CO(g)' }, { coalesceKey: `step:${id}:equation` });
    expect(store.getState().past.length).toBe(before + 2);
  });

  it('keeps at least 50 undo entries and drops the oldest beyond the limit', () => {
    expect(HISTORY_LIMIT).toBeGreaterThanOrEqual(50);
    const store = createRouteEditorStore(EMPTY, 1);
    for (let i = 0; i < HISTORY_LIMIT + 20; i++) store.getState().updateMeta({ name: `R${i}` });
    expect(store.getState().past).toHaveLength(HISTORY_LIMIT);
    for (let i = 0; i < HISTORY_LIMIT; i++) store.getState().undo();
    expect(store.getState().doc.name).toBe('R19');
  });

  it('stays dirty when edits arrive while a save is in flight', () => {
    const store = createRouteEditorStore(EMPTY, 3);
    store.getState().updateMeta({ name: 'A' });
    const sent = store.getState().doc;
    store.getState().markSaving();
    store.getState().updateMeta({ name: 'AB' });
    expect(store.getState().saveStatus).toBe('saving');
    store.getState().markSaved(4, sent);
    expect(store.getState()).toMatchObject({ version: 4, isDirty: true, saveStatus: 'unsaved' });
    store.getState().markSaving();
    store.getState().markSaved(5, store.getState().doc);
    expect(store.getState()).toMatchObject({ version: 5, isDirty: false, saveStatus: 'saved' });
  });

  it('replaces the document on reload and clears history and a vanished selection', () => {
    const store = createRouteEditorStore(EMPTY, 1);
    store.getState().addStep({ equation: 'x', position: { x: 0, y: 0 } });
    store.getState().markSaveFailed('changed elsewhere', { conflict: true });
    store.getState().replaceDocument({ ...EMPTY, name: 'Theirs' }, 7);
    expect(store.getState()).toMatchObject({ version: 7, isDirty: false, saveStatus: 'saved', selectedStepId: null, past: [], future: [] });
    expect(store.getState().doc.name).toBe('Theirs');
  });
});
