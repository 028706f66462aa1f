// The step panel's species list and sentences, server-rendered from a real evaluation (RDKit and the engine, no DOM):
// esterification of acetic acid with ethanol, ethyl acetate forced through the estimator so one value is an estimate.
// Names and InChIKeys are the library's (lib/thermo/data/organic-library.json); XEKOWRVHYACXOJ-UHFFFAOYSA-N is ethyl
// acetate (PubChem CID 8857).
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { beforeAll, describe, expect, it } from 'vitest';
import { StepResult } from '@/app/(app)/routes/[routeId]/_components/step-result';
import { estimateSentence, listWords, SIGN_UNCERTAIN_SENTENCE } from '@/app/(app)/routes/[routeId]/_components/step-species-notes';
import { evaluateStep, type EvaluateResponse } from '@/lib/thermo';
import type { RouteStepResult } from '@/lib/thermo/route';
import { builtinLookup } from '@/lib/thermo/species-library';
import { loadChem } from '@/lib/thermo/structure/chem';
import { structureLookup } from '@/lib/thermo/structure/structure-lookup';

let estimated: EvaluateResponse;
let tabulated: EvaluateResponse;
beforeAll(async () => {
  const lookup = structureLookup(builtinLookup, await loadChem());
  const request = (estimate: boolean) => ({
    equation: 'AcOH + EtOH -> EtOAc + H2O(l)',
    species: { AcOH: { smiles: 'CC(=O)O', phase: 'l' as const }, EtOH: { name: 'ethanol', phase: 'l' as const }, EtOAc: { smiles: 'CCOC(C)=O', phase: 'l' as const, estimate } },
    temperature: '351 K',
  });
  estimated = evaluateStep(request(true), { lookup });
  tabulated = evaluateStep(request(false), { lookup });
});

const stepOf = (result: EvaluateResponse, signUncertain: boolean): RouteStepResult => ({
  id: 's1', result, error: null, extent_mol: 1, deltaG_kJ: result.deltaG0_kJ, deltaG0_kJ: result.deltaG0_kJ, cumulative_kJ: 0, cumulative0_kJ: 0,
  class: 'marginal', signUncertain, remedies: [], notes: [],
});
const render = (result: EvaluateResponse, signUncertain = false) =>
  renderToStaticMarkup(createElement(StepResult, { result: stepOf(result, signUncertain), energyUnit: 'kJ', temperatureUnit: 'K' }));

describe('estimateSentence', () => {
  it('names the estimated species and gives σ(ΔrG°) from the engine', () => {
    const sigma = estimated.uncertainty.deltaG0_kJ!;
    expect(sigma).toBeGreaterThan(0);
    const sentence = estimateSentence(estimated, 'kJ')!;
    expect(sentence.startsWith('ΔG° uses estimated values for ethyl acetate; σ(ΔrG°) = ')).toBe(true);
    expect(sentence).toContain(`${sigma.toFixed(1)} kJ/mol`);
    // 1 kcal = 4.184 kJ (thermochemical calorie)
    expect(estimateSentence(estimated, 'kcal')).toContain(`${(sigma / 4.184).toFixed(1)} kcal/mol`);
    expect(estimateSentence(tabulated, 'kJ')).toBeNull();
  });

  it('joins names in words', () => {
    expect(listWords(['a'])).toBe('a');
    expect(listWords(['a', 'b', 'c'])).toBe('a, b and c');
  });
});

describe('the step panel result', () => {
  it('lists every species with name, typeset formula, origin mark and σ, and never a structure key', () => {
    const html = render(estimated);
    expect(html.match(/data-testid="step-species-row"/g)).toHaveLength(4);
    for (const name of ['acetic acid', 'ethanol', 'ethyl acetate']) expect(html).toContain(name);
    expect(html).toContain('C<sub>4</sub>H<sub>8</sub>O<sub>2</sub>(l)');
    expect(html).toContain('H<sub>2</sub>O(l)');
    expect(html).toContain('>Estimate<');
    expect(html).toContain('>Library<');
    expect(html).not.toMatch(/\{[A-Z]{14}-/);
    expect(html).not.toContain('XEKOWRVHYACXOJ');
  });

  it('writes structure keys in the engine’s notes by name', () => {
    const keyed = estimated.warnings.filter((w) => w.message.includes('{XEKOWRVHYACXOJ'));
    expect(keyed.length).toBeGreaterThan(0);
    const html = render(estimated);
    expect(html).toContain('ethyl acetate (l): 351 K is outside its data range');
  });

  it('draws the species known by structure through the server, with name and formula as alt text', () => {
    const html = render(tabulated);
    expect(html).toContain('alt="ethyl acetate (C4H8O2)"');
    expect(html).toContain('src="/api/structures/svg?smiles=CCOC%28C%29%3DO&amp;w=48&amp;h=36"');
    expect(html).toContain('alt="water (H2O)"');
    expect(html.match(/<img /g)).toHaveLength(4);
  });

  it('adds the estimate sentence only when a value is estimated, and the sign sentence only when the sign is uncertain', () => {
    expect(render(estimated)).toContain('ΔG° uses estimated values for ethyl acetate');
    expect(render(tabulated)).not.toContain('estimated values');
    expect(render(tabulated)).not.toContain(SIGN_UNCERTAIN_SENTENCE);
    expect(render(tabulated, true)).toContain(SIGN_UNCERTAIN_SENTENCE);
    expect(render(estimated)).toContain('ΔH° and ΔS° from the species library and estimates from structure.');
    expect(render(tabulated)).toContain('ΔH° and ΔS° from the species library.');
  });
});
