import { describe, expect, it } from 'vitest';
import { StepFormSchema, stepSignature, toFormValues, toStepPatch } from '@/lib/route-editor/step-form';
import { temperatureKOf } from '@/lib/route-editor/temperature-text';
import type { StepInput } from '@/lib/schemas/route';

const STEP: StepInput = {
  id: 's1',
  equation: 'CO(g) + 2 H2(g) -> CH3OH(g)',
  temperature: '500 K',
  pressures: { 'CO(g)': '20 bar', 'H2(g)': '40 bar' },
  yieldPct: 90,
  notes: '',
  position: { x: 0, y: 0 },
};

describe('step form values', () => {
  it('shows temperatures and pressures in the user’s units and writes them back with units', () => {
    const values = toFormValues(STEP, { temperatureUnit: 'degC', pressureUnit: 'bar' });
    expect(values.temperature).toBe('226.85');
    expect(values.conditions).toEqual([
      { species: 'CO(g)', kind: 'pressure', value: '20' },
      { species: 'H2(g)', kind: 'pressure', value: '40' },
      { species: 'CH3OH(g)', kind: 'pressure', value: '' },
    ]);
    const patch = toStepPatch(StepFormSchema.parse({ ...values, temperature: '300' }), { temperatureUnit: 'degC', pressureUnit: 'bar' });
    expect(patch.temperature).toBe('300 degC');
    expect(patch.pressures).toEqual({ 'CO(g)': '20 bar', 'H2(g)': '40 bar' });
    expect(patch.concentrations).toBeUndefined();
  });

  it('keeps a pressure in another unit as written', () => {
    const values = toFormValues(STEP, { temperatureUnit: 'K', pressureUnit: 'atm' });
    expect(values.temperature).toBe('500');
    expect(values.conditions[0]!.value).toBe('20 bar');
  });

  it('ignores position in the signature', () => {
    expect(stepSignature(STEP)).toBe(stepSignature({ ...STEP, position: { x: 9, y: 9 } }));
    expect(stepSignature(STEP)).not.toBe(stepSignature({ ...STEP, temperature: '501 K' }));
    expect(stepSignature(STEP)).toBe(stepSignature({ ...STEP, electrons: undefined }));
  });

  it('reads display temperatures', () => {
    expect(temperatureKOf('')).toBe(298.15);
    expect(temperatureKOf('25 degC')).toBeCloseTo(298.15);
    expect(temperatureKOf('600 K')).toBe(600);
    expect(temperatureKOf('hot')).toBeNull();
  });
});
