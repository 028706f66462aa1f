// The side panel's form values, in the user's units, and their way back into a StepInput.
import { z } from 'zod';
import type { PressureUnit, TemperatureUnit } from '../schemas/preferences';
import { StepInput } from '../schemas/route';
import { equationSpecies, speciesPhase } from './equation-species';
import { readPressure, readTemperature } from './quantity-text';
import { temperatureKOf } from './temperature-text';

export interface FormUnits {
  temperatureUnit: TemperatureUnit;
  pressureUnit: PressureUnit;
}

const CONCENTRATION = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?\s*(?:mol\/L|M|mmol\/L|mM)?$/i;

// Checked as people type: a pressure in any unit the engine reads ("50 atm" beside a bar field), a concentration in mol/L.
const ConditionRow = z
  .object({
    species: z.string(),
    kind: z.enum(['pressure', 'concentration']),
    value: z.string().trim().max(64, { message: 'At most 64 characters.' }),
  })
  .superRefine((row, ctx) => {
    if (!row.value) return;
    if (row.kind === 'pressure') {
      const read = readPressure(row.value, 'bar');
      if (!read.ok) ctx.addIssue({ code: 'custom', path: ['value'], message: read.message });
    } else if (!CONCENTRATION.test(row.value)) {
      ctx.addIssue({ code: 'custom', path: ['value'], message: 'Write a concentration in mol/L, e.g. 0.5.' });
    }
  });
export type ConditionRow = z.infer<typeof ConditionRow>;

// Built from StepInput's own pieces, so the form and the save schema cannot drift apart.
export const StepFormSchema = z.object({
  equation: StepInput.shape.equation,
  temperature: z
    .string()
    .trim()
    .max(64)
    .superRefine((value, ctx) => {
      const read = readTemperature(value, 'K');
      if (!read.ok) ctx.addIssue({ code: 'custom', message: read.message });
    }),
  standardPressure: z.enum(['1 bar', '1 atm']),
  heatCapacity: z.enum(['integrate', 'constant']),
  conditions: z.array(ConditionRow),
  yieldPct: z
    .number({ error: 'Enter the yield in %.' })
    .gt(0, { message: 'Yield must be above 0 %.' })
    .max(100, { message: 'Yield is at most 100 %.' }),
  electrons: z.number({ error: 'Enter a number of electrons, or leave it empty.' }).positive().max(1000).optional(),
  notes: StepInput.shape.notes,
});
export type StepFormInput = z.input<typeof StepFormSchema>;
export type StepFormValues = z.output<typeof StepFormSchema>;

const PLAIN_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?$/i;
const TEMPERATURE_UNIT_TEXT: Record<TemperatureUnit, string> = { K: 'K', degC: 'degC' };

function round(value: number): string {
  return String(Number(value.toFixed(2)));
}

/** "20 bar" shows as "20" when bar is the user's unit; anything else shows as written. */
function withoutUnit(text: string | undefined, unit: RegExp): string {
  if (!text) return '';
  const match = new RegExp(`^\\s*([+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:e[+-]?\\d+)?)\\s*(?:${unit.source})\\s*$`, 'i').exec(text);
  return match ? match[1]! : text;
}

export function conditionRowsFor(equation: string, previous: ConditionRow[] = []): ConditionRow[] {
  const { reactants, products } = equationSpecies(equation);
  const rows: ConditionRow[] = [];
  for (const species of [...reactants, ...products]) {
    const phase = speciesPhase(species);
    if (phase !== 'g' && phase !== 'aq') continue;
    if (rows.some((r) => r.species === species)) continue;
    const kind = phase === 'g' ? 'pressure' : 'concentration';
    rows.push({ species, kind, value: previous.find((p) => p.species === species && p.kind === kind)?.value ?? '' });
  }
  return rows;
}

export function toFormValues(step: StepInput, units: FormUnits): StepFormInput {
  const K = step.temperature ? temperatureKOf(step.temperature) : null;
  const temperature = !step.temperature ? '' : K === null ? step.temperature : round(units.temperatureUnit === 'degC' ? K - 273.15 : K);
  const pressureUnit = new RegExp(units.pressureUnit);
  const conditions = conditionRowsFor(step.equation).map((row) => ({
    ...row,
    value: row.kind === 'pressure' ? withoutUnit(step.pressures?.[row.species], pressureUnit) : withoutUnit(step.concentrations?.[row.species], /mol\/L|M/),
  }));
  return {
    equation: step.equation,
    temperature,
    standardPressure: step.standardPressure ?? '1 bar',
    heatCapacity: step.heatCapacity === false ? 'constant' : 'integrate',
    conditions,
    yieldPct: step.yieldPct,
    electrons: step.electrons,
    notes: step.notes,
  };
}

function temperatureText(value: string, units: FormUnits): string {
  const read = readTemperature(value, units.temperatureUnit);
  return read.ok ? read.text : quantity(value, TEMPERATURE_UNIT_TEXT[units.temperatureUnit]);
}

function quantity(value: string, unit: string): string {
  return PLAIN_NUMBER.test(value) ? `${value} ${unit}` : value;
}

export function toStepPatch(values: StepFormValues, units: FormUnits): Partial<StepInput> {
  const pressures: Record<string, string> = {};
  const concentrations: Record<string, string> = {};
  for (const row of values.conditions) {
    if (!row.value) continue;
    if (row.kind === 'pressure') {
      // A unit typed with the number is kept (and its spelling made one the engine reads: "50 ATM" → "50 atm").
      const read = readPressure(row.value, units.pressureUnit);
      pressures[row.species] = read.ok ? read.text : row.value;
    }
    else concentrations[row.species] = quantity(row.value, 'mol/L');
  }
  return {
    equation: values.equation,
    temperature: values.temperature ? temperatureText(values.temperature, units) : undefined,
    standardPressure: values.standardPressure,
    heatCapacity: values.heatCapacity === 'integrate',
    pressures: Object.keys(pressures).length > 0 ? pressures : undefined,
    concentrations: Object.keys(concentrations).length > 0 ? concentrations : undefined,
    yieldPct: values.yieldPct,
    electrons: values.electrons,
    notes: values.notes,
  };
}

/** What the form compares to tell its own edits from outside ones (undo, a remedy); position is not its business. */
export function stepSignature(step: StepInput): string {
  const { position: _position, ...rest } = step;
  const entries = Object.entries(rest).filter(([, v]) => v !== undefined);
  return JSON.stringify(entries.sort(([a], [b]) => (a < b ? -1 : 1)));
}
