// The canvas node's marks for estimated values and undecided signs: a glyph with words for screen readers and the
// hover title (never colour alone), server-rendered inside React Flow's provider. Words come from the same helpers
// as the ladder, so the two say the same thing.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { ReactFlowProvider } from 'reactflow';
import { describe, expect, it } from 'vitest';
import { NodeClassBadge } from '@/components/canvas/class-badge';
import { StepNode, type StepNodeData } from '@/components/canvas/step-node';

const base: StepNodeData = {
  label: 'KRED reduction', equation: 'ketone + IPA -> alcohol + acetone', reactants: ['ketone', 'IPA'], products: ['alcohol', 'acetone'],
  temperatureText: '30 °C', deltaGName: 'ΔG', deltaGText: '−3.2 kJ/mol', cls: 'marginal', signUncertain: false, signUncertainText: '', estimatedText: '',
  reviewText: '', hasFlags: false, structures: null,
};

function node(data: Partial<StepNodeData>): string {
  const props = { id: 'kred', data: { ...base, ...data }, selected: false, type: 'step', zIndex: 0, isConnectable: true, xPos: 0, yPos: 0, dragging: false };
  const html = renderToStaticMarkup(createElement(ReactFlowProvider, null, createElement(StepNode, props as never)));
  return html.replace(/&#x27;/g, "'").replace(/&quot;/g, '"').replace(/&amp;/g, '&');
}

describe('step node marks', () => {
  it('shows ◌ after ΔG with the words hidden for screen readers and in the title when values are estimated', () => {
    const words = 'uses estimated values for acetophenone, acetone (Benson-type group additivity, then hydration); σ(ΔrG°) 14.4 kJ/mol';
    const html = node({ estimatedText: words });
    expect(html).toContain('data-testid="step-estimate-mark"');
    expect(html).toContain(`title="${words}"`);
    expect(html).toMatch(/<span aria-hidden="true">◌<\/span><span class="sr-only">; uses estimated values for acetophenone/);
  });

  it('has no estimate mark when every value is tabulated', () => {
    const html = node({});
    expect(html).not.toContain('◌');
    expect(html).not.toContain('step-estimate-mark');
  });

  it('says the undecided sign with σ beside the class', () => {
    const html = renderToStaticMarkup(createElement(NodeClassBadge, { cls: 'marginal', signUncertain: true, signUncertainText: 'sign uncertain: |ΔG| ≤ σ = 14.4 kJ/mol' }));
    expect(html).toContain('≈</span>marginal');
    expect(html).toContain('± sign uncertain<span class="sr-only">: |ΔG| ≤ σ = 14.4 kJ/mol</span>');
    expect(html).toContain('title="sign uncertain: |ΔG| ≤ σ = 14.4 kJ/mol"');
    expect(renderToStaticMarkup(createElement(NodeClassBadge, { cls: 'marginal', signUncertain: false }))).not.toContain('sign uncertain');
  });
});
