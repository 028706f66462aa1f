import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { buildComparison } from '@/lib/compare/build-comparison';
import { applyWhatIf, isEmptyWhatIf } from '@/lib/compare/what-if';
import { evaluateRoute } from '@/lib/thermo/route';
import { CALCINATION, forComparison, oneStep, reformingThenShift } from './compare-fixtures';

describe('applyWhatIf', () => {
  it('shifts every step, the unset ones from 298.15 K, and reads other units', () => {
    const request = { target: 'CO2(g)', steps: [{ id: 'a', equation: CALCINATION, temperature: '500 K' }, { id: 'b', equation: CALCINATION }, { id: 'c', equation: CALCINATION, temperature: '25 degC' }] };
    const { request: shifted, problems } = applyWhatIf(request, { temperatureOffset_K: 50 });
    expect(problems).toEqual([]);
    expect(shifted.steps.map((s) => s.temperature)).toEqual(['550 K', '348.15 K', '348.15 K']);
    expect(request.steps[0]!.temperature).toBe('500 K'); // the input is left alone
  });

  it('sets one standard pressure on every step', () => {
    const { request } = applyWhatIf(reformingThenShift(), { standardPressure: '1 atm' });
    expect(request.steps.map((s) => s.standardPressure)).toEqual(['1 atm', '1 atm']);
  });

  it('reports the steps an offset takes to 0 K or below', () => {
    const { problems } = applyWhatIf({ target: 'CO2(g)', steps: [{ id: 'cold', equation: CALCINATION, temperature: '250 K' }, { id: 'warm', equation: CALCINATION }] }, { temperatureOffset_K: -298 });
    // Said to people: the step by its label and the true minus (U+2212), never its id.
    expect(problems).toEqual([{ stepId: 'cold', message: expect.stringMatching(/^Step 1 \(.+\) at 250 K would go to \u221248 K$/) }]);
    expect(problems[0]!.message).not.toContain('cold');
  });

  it('treats no offset and no pressure as no what-if', () => {
    expect(isEmptyWhatIf({})).toBe(true);
    expect(isEmptyWhatIf({ temperatureOffset_K: 0 })).toBe(true);
    expect(isEmptyWhatIf({ temperatureOffset_K: 1 })).toBe(false);
    const request = oneStep('CO2(g)', CALCINATION);
    expect(applyWhatIf(request, {}).request).toBe(request);
  });

  it('a +50 K what-if evaluates exactly like the route saved at the shifted temperatures', () => {
    const { request } = applyWhatIf(reformingThenShift(['700 K', '500 K']), { temperatureOffset_K: 50 });
    const byHand = evaluateRoute(reformingThenShift(['750 K', '550 K']), { lookup: nbsLookup });
    const compared = buildComparison([forComparison(request)], { temperatureOffset_K: 50 }, nbsLookup).routes[0]!;
    expect(compared.metrics.overallDeltaG_kJ).toBe(byHand.overall.deltaG_kJ);
    expect(compared.metrics.temperatureMin_K).toBe(550);
    // Reforming is strongly temperature dependent (ΔS° > 0): warmer is less uphill.
    const colder = evaluateRoute(reformingThenShift(['700 K', '500 K']), { lookup: nbsLookup });
    expect(byHand.steps[0]!.deltaG0_kJ!).toBeLessThan(colder.steps[0]!.deltaG0_kJ!);
  });
});
