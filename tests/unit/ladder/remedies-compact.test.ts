// The remedies panel is compact (issue 19, item 5): the best remedy of each kind shows with its action, the rest of
// the kind and the figures behind each wait behind "more" buttons that are real buttons (keyboard, aria-expanded).
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { RemediesPanel } from '@/components/ladder/remedies-panel';
import { groupRemedies } from '@/components/ladder/remedy-groups';
import { sampleEvaluation } from './ladder-fixture';

const evaluation = sampleEvaluation();
const reform = evaluation.steps.find((s) => s.id === 'reform')!;
const noop = (): void => {};
const html = renderToStaticMarkup(
  createElement(RemediesPanel, { step: reform, energyUnit: 'kJ', temperatureUnit: 'K', canEdit: true, onApplyTemperature: noop, onApplyConditions: noop, onAddCoupledStep: noop }),
);
const count = (text: string) => html.split(text).length - 1;

describe('compact remedies panel', () => {
  it('shows one remedy of each kind, the engine’s first, with its action', () => {
    const groups = groupRemedies(reform.remedies);
    expect(groups.coupling.length).toBeGreaterThan(1);
    expect(count('Apply coupling to this step')).toBe(1);
    expect(count('Use this temperature')).toBe(1);
    expect(html).toContain(groups.coupling[0]!.driverName);
    expect(html).not.toContain(groups.coupling[1]!.driverName);
  });

  it('puts the rest behind a keyboard-reachable “more” button that says how many', () => {
    const rest = groupRemedies(reform.remedies).coupling.length - 1;
    const more = new RegExp(`<button type="button" aria-expanded="false" aria-controls="[^"]+"[^>]*><span aria-hidden="true">▸ </span>${rest} more drivers?</button>`);
    expect(html).toMatch(more);
    // Each disclosure controls a region that is hidden until opened.
    const ids = [...html.matchAll(/aria-controls="([^"]+)"/g)].map((m) => m[1]!);
    expect(ids.length).toBeGreaterThan(1);
    for (const id of ids) expect(html).toContain(`id="${id}" hidden=""`);
  });

  it('says why the first driver was chosen', () => {
    expect(html).toMatch(/Why this partner: shares /);
  });
});
