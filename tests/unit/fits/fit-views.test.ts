// Server-renders the van 't Hoff plot and the fit summary (no DOM in this suite) to check what each shows.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { FitSummary } from '@/app/(app)/fits/_components/fit-summary';
import { VantHoffPlot } from '@/app/(app)/fits/_components/vant-hoff-plot';
import { analyseFit } from '@/lib/fits/analyse-fit';
import type { StoredPoint } from '@/lib/schemas/fit-data';

const R = 8.314462618;
// Synthetic: ΔH° = 40 kJ/mol, ΔS° = 90 J/(mol K), σ(ln K) = 0.1; point 3 pushed up by 0.6, point 5 left out.
const points: StoredPoint[] = [300, 320, 340, 360, 380, 400].map((T, i) => ({
  T, value: (-40000) / (R * T) + 90 / R + (i === 2 ? 0.6 : 0), sigma: 0.1, excluded: i === 4, reason: i === 4 ? 'Leak in the cell.' : null,
}));
const analysis = analyseFit({ points, temperatureUnit: 'K', valueKind: 'lnK' });

describe('VantHoffPlot', () => {
  const html = renderToStaticMarkup(createElement(VantHoffPlot, { analysis }));

  it('draws the band, the line, and each point in the plot and the residuals panel', () => {
    expect(html).toContain('data-band');
    expect(html.match(/data-point="included"/g)).toHaveLength(2 * 4);
    expect(html).toContain('1000 K / T');
  });

  it('marks the >3σ point by shape and a text label, not colour alone', () => {
    expect(html.match(/data-point="outlier"/g)).toHaveLength(2);
    expect(html).toContain('&gt;3σ');
    expect(html).toContain('Point 3: 340 K');
    expect(html).toContain('(over 3σ)');
  });

  it('shows the excluded point hollow with its reason', () => {
    expect(html.match(/data-point="excluded"/g)).toHaveLength(2);
    expect(html).toContain('fill="white"');
    expect(html).toContain('left out: Leak in the cell.');
  });
});

describe('FitSummary', () => {
  it('gives ΔH° and ΔS° with standard errors, R², n and the range, and the safety caution', () => {
    const html = renderToStaticMarkup(createElement(FitSummary, { result: analysis.result }));
    expect(html).toMatch(/ΔH°.*±.*kJ\/mol/);
    expect(html).toMatch(/ΔS°.*±.*J\/\(mol K\)/);
    expect(html).toContain('n = 5');
    expect(html).toContain('weighted fit');
    expect(html).toContain('says nothing of rates, runaway or toxicity');
  });
});
