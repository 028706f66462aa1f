'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { memo, useEffect, useId, useRef } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { temperatureUnitLabel } from '@/components/ladder/energy-format';
import { conditionRowsFor, StepFormSchema, stepSignature, toFormValues, toStepPatch, type FormUnits, type StepFormInput, type StepFormValues } from '@/lib/route-editor/step-form';
import { StepInput } from '@/lib/schemas/route';
import { readPressure } from '@/lib/route-editor/quantity-text';
import type { StepFieldKey } from '@/lib/route-editor/step-errors';
import { AddSpecies } from './add-species';
import { AmbiguousNameChoices } from './ambiguous-name-choices';
import { BalanceCheck } from './balance-check';
import { COMPACT_INPUT } from '@/components/ui/input-class';
import { FormulaText } from '@/components/chemistry/formula-text';

const INPUT = COMPACT_INPUT;
const LABEL = 'text-xs font-medium text-ink';

function FieldError({ id, message }: { id: string; message?: string }) {
  return message ? (
    <p id={id} className="text-xs text-uphill">
      {message}
    </p>
  ) : null;
}

type EngineErrors = Partial<Record<StepFieldKey, string>>;
const NO_ERRORS: EngineErrors = {};

// Every valid change goes straight into the store (undoable); outside changes (undo, remedies) reset the form.
// The engine's problems with the saved step show at the field that caused them (engineErrors, lib/route-editor/step-errors.ts).
function StepFormView({
  step,
  units,
  canEdit,
  onChange,
  engineErrors = NO_ERRORS,
  temperatureNote = null,
}: {
  step: StepInput;
  units: FormUnits;
  canEdit: boolean;
  onChange: (patch: Partial<StepInput>, field: string) => void;
  /** messages by field from the last evaluation of this step */
  engineErrors?: EngineErrors;
  /** the engine's word on the temperature that is not an error: outside a species' data range, with the range */
  temperatureNote?: string | null;
}) {
  const id = useId();
  const form = useForm<StepFormInput, unknown, StepFormValues>({ resolver: zodResolver(StepFormSchema), defaultValues: toFormValues(step, units), mode: 'onChange' });
  const { register, formState, setValue, getValues, reset, watch, control } = form;
  const committed = useRef(stepSignature(step));
  const latestStep = useRef(step);
  latestStep.current = step;

  useEffect(() => {
    const signature = stepSignature(step);
    if (signature === committed.current) return;
    committed.current = signature;
    reset(toFormValues(step, units));
  }, [step, units, reset]);

  useEffect(() => {
    if (!canEdit) return;
    const subscription = watch((_values, { name }) => {
      if (!name) return;
      let values = getValues();
      if (name === 'equation') {
        // Condition inputs follow the equation's gas and dissolved species, keeping values already typed.
        const rows = conditionRowsFor(values.equation, values.conditions as StepFormValues['conditions']);
        const same = rows.map((r) => `${r.kind}:${r.species}`).join('|') === values.conditions.map((r) => `${r.kind}:${r.species}`).join('|');
        if (!same) {
          setValue('conditions', rows);
          values = getValues();
        }
      }
      const parsed = StepFormSchema.safeParse(values);
      if (!parsed.success) return;
      const patch = toStepPatch(parsed.data, units);
      const next = { ...latestStep.current, ...patch };
      if (!StepInput.safeParse(next).success) return;
      const signature = stepSignature(next);
      if (signature === committed.current) return;
      committed.current = signature;
      onChange(patch, name.split('.')[0]!);
    });
    return () => subscription.unsubscribe();
  }, [watch, getValues, setValue, units, canEdit, onChange]);

  const equation = useWatch({ control, name: 'equation' }) ?? '';
  // A species picked from the search (or a choice for an ambiguous name) changes the equation and the labels together,
  // as one edit; the form follows the step through the reset above.
  const handleSpeciesInsert = (next: { equation: string; species: StepInput['species'] }) => onChange({ equation: next.equation, species: next.species }, 'species');
  const conditions = useWatch({ control, name: 'conditions' }) ?? [];
  const errors = formState.errors;
  const equationError = errors.equation?.message ?? engineErrors.equation;
  const temperatureError = errors.temperature?.message ?? engineErrors.temperature;
  const yieldError = errors.yieldPct?.message ?? engineErrors.yieldPct;
  const tUnit = temperatureUnitLabel(units.temperatureUnit);
  const conditionError = (i: number, row: { kind: string; species: string }): string | undefined =>
    errors.conditions?.[i]?.value?.message ?? engineErrors[`${row.kind === 'pressure' ? 'pressure' : 'concentration'}:${row.species}` as StepFieldKey];
  // "50 atm" beside a bar field is kept in atm; the note says what that is in the field's unit.
  const conditionNote = (row: { kind: string; value: string }): string | null => {
    if (row.kind !== 'pressure' || !row.value) return null;
    const read = readPressure(row.value, units.pressureUnit);
    return read.ok ? read.note : null;
  };

  return (
    <form onSubmit={(e) => e.preventDefault()} aria-label="Step" noValidate>
      <fieldset disabled={!canEdit} className="flex flex-col gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-equation`} className={LABEL}>
            Equation
          </label>
          <textarea
            id={`${id}-equation`}
            rows={2}
            spellCheck={false}
            className={`${INPUT} font-mono text-[13px]`}
            placeholder="CO(g) + 2 H2(g) -> CH3OH(g)"
            aria-invalid={equationError ? true : undefined}
            aria-describedby={equationError ? `${id}-equation-error` : undefined}
            {...register('equation')}
          />
          <FieldError id={`${id}-equation-error`} message={equationError} />
          <BalanceCheck equation={equation} species={step.species} canEdit={canEdit} onApply={(balanced) => setValue('equation', balanced, { shouldValidate: true, shouldDirty: true })} />
          <AmbiguousNameChoices equation={equation} species={step.species} canEdit={canEdit} onChoose={handleSpeciesInsert} />
          <AddSpecies equation={equation} species={step.species} canEdit={canEdit} onAdd={handleSpeciesInsert} />
        </div>

        <div className="grid grid-cols-2 gap-2">
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-temperature`} className={LABEL}>
              Temperature ({tUnit})
            </label>
            <input
              id={`${id}-temperature`}
              inputMode="decimal"
              placeholder={units.temperatureUnit === 'degC' ? '25' : '298.15'}
              aria-invalid={temperatureError ? true : undefined}
              aria-describedby={[`${id}-temperature-hint`, temperatureError ? `${id}-temperature-error` : '', temperatureNote ? `${id}-temperature-note` : ''].filter(Boolean).join(' ')}
              className={`${INPUT} tabular-nums`}
              {...register('temperature')}
            />
            <p id={`${id}-temperature-hint`} className="text-[11px] text-ink-faint">
              Empty means 298.15 K.
            </p>
            <FieldError id={`${id}-temperature-error`} message={temperatureError} />
            {temperatureNote && !temperatureError ? (
              <p id={`${id}-temperature-note`} className="text-[11px] text-marginal" data-testid="temperature-range-note">
                {temperatureNote}
              </p>
            ) : null}
          </div>
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-standard`} className={LABEL}>
              Standard pressure
            </label>
            <select id={`${id}-standard`} className={INPUT} {...register('standardPressure')}>
              <option value="1 bar">1 bar</option>
              <option value="1 atm">1 atm</option>
            </select>
          </div>
        </div>

        <fieldset>
          <legend className={LABEL}>Heat capacity</legend>
          <div className="mt-1 flex flex-col gap-0.5 text-sm">
            <label className="flex items-center gap-1.5">
              <input type="radio" value="integrate" className="accent-pine-600" {...register('heatCapacity')} /> Integrate Cp(T)
            </label>
            <label className="flex items-center gap-1.5">
              <input type="radio" value="constant" className="accent-pine-600" {...register('heatCapacity')} /> Constant ΔH°, ΔS°
            </label>
          </div>
        </fieldset>

        <fieldset>
          <legend className={LABEL}>Conditions</legend>
          {conditions.length === 0 ? (
            <p className="text-xs text-ink-faint">No gas or dissolved species: standard activities apply.</p>
          ) : (
            <div className="mt-1 flex flex-col gap-1.5">
              {conditions.map((row, i) => (
                <div key={`${row.kind}:${row.species}`} className="grid grid-cols-[1fr_7rem] items-center gap-2">
                  <label htmlFor={`${id}-cond-${i}`} className="truncate text-xs" title={row.species}>
                    {row.kind === 'pressure' ? 'p' : 'c'} <FormulaText value={row.species} />
                  </label>
                  <div className="flex items-center gap-1">
                    <input
                      id={`${id}-cond-${i}`}
                      inputMode="decimal"
                      placeholder="standard"
                      aria-invalid={conditionError(i, row) ? true : undefined}
                      aria-describedby={conditionError(i, row) || conditionNote(row) ? `${id}-cond-${i}-note` : undefined}
                      className={`${INPUT} tabular-nums`}
                      {...register(`conditions.${i}.value`)}
                    />
                    <span className="w-9 text-[11px] text-ink-faint">{row.kind === 'pressure' ? units.pressureUnit : 'mol/L'}</span>
                  </div>
                  {conditionError(i, row) || conditionNote(row) ? (
                    <p id={`${id}-cond-${i}-note`} className={`col-span-2 text-[11px] ${conditionError(i, row) ? 'text-uphill' : 'text-ink-soft'}`}>
                      {conditionError(i, row) ?? conditionNote(row)}
                    </p>
                  ) : null}
                </div>
              ))}
              <p className="text-[11px] text-ink-faint">Empty means the standard state (1 bar or 1 mol/L).</p>
            </div>
          )}
        </fieldset>

        <div className="grid grid-cols-2 gap-2">
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-yield`} className={LABEL}>
              Yield (%)
            </label>
            <input
              id={`${id}-yield`}
              type="number"
              min={0}
              max={100}
              step="any"
              aria-invalid={yieldError ? true : undefined}
              aria-describedby={yieldError ? `${id}-yield-error` : undefined}
              className={INPUT}
              {...register('yieldPct', { valueAsNumber: true })}
            />
            <FieldError id={`${id}-yield-error`} message={yieldError} />
          </div>
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-electrons`} className={LABEL}>
              Electrons (n)
            </label>
            <input
              id={`${id}-electrons`}
              type="number"
              min={0}
              step="any"
              placeholder="—"
              aria-invalid={errors.electrons ? true : undefined}
              aria-describedby={errors.electrons ? `${id}-electrons-error` : undefined}
              className={INPUT}
              {...register('electrons', { setValueAs: (v: unknown) => (v === '' || v === undefined || v === null ? undefined : Number(v)) })}
            />
            <FieldError id={`${id}-electrons-error`} message={errors.electrons?.message} />
          </div>
        </div>

        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-notes`} className={LABEL}>
            Notes
          </label>
          <textarea id={`${id}-notes`} rows={3} className={INPUT} {...register('notes')} />
        </div>
      </fieldset>
    </form>
  );
}

// A drag moves the selected step every frame; the form only cares when its own fields change.
export const StepForm = memo(
  StepFormView,
  (a, b) =>
    a.canEdit === b.canEdit &&
    a.units === b.units &&
    a.onChange === b.onChange &&
    stepSignature(a.step) === stepSignature(b.step) &&
    a.temperatureNote === b.temperatureNote &&
    JSON.stringify(a.engineErrors ?? NO_ERRORS) === JSON.stringify(b.engineErrors ?? NO_ERRORS),
);
