// Estimated values and undecided signs on the ladder: a mark that is a dotted frame plus "◌ est." (never colour
// alone), the words in the tooltip, the accessible names, the exported notes and the <desc>; and none of it on a
// route whose values are all tabulated. The estimated route is a real evaluation (RDKit and the estimators).
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { beforeAll, describe, expect, it } from 'vitest';
import { FreeEnergyLadder } from '@/components/ladder/free-energy-ladder';
import { stepFacts } from '@/components/ladder/ladder-describe';
import { buildLadder, layoutLadder } from '@/components/ladder/ladder-geometry';
import { LadderTooltip } from '@/components/ladder/ladder-tooltip';
import { estimateSpoken, stepSignUncertainText, totalSigmaText } from '@/components/ladder/ladder-uncertainty';
import type { RouteEvaluateResponse } from '@/lib/thermo/route';
import { countEstimatedSteps, shortMethod, stepEstimates } from '@/lib/thermo/route/step-estimates';
import { estimatedEvaluation, sampleEvaluation } from './ladder-fixture';

let estimated: RouteEvaluateResponse;
beforeAll(async () => {
  estimated = await estimatedEvaluation();
});
const tabulated = sampleEvaluation();
const noop = (): void => {};
const unescape = (html: string): string => html.replace(/&#x27;/g, "'").replace(/&quot;/g, '"').replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>');
const ladder = (evaluation: RouteEvaluateResponse) =>
  unescape(renderToStaticMarkup(createElement(FreeEnergyLadder, { evaluation, energyUnit: 'kJ', selectedStepId: null, onSelectStep: noop, stepLabels: { kred: 'KRED reduction' } })));

describe('the estimated route as the engine answers it', () => {
  it('has every organic solute estimated, a step σ of several kJ/mol and a sign the data cannot decide', () => {
    const step = estimated.steps[0]!;
    expect(step.result!.species.filter((s) => s.origin === 'estimated').map((s) => s.as_written).sort()).toEqual(['IPA', 'acetone', 'alcohol', 'ketone']);
    expect(step.result!.uncertainty.deltaG0_kJ!).toBeGreaterThan(5);
    expect(step.signUncertain).toBe(true);
    expect(estimated.overall.overallSignUncertain).toBe(true);
    expect(countEstimatedSteps(estimated.steps)).toBe(1);
    expect(countEstimatedSteps(tabulated.steps)).toBe(0);
  });
});

describe('step-estimates', () => {
  it('shortens a method to its names and keeps names, falling back to the label for a SMILES or CAS name', () => {
    expect(shortMethod('Benson-type group additivity (RMG-database group tree), then hydration (Abraham descriptors by groups, Chung et al. 2022)')).toBe('Benson-type group additivity, then hydration');
    const result = {
      species: [
        { as_written: 'X', name: 'CCO', smiles: 'CCO', origin: 'estimated' as const, method: 'm (a)', sigma_dfG_kJ: 3 },
        { as_written: 'Y', name: '86728-85-0', smiles: 'CC', origin: 'estimated' as const, method: 'm (b)', sigma_dfG_kJ: 4 },
        { as_written: 'Z', name: 'acetone', smiles: 'CC(C)=O', origin: 'estimated' as const, method: 'n', sigma_dfG_kJ: 5 },
        { as_written: 'W', name: 'water', smiles: 'O', origin: 'library' as const, sigma_dfG_kJ: null },
      ],
      uncertainty: { deltaG0_kJ: 7.1, upperBound: true },
    };
    expect(stepEstimates(result)).toEqual({
      species: [
        { label: 'X', method: 'm', sigma_dfG_kJ: 3 },
        { label: 'Y', method: 'm', sigma_dfG_kJ: 4 },
        { label: 'acetone', method: 'n', sigma_dfG_kJ: 5 },
      ],
      methods: ['m', 'n'],
      sigma_kJ: 7.1,
      upperBound: true,
    });
    expect(stepEstimates({ ...result, species: result.species.slice(3) })).toBeNull();
  });
});

describe('words', () => {
  it('says a step sign is undecided with σ in the reader’s unit (14.4 kJ = 3.4 kcal by 4.184)', () => {
    expect(stepSignUncertainText(14.4, 'kJ')).toBe('sign uncertain: |ΔG| ≤ σ = 14.4 kJ/mol');
    expect(stepSignUncertainText(14.4, 'kcal')).toBe('sign uncertain: |ΔG| ≤ σ = 3.4 kcal/mol');
  });

  it('says the total’s σ, and that its sign is uncertain only when it is', () => {
    const base = { overallSigma_kJ: 39.4, overallSignUncertain: false, overallSigmaUpperBound: false };
    expect(totalSigmaText(base, 'kJ', 'per mol of target')).toBe('σ = 39.4 kJ per mol of target');
    expect(totalSigmaText({ ...base, overallSignUncertain: true, overallSigmaUpperBound: true }, 'kJ', 'per mol of target')).toBe(
      'sign uncertain: |ΔG| ≤ σ = 39.4 kJ per mol of target, an upper bound',
    );
    expect(totalSigmaText({ ...base, overallSigma_kJ: null }, 'kJ', '')).toBeNull();
  });
});

describe('the ladder with estimated values', () => {
  it('frames the riser with dots and writes "◌ est." beside it, with the legend entry', () => {
    const html = ladder(estimated);
    expect(html).toContain('data-testid="ladder-estimate-mark"');
    expect(html).toContain('stroke-dasharray="1 2.5"');
    expect(html).toMatch(/◌ est\.|>◌</);
    expect(html).toContain('◌ estimated values');
  });

  it('says "estimated" and the undecided sign in the riser’s accessible name', () => {
    const html = ladder(estimated);
    const sigma = estimated.steps[0]!.result!.uncertainty.deltaG0_kJ!.toFixed(1);
    expect(html).toMatch(new RegExp(`aria-label="Step 1, KRED reduction; [^"]*sign uncertain: \\|ΔG\\| ≤ σ = ${sigma} kJ/mol; uses estimated values"`));
  });

  it('writes the notes into the picture and the <desc>, and the total’s words by the total', () => {
    const html = ladder(estimated);
    expect(html).toContain('data-testid="ladder-notes"');
    expect(html).toContain('◌ estimated values (group contribution, not measured) in step 1 KRED reduction');
    expect(html).toMatch(/<desc[^>]*>[^<]*Route total: sign uncertain: \|ΔG\| ≤ σ = [\d.]+ kJ per mol of target/);
    expect(html).toMatch(/data-testid="ladder-total-sigma"[^>]*>± sign uncertain: \|ΔG\| ≤ σ = /);
  });

  it('names the estimated species, the method and σ(ΔrG°) in the tooltip', () => {
    const step = estimated.steps[0]!;
    const facts = Object.fromEntries(stepFacts(step, 'kJ').map((f) => [f.term, f.value]));
    expect(facts.Equation).toBe('ketone + IPA ⇌ alcohol + acetone');
    expect(facts.Values).toMatch(/^◌ estimated: acetophenone, .*acetone/);
    expect(facts.Method).toBe('Benson-type group additivity, then hydration');
    expect(facts['σ(ΔrG°)']).toMatch(/^\d+\.\d kJ\/mol \(an upper bound/);
    expect(facts.Sign).toMatch(/^sign uncertain: \|ΔG\| ≤ σ = \d+\.\d kJ\/mol$/);
    const layout = layoutLadder(buildLadder(estimated.order, estimated.steps, 'kJ'), { width: 720, height: 340 });
    const tip = unescape(renderToStaticMarkup(createElement(LadderTooltip, { id: 't', riser: layout.risers[0]!, step, label: 'KRED reduction', unit: 'kJ', containerWidth: 720 })));
    expect(tip).toContain('◌ estimated: acetophenone');
    expect(tip).toContain('Benson-type group additivity, then hydration');
    expect(estimateSpoken(step.result, 'kJ')).toMatch(/^uses estimated values for acetophenone, .* \(Benson-type group additivity, then hydration\); σ\(ΔrG°\) \d+\.\d kJ\/mol$/);
  });

  it('adds none of it to a route whose values are all tabulated', () => {
    const html = ladder(tabulated);
    expect(html).not.toContain('◌');
    expect(html).not.toContain('ladder-estimate-mark');
    expect(html).not.toContain('ladder-notes"><text');
    expect(html).not.toContain('uses estimated values');
  });
});
