// The step panel's "Link product to…" and the board's link suggestions, server-rendered: what they offer before
// anyone chooses. Library reactions (lib/thermo/data/reaction-library.json), methane to formaldehyde.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { LinkProductControl } from '@/app/(app)/routes/[routeId]/_components/link-product-control';
import { LinkSuggestions } from '@/app/(app)/routes/[routeId]/_components/link-suggestions';
import type { RouteDraft } from '@/lib/schemas/route';
import { RouteEditorStoreProvider } from '@/stores/route-editor-store';

const steps = [
  { id: 'r', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', yieldPct: 100, notes: '', position: { x: 0, y: 0 } },
  { id: 'm', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', yieldPct: 100, notes: '', position: { x: 300, y: 0 } },
  { id: 'o', equation: 'CH3OH(g) + 1/2 O2(g) -> HCHO(g) + H2O(g)', yieldPct: 100, notes: '', position: { x: 600, y: 0 } },
];
const html = (el: ReturnType<typeof createElement>) => renderToStaticMarkup(el).replace(/&quot;/g, '"');

describe('Link product to…', () => {
  it('preselects the first product a later step consumes, and that step', () => {
    const out = html(createElement(LinkProductControl, { step: steps[0]!, steps, links: [], onAddLink: () => {} }));
    expect(out).toContain('Link product to…');
    expect(out).toMatch(/<option value="CO\(g\)" selected="">CO\(g\)<\/option>/);
    expect(out).toMatch(/<option value="m" selected="">Step 2 \(methanol from carbon monoxide\) · consumes it<\/option>/);
    expect(out).toContain('<option value="o">Step 3 (oxidative dehydrogenation of methanol)</option>');
  });

  it('moves on to the next product once the first is linked', () => {
    const out = html(createElement(LinkProductControl, { step: steps[0]!, steps, links: [{ from: 'r', to: 'm', species: 'CO(g)' }], onAddLink: () => {} }));
    expect(out).toMatch(/<option value="H2\(g\)" selected="">/);
  });

  it('says so when the step has no products', () => {
    expect(html(createElement(LinkProductControl, { step: { id: 'b', equation: '' }, steps, links: [], onAddLink: () => {} }))).toContain('no products to link yet');
  });
});

describe('link suggestions on the board', () => {
  const doc: RouteDraft = { name: 'R', target: 'HCHO(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps, links: [] };
  const render = (draft: RouteDraft) => html(createElement(RouteEditorStoreProvider, { initialDoc: draft, initialVersion: 1, children: createElement(LinkSuggestions) }));

  it('lists each link by step number and offers them in one button', () => {
    const out = render(doc);
    expect(out).toContain('aria-label="Suggested links"');
    expect(out).toMatch(/CO\(g\)<\/span> from Step 1 to Step 2/);
    expect(out).toContain('Make these 3 links');
  });

  it('is absent when nothing is left to suggest', () => {
    const linked = [
      { from: 'r', to: 'm', species: 'CO(g)' },
      { from: 'r', to: 'm', species: 'H2(g)' },
      { from: 'm', to: 'o', species: 'CH3OH(g)' },
    ];
    expect(render({ ...doc, links: linked })).toBe('');
  });
});
