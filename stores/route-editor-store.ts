'use client';

import { createContext, createElement, useContext, useState, type ReactNode } from 'react';
import { createStore, useStore, type StoreApi } from 'zustand';
import type { LinkInput, RouteDraft, StepInput } from '@/lib/schemas/route';

// The editor's working document with undo/redo. Server data stays in React Query; this draft is UI state.

export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'error' | 'conflict';
export type RouteMetaPatch = Partial<Pick<RouteDraft, 'name' | 'target' | 'targetAmount' | 'marginalThreshold_kJ'>>;
export type NewStep = Partial<Omit<StepInput, 'id' | 'position'>> & { position: StepInput['position'] };

export const HISTORY_LIMIT = 100;
/** Edits with the same key within this window (typing in one field) are one undo entry. */
const COALESCE_MS = 1000;

export interface RouteEditorState {
  doc: RouteDraft;
  version: number;
  selectedStepId: string | null;
  isDirty: boolean;
  saveStatus: SaveStatus;
  saveError: string | null;
  past: RouteDraft[];
  future: RouteDraft[];
  lastEdit: { key: string; at: number } | null;
  addStep: (step: NewStep) => string;
  updateStep: (id: string, patch: Partial<Omit<StepInput, 'id'>>, opts?: { coalesceKey?: string }) => void;
  moveStep: (id: string, position: StepInput['position'] | undefined, opts: { dragging: boolean }) => void;
  removeStep: (id: string) => void;
  addLink: (link: LinkInput) => boolean;
  /** several links as one undo entry (the board's suggestions); answers how many were new */
  addLinks: (links: LinkInput[]) => number;
  removeLink: (link: LinkInput) => void;
  updateMeta: (patch: RouteMetaPatch, opts?: { coalesceKey?: string }) => void;
  selectStep: (id: string | null) => void;
  undo: () => void;
  redo: () => void;
  markSaving: () => void;
  markSaved: (version: number, savedDoc: RouteDraft) => void;
  markSaveFailed: (message: string, opts?: { conflict?: boolean }) => void;
  replaceDocument: (doc: RouteDraft, version: number) => void;
}

export type RouteEditorStore = StoreApi<RouteEditorState>;

export function newStepId(): string {
  return `s-${crypto.randomUUID().slice(0, 8)}`;
}

const sameLink = (a: LinkInput, b: LinkInput) => a.from === b.from && a.to === b.to && a.species === b.species;

