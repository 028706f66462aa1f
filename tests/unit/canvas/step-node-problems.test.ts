// The node says why a step could not be evaluated, naming the cause, and shows no old ΔG while it is being
// re-evaluated after an edit (issue 19, item 2). Server-rendered inside React Flow's provider.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { ReactFlowProvider } from 'reactflow';
import { describe, expect, it } from 'vitest';
import { StepNode, type StepNodeData } from '@/components/canvas/step-node';

const base: StepNodeData = {
  label: 'Step 1', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', reactants: ['CO(g)', 'H2(g)'], products: ['CH3OH(g)'],
  temperatureText: '500 K', deltaGName: 'ΔG°', deltaGText: '−21.3 kJ/mol', cls: 'downhill', signUncertain: false, signUncertainText: '', estimatedText: '',
  reviewText: '', hasFlags: false, structures: null,
};

function node(data: Partial<StepNodeData>): string {
  const props = { id: 's1', data: { ...base, ...data }, selected: false, type: 'step', zIndex: 0, isConnectable: true, xPos: 0, yPos: 0, dragging: false };
  return renderToStaticMarkup(createElement(ReactFlowProvider, null, createElement(StepNode, props as never))).replace(/&quot;/g, '"');
}

describe('step node problems', () => {
  it('names the cause and the message of a step that could not be evaluated', () => {
    const html = node({ cls: 'error', deltaGText: '—', problemLabel: 'unknown species', problemText: 'Not in the species library: CH3OHH(g) (closest: CH3OH(g))' });
    expect(html).toContain('data-testid="step-node-problem-label"');
    expect(html).toContain('unknown species');
    expect(html).toContain('Not in the species library: CH3OHH(g)');
    expect(html).not.toContain('downhill');
  });

  it('marks a stale node instead of its class', () => {
    const html = node({ isStale: true, cls: null, deltaGText: '—' });
    expect(html).toContain('changed · not yet evaluated');
    expect(html).not.toContain('data-class="downhill"');
  });

  it('shows the class as before when there is no problem', () => {
    expect(node({})).toContain('data-class="downhill"');
  });
});
