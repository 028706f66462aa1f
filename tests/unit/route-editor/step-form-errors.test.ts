// The step panel puts the engine's problems at the field that caused them, with aria-invalid and aria-describedby,
// says a typed unit's conversion, and the temperature's data range (issue 19, item 2). Server-rendered.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { StepForm } from '@/app/(app)/routes/[routeId]/_components/step-form';

const step = { id: 's1', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '100 K', pressures: { 'CO(g)': '50 atm' }, yieldPct: 100, notes: '', position: { x: 0, y: 0 } };

function render(props: Record<string, unknown>): string {
  const form = createElement(StepForm, { step, units: { temperatureUnit: 'K', pressureUnit: 'bar' }, canEdit: true, onChange: () => {}, ...props });
  return renderToStaticMarkup(createElement(QueryClientProvider, { client: new QueryClient() }, form));
}

describe('step form errors at their fields', () => {
  const html = render({
    engineErrors: { equation: 'Not in the species library: CH3OHH(g)', 'pressure:H2(g)': 'Cannot read lots as a pressure' },
    temperatureNote: '100 K is outside the data of CH3OH(g) (200–6000 K)',
  });

  it('marks the equation invalid and points it at the message', () => {
    expect(html).toMatch(/<textarea id="([^"]+)-equation"[^>]*aria-invalid="true" aria-describedby="\1-equation-error"/);
    expect(html).toMatch(/<p id="[^"]+-equation-error"[^>]*>Not in the species library: CH3OHH\(g\)<\/p>/);
  });

  it('puts a pressure problem at that species’ pressure, and the conversion of a typed unit at its own', () => {
    expect(html).toMatch(/name="conditions\.1\.value"/);
    expect(html).toMatch(/aria-invalid="true" aria-describedby="([^"]+-cond-1-note)"[^>]*name="conditions\.1\.value"/);
    expect(html).toMatch(/-cond-1-note" class="[^"]*text-uphill">Cannot read lots as a pressure/);
    expect(html).toContain('Read as 50 atm = 50.66 bar.');
    expect(html).not.toMatch(/aria-invalid="true"[^>]*name="conditions\.0\.value"/);
  });

  it('says the temperature’s data range at the temperature field, described by it', () => {
    expect(html).toMatch(/-temperature-note" class="[^"]*" data-testid="temperature-range-note">100 K is outside the data of CH3OH\(g\) \(200–6000 K\)/);
    expect(html).toMatch(/aria-describedby="[^"]*-temperature-hint [^"]*-temperature-note"/);
  });

  it('shows no error when the engine has none', () => {
    expect(render({})).not.toContain('aria-invalid="true"');
  });
});