export function createRouteEditorStore(initialDoc: RouteDraft, initialVersion: number): RouteEditorStore {
  return createStore<RouteEditorState>()((set, get) => {
    // One place decides whether an edit opens a new undo entry or continues the last one.
    const commit = (doc: RouteDraft, key?: string, extra: Partial<RouteEditorState> = {}) => {
      const state = get();
      const now = Date.now();
      const last = state.lastEdit;
      const isContinuation = key !== undefined && last?.key === key && (key.startsWith('drag:') || now - last.at < COALESCE_MS);
      set({
        doc,
        past: isContinuation ? state.past : [...state.past, state.doc].slice(-HISTORY_LIMIT),
        future: isContinuation ? state.future : [],
        isDirty: true,
        saveStatus: state.saveStatus === 'saving' || state.saveStatus === 'conflict' ? state.saveStatus : 'unsaved',
        lastEdit: key === undefined ? null : { key, at: now },
        ...extra,
      });
    };
    const mapStep = (id: string, fn: (step: StepInput) => StepInput) => get().doc.steps.map((s) => (s.id === id ? fn(s) : s));
    const keepSelection = (doc: RouteDraft, selected: string | null) => (selected && doc.steps.some((s) => s.id === selected) ? selected : null);

    return {
      doc: initialDoc,
      version: initialVersion,
      selectedStepId: null,
      isDirty: false,
      saveStatus: 'saved',
      saveError: null,
      past: [],
      future: [],
      lastEdit: null,

      addStep: ({ position, ...fields }) => {
        const id = newStepId();
        const step: StepInput = { id, equation: '', yieldPct: 100, notes: '', ...fields, position };
        const doc = get().doc;
        commit({ ...doc, steps: [...doc.steps, step] }, undefined, { selectedStepId: id });
        return id;
      },
      updateStep: (id, patch, opts) => {
        const doc = get().doc;
        if (!doc.steps.some((s) => s.id === id)) return;
        commit({ ...doc, steps: mapStep(id, (s) => ({ ...s, ...patch })) }, opts?.coalesceKey);
      },
      moveStep: (id, position, { dragging }) => {
        const key = `drag:${id}`;
        if (position) {
          const doc = get().doc;
          commit({ ...doc, steps: mapStep(id, (s) => ({ ...s, position })) }, key);
        }
        // The drag is over: the next drag of this node is a new undo entry.
        if (!dragging && get().lastEdit?.key === key) set({ lastEdit: null });
      },
      removeStep: (id) => {
        const { doc, selectedStepId } = get();
        if (!doc.steps.some((s) => s.id === id)) return;
        const next = { ...doc, steps: doc.steps.filter((s) => s.id !== id), links: doc.links.filter((l) => l.from !== id && l.to !== id) };
        commit(next, undefined, { selectedStepId: selectedStepId === id ? null : selectedStepId });
      },
      addLink: (link) => {
        const doc = get().doc;
        if (link.from === link.to || doc.links.some((l) => sameLink(l, link))) return false;
        commit({ ...doc, links: [...doc.links, link] });
        return true;
      },
      addLinks: (links) => {
        const doc = get().doc;
        const fresh: LinkInput[] = [];
        for (const link of links) {
          if (link.from === link.to || [...doc.links, ...fresh].some((l) => sameLink(l, link))) continue;
          fresh.push(link);
        }
        if (fresh.length > 0) commit({ ...doc, links: [...doc.links, ...fresh] });
        return fresh.length;
      },
      removeLink: (link) => {
        const doc = get().doc;
        if (!doc.links.some((l) => sameLink(l, link))) return;
        commit({ ...doc, links: doc.links.filter((l) => !sameLink(l, link)) });
      },
      updateMeta: (patch, opts) => commit({ ...get().doc, ...patch }, opts?.coalesceKey),
      selectStep: (id) => set({ selectedStepId: id }),

      undo: () => {
        const { past, future, doc, selectedStepId } = get();
        const previous = past.at(-1);
        if (!previous) return;
        set({
          doc: previous,
          past: past.slice(0, -1),
          future: [doc, ...future].slice(0, HISTORY_LIMIT),
          isDirty: true,
          saveStatus: get().saveStatus === 'saved' ? 'unsaved' : get().saveStatus,
          lastEdit: null,
          selectedStepId: keepSelection(previous, selectedStepId),
        });
      },
      redo: () => {
        const { past, future, doc, selectedStepId } = get();
        const next = future[0];
        if (!next) return;
        set({
          doc: next,
          past: [...past, doc].slice(-HISTORY_LIMIT),
          future: future.slice(1),
          isDirty: true,
          saveStatus: get().saveStatus === 'saved' ? 'unsaved' : get().saveStatus,
          lastEdit: null,
          selectedStepId: keepSelection(next, selectedStepId),
        });
      },

      markSaving: () => set({ saveStatus: 'saving', saveError: null }),
      // Edits made while the request was in flight keep the document dirty, so they are saved next.
      markSaved: (version, savedDoc) => {
        const isDirty = get().doc !== savedDoc;
        set({ version, isDirty, saveStatus: isDirty ? 'unsaved' : 'saved', saveError: null });
      },
      markSaveFailed: (message, opts) => set({ saveStatus: opts?.conflict ? 'conflict' : 'error', saveError: message }),
      replaceDocument: (doc, version) =>
        set({
          doc,
          version,
          isDirty: false,
          saveStatus: 'saved',
          saveError: null,
          past: [],
          future: [],
          lastEdit: null,
          selectedStepId: keepSelection(doc, get().selectedStepId),
        }),
    };
  });
}

const RouteEditorStoreContext = createContext<RouteEditorStore | null>(null);

// One store per mounted editor (zustand's Next.js guidance): never a module-level singleton shared across requests.
export function RouteEditorStoreProvider({ initialDoc, initialVersion, children }: { initialDoc: RouteDraft; initialVersion: number; children: ReactNode }) {
  const [store] = useState(() => createRouteEditorStore(initialDoc, initialVersion));
  return createElement(RouteEditorStoreContext.Provider, { value: store }, children);
}

export function useRouteEditorStoreApi(): RouteEditorStore {
  const store = useContext(RouteEditorStoreContext);
  if (!store) throw new Error('useRouteEditorStore must be used inside RouteEditorStoreProvider');
  return store;
}

export function useRouteEditorStore<T>(selector: (state: RouteEditorState) => T): T {
  return useStore(useRouteEditorStoreApi(), selector);
}
