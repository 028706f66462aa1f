// What a screen reader hears for a step node and a link (issue 19, item 7): the step's number and what it does, then
// its ΔG and class in words; never its internal id, and no old figures while it is re-evaluated.
import { describe, expect, it } from 'vitest';
import type { StepNodeData } from '@/components/canvas/step-node';
import { nodeSpokenName } from '@/components/canvas/use-step-nodes';

const base: StepNodeData = {
  label: 'Step 2', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', reactants: ['CO(g)', 'H2(g)'], products: ['CH3OH(g)'],
  temperatureText: '298 K', deltaGName: 'ΔG°', deltaGText: '−24.8 kJ/mol', cls: 'downhill', signUncertain: false, signUncertainText: '', estimatedText: '',
  reviewText: '', hasFlags: false, structures: null,
};
const title = 'Step 2 (methanol from carbon monoxide)';

describe('a step node\'s spoken name', () => {
  it('says the step, its ΔG and its class', () => {
    expect(nodeSpokenName(title, base, true)).toBe('Step 2 (methanol from carbon monoxide): ΔG° −24.8 kJ/mol, downhill; at 298 K');
    expect(nodeSpokenName(title, { ...base, cls: 'uphill', deltaGName: 'ΔG', deltaGText: '+12.0 kJ/mol', signUncertain: true }, true)).toBe(
      'Step 2 (methanol from carbon monoxide): ΔG +12.0 kJ/mol, uphill, sign uncertain; at 298 K',
    );
  });

  it('says why there is no ΔG: evaluating, changed, a problem, or a blank step', () => {
    expect(nodeSpokenName(title, { ...base, cls: null }, false)).toBe(`${title}: evaluating; at 298 K`);
    expect(nodeSpokenName(title, { ...base, cls: null, isStale: true }, true)).toBe(`${title}: changed, not yet evaluated; at 298 K`);
    expect(nodeSpokenName(title, { ...base, cls: 'error', problemLabel: 'unknown species', problemText: 'Not in the species library: CH3OHH(g)' }, true)).toBe(
      `${title}: not evaluated, unknown species: Not in the species library: CH3OHH(g); at 298 K`,
    );
    expect(nodeSpokenName('Step 3 (blank)', { ...base, equation: '', cls: null, temperatureText: '' }, false)).toBe('Step 3 (blank): blank step, type an equation');
  });

  it('adds estimates and review marks after the figures', () => {
    const spoken = nodeSpokenName(title, { ...base, estimatedText: 'uses estimated values for CH3OH(g)', reviewText: '1 open flag' }, true);
    expect(spoken).toBe(`${title}: ΔG° −24.8 kJ/mol, downhill; at 298 K; uses estimated values for CH3OH(g); 1 open flag`);
  });
});
