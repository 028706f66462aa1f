// On the route board "New species from a structure" opens a dialog instead of leaving the board: under the board's
// provider every NewSpeciesLink is a button that says it opens a dialog; without it (a read-only route, the species
// pages) it stays a link to the page, carrying what was typed. Server-rendered, before anyone clicks.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { NewSpeciesDialogProvider } from '@/app/(app)/routes/[routeId]/_components/new-species-dialog';
import { NewSpeciesLink } from '@/app/(app)/species/_components/new-species-link';
import type { RouteDraft } from '@/lib/schemas/route';
import { RouteEditorStoreProvider } from '@/stores/route-editor-store';

const draft: RouteDraft = {
  name: 'KR-117 building block',
  target: 'boc-aminoacetanilide(l)',
  targetAmount: '1 mol',
  marginalThreshold_kJ: -17,
  steps: [{ id: 'boc', equation: 'CH3COOH(l) + boc-aminoacetanilide(l) -> CO2(g)', yieldPct: 100, notes: '', position: { x: 0, y: 0 } }],
  links: [],
};

const link = createElement(NewSpeciesLink, { name: 'boc-aminoacetanilide', phase: 'l', children: 'Not in the library? New species from a structure' });
const render = (enabled: boolean) =>
  renderToStaticMarkup(createElement(RouteEditorStoreProvider, { initialDoc: draft, initialVersion: 1, children: createElement(NewSpeciesDialogProvider, { enabled, children: link }) }));

describe('NewSpeciesLink on the board', () => {
  it('is a button that opens the dialog where the route can be edited, and the dialog starts closed', () => {
    const out = render(true);
    expect(out).toMatch(/<button type="button" aria-haspopup="dialog"[^>]*data-testid="new-species-link">Not in the library\? New species from a structure<\/button>/);
    expect(out).not.toContain('href="/species/from-structure');
    expect(out).toMatch(/<dialog[^>]*aria-labelledby/);
    // The flow is not rendered (nor its code loaded) until the dialog opens.
    expect(out).not.toContain('Show the estimate');
  });

  it('stays a link to the page, with what was typed, where the route cannot be edited', () => {
    const out = render(false);
    expect(out).toContain('href="/species/from-structure?name=boc-aminoacetanilide&amp;phase=l"');
    expect(out).not.toContain('<button');
    expect(out).not.toContain('<dialog');
  });
});
