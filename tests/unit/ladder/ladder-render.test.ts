// Server-renders the components (no DOM in this suite) to check what reaches the page: roles, labels,
// class marks beyond colour, the empty state, and which actions show for readers and editors.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { FreeEnergyLadder, type FreeEnergyLadderProps } from '@/components/ladder/free-energy-ladder';
import { RemediesPanel, SAFETY_NOTE, type RemediesPanelProps } from '@/components/ladder/remedies-panel';
import { COUPLING_NOTE } from '@/components/ladder/remedy-sections';
import { sampleEvaluation } from './ladder-fixture';

const evaluation = sampleEvaluation();
const noop = (): void => {};

function ladder(props: Partial<FreeEnergyLadderProps> = {}): string {
  return renderToStaticMarkup(
    createElement(FreeEnergyLadder, { evaluation, energyUnit: 'kJ', selectedStepId: 'reform', onSelectStep: noop, stepLabels: { reform: 'Reforming' }, ...props }),
  );
}

function panel(stepId: string | null, props: Partial<RemediesPanelProps> = {}): string {
  return renderToStaticMarkup(
    createElement(RemediesPanel, {
      step: stepId ? evaluation.steps.find((s) => s.id === stepId) : null,
      energyUnit: 'kJ',
      temperatureUnit: 'K',
      canEdit: true,
      onApplyTemperature: noop,
      onApplyConditions: noop,
      onAddCoupledStep: noop,
      ...props,
    }),
  );
}

// renderToStaticMarkup escapes quotes and ampersands in text.
const unescape = (html: string): string => html.replace(/&#x27;/g, "'").replace(/&quot;/g, '"').replace(/&amp;/g, '&');

describe('FreeEnergyLadder', () => {
  it('draws one focusable button per step with a spoken label', () => {
    const html = ladder();
    expect(html.match(/role="button"/g)).toHaveLength(4);
    expect(html.match(/tabindex="0"/g)).toHaveLength(4);
    expect(html).toContain('aria-label="Step 1, Reforming; uphill; ΔG +71.1 kJ, running total +71.1 kJ; selected"');
    expect(html).toContain('aria-pressed="true"');
  });

  it('marks uphill risers with hatching and an arrow, not colour alone', () => {
    const html = ladder();
    expect(html).toMatch(/<pattern id="[^"]+-hatch"/);
    expect(html).toMatch(/fill="url\(#[^"]+-hatch\)"/);
    expect(html).toContain('↑ +71.1');
    expect(html).toContain('↓ −16.5');
  });

  it('shows an error step as a gap with a check-equation marker', () => {
    expect(ladder()).toContain('check equation');
  });

  it('has the legend, the dashed standard ladder, the axis unit and the export buttons', () => {
    const html = ladder({ energyUnit: 'kcal' });
    expect(html).toContain('ΔG° standard state');
    expect(html).toContain('stroke-dasharray="5 4"');
    expect(html).toContain('Cumulative ΔG / kcal per mol of target');
    expect(html).toContain('Export SVG');
    expect(html).toContain('Export PNG');
  });

  it('has an honest empty state', () => {
    const empty = ladder({ evaluation: null });
    expect(empty).toContain('Add steps to see the ladder');
    expect(empty).not.toContain('<svg');
    expect(ladder({ evaluation: { ...evaluation, order: [], steps: [] } })).toContain('Add steps to see the ladder');
  });
});

describe('RemediesPanel', () => {
  it('lists temperature, conditions and coupling remedies for an uphill step, with the safety and coupling notes', () => {
    const html = unescape(panel('reform', { temperatureUnit: 'degC' }));
    expect(html).toContain('Uphill');
    expect(html).toContain('Temperature');
    expect(html).toContain('Pressures and concentrations');
    expect(html).toContain('Coupling with a driver reaction');
    expect(html).toContain(SAFETY_NOTE);
    expect(html).toContain(COUPLING_NOTE);
    // The offer reaches the −17 kJ/mol downhill threshold, beyond ΔG° = 0 (619 °C): steam reforming at 688 °C.
    expect(html).toContain('Use this temperature (688 °C)');
    expect(html).toContain('Apply coupling to this step');
    expect(html).toContain('Gas evolution');
  });

  it('hides every action from readers', () => {
    const html = panel('reform', { canEdit: false });
    expect(html).not.toContain('Use this temperature');
    expect(html).not.toContain('Apply coupling to this step');
    expect(html).not.toContain('Apply these conditions');
    expect(html).toContain('Temperature');
  });

  it('says no remedy is needed for a downhill step', () => {
    const html = panel('synth');
    expect(html).toContain('No remedy needed');
    expect(html).not.toContain('Use this temperature');
  });

  it('shows the engine message for a step it could not evaluate', () => {
    const html = unescape(panel('bad'));
    expect(html).toContain('This step could not be evaluated');
    expect(html).toContain('Unknown element symbol "Xx"');
    // Where it was caused, in words; never the request path.
    expect(html).toContain('Marked at the equation field in the step panel');
    expect(html).not.toMatch(/steps\.\d+\./);
  });

  it('asks for a selection when no step is selected', () => {
    expect(panel(null)).toContain('Select a step on the ladder');
  });
});
