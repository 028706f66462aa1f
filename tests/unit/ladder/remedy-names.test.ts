// Remedies for a step whose species are known by structure: the panel writes them as the step does (its labels),
// and the change it applies lands on those labels. A real evaluation: the isopropanol-coupled ketone reduction at
// 90 % conversion (ladder-fixture.ts), marginal at the −17 kJ/mol threshold (common practice), so it gets remedies.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { beforeAll, describe, expect, it } from 'vitest';
import { RemediesPanel } from '@/components/ladder/remedies-panel';
import { remediesAsWritten } from '@/components/ladder/remedy-names';
import { evaluateRoute, type RouteEvaluateResponse } from '@/lib/thermo/route';
import { builtinLookup } from '@/lib/thermo/species-library';
import { loadChem } from '@/lib/thermo/structure/chem';
import { structureLookup } from '@/lib/thermo/structure/structure-lookup';
import { sampleEvaluation } from './ladder-fixture';

let withRemedies: RouteEvaluateResponse;
beforeAll(async () => {
  const lookup = structureLookup(builtinLookup, await loadChem());
  // The fixture's route (which skips remedies for speed) again, with them.
  withRemedies = evaluateRoute({ target: 'alcohol', steps: [{ id: 'kred', equation: 'ketone + IPA -> alcohol + acetone', species: {
    ketone: { smiles: 'CC(=O)c1ccccc1', phase: 'aq' }, IPA: { smiles: 'CC(C)O', phase: 'aq' }, alcohol: { smiles: 'C[C@H](O)c1ccccc1', phase: 'aq' }, acetone: { smiles: 'CC(C)=O', phase: 'aq' },
  }, temperature: '303.15 K', concentrations: { ketone: '10 mmol/L', IPA: '1.3 mol/L', alcohol: '90 mmol/L', acetone: '90 mmol/L' } }], links: [] }, { lookup });
});

describe('remedies as written', () => {
  it('writes structure keys as the step’s labels in sentences, species and applied conditions', () => {
    const step = withRemedies.steps[0]!;
    expect(step.class).toBe('marginal');
    expect(JSON.stringify(step.remedies)).toMatch(/\{[A-Z]{14}-[A-Z]{10}-[A-Z]\}\(aq\)/);
    const written = remediesAsWritten(step);
    expect(JSON.stringify(written)).not.toMatch(/\{[A-Z]{14}-/);
    const removal = written.find((r) => r.kind === 'conditions' && r.action === 'remove-product' && r.species === 'acetone');
    expect(removal, JSON.stringify(written.map((r) => r.summary))).toBeDefined();
    if (removal?.kind !== 'conditions') throw new Error('no acetone removal');
    expect(removal.summary).toMatch(/^Remove acetone as it forms/);
    expect(Object.keys(removal.conditions?.concentrations ?? {})).toContain('acetone');
  });

  it('leaves a step known by formulas alone as it is, the same array', () => {
    const step = sampleEvaluation().steps[0]!;
    expect(remediesAsWritten(step)).toBe(step.remedies);
  });

  it('says the undecided sign with σ at the head of the panel', () => {
    const html = renderToStaticMarkup(createElement(RemediesPanel, {
      step: withRemedies.steps[0]!, energyUnit: 'kJ', temperatureUnit: 'degC', canEdit: true, onApplyTemperature: () => {}, onApplyConditions: () => {}, onAddCoupledStep: () => {},
    }));
    expect(html).toMatch(/sign uncertain: \|ΔG\| ≤ σ = \d+\.\d kJ\/mol/);
    // The best conditions offer shows (its species as labelled); the acetone removal waits behind "2 more ways".
    expect(html).toContain('excess of ketone');
    expect(html).toMatch(/aria-expanded="false"[^>]*>.*2 more ways/);
    expect(html).toContain('acetone: no Cp° polynomial');
    expect(html).not.toMatch(/\{[A-Z]{14}-/);
  });
});
