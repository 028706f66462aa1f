// Error mapping from the engine's request paths to the step panel's fields and the node's words (issue 19, item 2),
// and what the temperature and pressure fields accept as people type.
import { describe, expect, it } from 'vitest';
import { CAUSE_LABEL, causeOf, fieldOfPath, messageAtField, stepFieldErrors, stepIndexOfPath, temperatureRangeNote } from '@/lib/route-editor/step-errors';
import { readPressure, readTemperature } from '@/lib/route-editor/quantity-text';
import { StepFormSchema } from '@/lib/route-editor/step-form';

describe('engine paths to step fields', () => {
  it('maps each request path to the field that caused it', () => {
    expect(fieldOfPath('steps.1.equation')).toBe('equation');
    expect(fieldOfPath('steps.0.temperature')).toBe('temperature');
    expect(fieldOfPath('steps.2.pressures.CO(g)')).toBe('pressure:CO(g)');
    expect(fieldOfPath('steps.2.concentrations.H+(aq)')).toBe('concentration:H+(aq)');
    expect(fieldOfPath('steps.3.yield')).toBe('yieldPct');
    expect(fieldOfPath('steps.3.species.AcPPD.smiles')).toBe('equation');
    expect(fieldOfPath(null)).toBe('equation');
    expect(stepIndexOfPath('steps.12.temperature')).toBe(12);
    expect(stepIndexOfPath('target')).toBeNull();
  });

  it('names the cause: temperature and pressure problems are never “check equation”', () => {
    expect(CAUSE_LABEL[causeOf({ code: 'INVALID_VALUE', field: 'steps.0.temperature' })]).toBe('check temperature');
    expect(CAUSE_LABEL[causeOf({ code: 'INVALID_UNIT', field: 'steps.0.pressures.CO(g)' })]).toBe('check pressure');
    expect(CAUSE_LABEL[causeOf({ code: 'UNKNOWN_SPECIES', field: 'steps.0.equation' })]).toBe('unknown species');
    expect(CAUSE_LABEL[causeOf({ code: 'UNBALANCED', field: 'steps.0.equation' })]).toBe('check equation');
  });

  it('drops the path the field already says from the message', () => {
    const error = { code: 'INVALID_UNIT' as const, message: 'pressures.CO(g): cannot read "lots" as a pressure (Unit "lots" not found.)', field: 'steps.1.pressures.CO(g)' };
    expect(messageAtField(error)).toBe('Cannot read "lots" as a pressure (Unit "lots" not found.)');
    expect(stepFieldErrors(error)).toEqual({ 'pressure:CO(g)': 'Cannot read "lots" as a pressure (Unit "lots" not found.)' });
    expect(stepFieldErrors({ code: 'INVALID_VALUE', message: 'temperature: -5 K is -5 K; it must be above 0 K', field: 'steps.0.temperature' })).toEqual({ temperature: '-5 K is -5 K; it must be above 0 K' });
    expect(stepFieldErrors(null)).toEqual({});
  });

  it('says a temperature outside the species’ data with their ranges and the span they share', () => {
    const note = temperatureRangeNote([
      { code: 'T_OUT_OF_RANGE', message: 'CO(g): 100 K is outside its polynomial data, 200–20000 K; values are extrapolated' },
      { code: 'T_OUT_OF_RANGE', message: 'CH3OH(g): 100 K is outside its polynomial data, 200–6000 K; values are extrapolated' },
      { code: 'PHASE_CHANGE', message: 'CH3OH(g): at 100 K a condensed state is stable' },
    ]);
    expect(note).toBe('100 K is outside the data of CO(g) (200–20000 K), CH3OH(g) (200–6000 K); the data of these species cover 200–6000 K. Values are extrapolated.');
    expect(temperatureRangeNote([{ code: 'PHASE_CHANGE', message: 'x' }])).toBeNull();
  });
});

describe('typed quantities', () => {
  it('takes “50 atm” beside a bar field and converts it for the note (1 atm = 1.01325 bar, exact by definition)', () => {
    expect(readPressure('50 atm', 'bar')).toEqual({ ok: true, text: '50 atm', note: 'Read as 50 atm = 50.66 bar.' });
    expect(readPressure('760 Torr', 'bar')).toMatchObject({ ok: true, text: '760 torr' });
    expect(readPressure('20', 'bar')).toEqual({ ok: true, text: '20 bar', note: null });
    expect(readPressure('101.325 kPa', 'atm')).toMatchObject({ ok: true, note: 'Read as 101.325 kPa = 1 atm.' });
  });

  it('refuses what is not a pressure, clearly', () => {
    const lots = readPressure('lots', 'bar');
    expect(lots.ok).toBe(false);
    expect(!lots.ok && lots.message).toMatch(/bar, atm, kPa, Pa, MPa, psi, mmHg or torr/);
    expect(readPressure('50 furlongs', 'bar').ok).toBe(false);
    expect(readPressure('-3', 'bar').ok).toBe(false);
  });

  it('reads temperatures in K, °C and °F and refuses ones at or below absolute zero', () => {
    expect(readTemperature('500', 'K')).toEqual({ ok: true, text: '500 K', note: null });
    expect(readTemperature('25 °C', 'K')).toEqual({ ok: true, text: '25 degC', note: 'Read as 298.1 K.' });
    expect(readTemperature('-300 degC', 'K').ok).toBe(false);
    expect(readTemperature('hot', 'degC').ok).toBe(false);
  });

  it('the step form shows these errors while typing', () => {
    const base = { equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '', standardPressure: '1 bar', heatCapacity: 'integrate', yieldPct: 100, notes: '' } as const;
    const bad = StepFormSchema.safeParse({ ...base, temperature: 'hot', conditions: [{ species: 'CO(g)', kind: 'pressure', value: 'lots' }] });
    expect(bad.success).toBe(false);
    const paths = bad.error!.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['temperature', 'conditions.0.value']));
    expect(StepFormSchema.safeParse({ ...base, conditions: [{ species: 'CO(g)', kind: 'pressure', value: '50 atm' }] }).success).toBe(true);
  });
});
