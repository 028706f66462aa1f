// Why the route totals wait, said in words and with step labels: at the overview, on the ladder and at the target
// fields (issue 19: no internal identifiers; errors where they are caused). Real engine answers, not hand-made ones.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { RouteSettingsForm } from '@/app/(app)/routes/[routeId]/_components/route-settings-form';
import { stepLabels } from '@/lib/route-editor/step-label';
import { totalsWaitField, totalsWaitFieldMessage, totalsWaitReason } from '@/lib/route-editor/totals-wait';
import { evaluateRoute, type RouteEvaluateRequest } from '@/lib/thermo/route';
import { nbsLookup } from '@/lib/thermo/species-library';

const SYNTHESIS = 'CO(g) + 2 H2(g) -> CH3OH(g)';
const DECOMPOSITION = 'CH3OH(g) -> CO(g) + 2 H2(g)';

function withheld(request: RouteEvaluateRequest) {
  const problem = evaluateRoute(request, { lookup: nbsLookup }).totalsWithheld;
  if (!problem) throw new Error('expected the totals to wait');
  return { problem, labels: stepLabels(request.steps, request.links ?? []) };
}

describe('why the route totals wait', () => {
  it('names the steps of a loop of links by their labels, never by their ids', () => {
    const { problem, labels } = withheld({
      target: 'CH3OH(g)',
      steps: [{ id: 's-1a2b3c4d', equation: SYNTHESIS }, { id: 's-9f8e7d6c', equation: DECOMPOSITION }],
      links: [{ from: 's-1a2b3c4d', to: 's-9f8e7d6c', species: 'CH3OH(g)' }, { from: 's-9f8e7d6c', to: 's-1a2b3c4d', species: 'CO(g)' }],
    });
    expect(problem.message).toContain('s-1a2b3c4d');
    const text = totalsWaitReason(problem, labels);
    expect(text).toMatch(/^The links form a cycle: Step \d \(.+\) → Step \d \(.+\) → Step \d/);
    expect(text).not.toMatch(/\bs-[0-9a-f]{8}\b/);
    expect(totalsWaitField(problem)).toBeNull();
  });

  it('names several final steps by their labels', () => {
    const { problem, labels } = withheld({ target: 'CH3OH(g)', steps: [{ id: 's-aaaa1111', equation: SYNTHESIS }, { id: 's-bbbb2222', equation: SYNTHESIS }] });
    expect(totalsWaitReason(problem, labels)).toMatch(/Several steps make the target CH3OH\(g\) and pass nothing on: Step 1 \(.+\)/);
    expect(totalsWaitReason(problem, labels)).not.toContain('s-aaaa1111');
    // A branching route, not a wrong target: the field stays unmarked.
    expect(totalsWaitField(problem)).toBeNull();
  });

  it('leaves the target field unmarked while no step makes the target yet (a route still being built)', () => {
    const { problem } = withheld({ target: 'CH3OH(g)', steps: [{ id: 's1', equation: DECOMPOSITION }] });
    expect(problem.message).toMatch(/^No step makes the target CH3OH\(g\)/);
    expect(totalsWaitField(problem)).toBeNull();
  });

  it('puts an unreadable target at the target field, with the engine hint', () => {
    const { problem, labels } = withheld({ target: 'Unobtainium(g)', steps: [{ id: 's1', equation: SYNTHESIS }] });
    expect(totalsWaitField(problem)).toBe('target');
    expect(totalsWaitReason(problem, labels)).toMatch(/^Target: /);
    const atField = totalsWaitFieldMessage(problem, labels);
    expect(atField).toContain('Unobtainium(g)');
    expect(atField).not.toMatch(/^target:/i);
    expect(atField).toMatch(/The route totals wait until this is fixed\.$/);
  });

  it('puts an amount it cannot read, or one of 0 mol, at the amount field in words', () => {
    const lots = withheld({ target: 'CH3OH(g)', targetAmount: 'lots', steps: [{ id: 's1', equation: SYNTHESIS }] });
    expect(totalsWaitField(lots.problem)).toBe('targetAmount');
    expect(totalsWaitReason(lots.problem, lots.labels)).toMatch(/^Target amount: cannot read "lots" as an amount/);
    const zero = withheld({ target: 'CH3OH(g)', targetAmount: '0 mol', steps: [{ id: 's1', equation: SYNTHESIS }] });
    expect(totalsWaitReason(zero.problem, zero.labels)).toBe('The target amount must be above 0 mol');
    expect(totalsWaitFieldMessage(zero.problem, zero.labels)).toMatch(/^The target amount must be above 0 mol \(e\.g\. "1 mol"\)\./);
  });
});

describe('route settings form', () => {
  const meta = { name: 'Methanol', target: 'Unobtainium(g)', targetAmount: '1 mol', marginalThreshold_kJ: -10 };
  const render = (engineProblems?: Record<string, string>) =>
    renderToStaticMarkup(createElement(RouteSettingsForm, { meta, energyUnit: 'kJ', canEdit: true, onChange: () => {}, engineProblems }));

  it('marks the target field invalid and says why the totals wait there', () => {
    const html = render({ target: 'Unknown element symbol "Un". The route totals wait until this is fixed.' });
    const target = /<input[^>]*id="([^"]*-target)"[^>]*>/.exec(html);
    expect(target?.[0]).toContain('aria-invalid="true"');
    expect(target?.[0]).toContain(`aria-describedby="${target?.[1]}-error"`);
    expect(html).toContain(`id="${target?.[1]}-error"`);
    expect(html).toContain('The route totals wait until this is fixed.');
    // The amount field is fine and stays unmarked.
    expect(/<input[^>]*id="[^"]*-targetAmount"[^>]*>/.exec(html)?.[0]).not.toContain('aria-invalid');
  });

  it('marks nothing when the totals do not wait because of a field', () => {
    expect(render()).not.toContain('aria-invalid');
  });
});
