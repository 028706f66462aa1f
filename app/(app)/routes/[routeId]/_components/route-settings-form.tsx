'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useRef } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { energyFromKJ, energyToKJ, type EnergyUnit } from '@/components/ladder/energy-format';
import { RouteMeta } from '@/lib/schemas/route';
import type { RouteMetaPatch } from '@/stores/route-editor-store';
import { COMPACT_INPUT } from '@/components/ui/input-class';
import type { TotalsWaitField } from '@/lib/route-editor/totals-wait';

type Meta = Required<RouteMetaPatch>;

// Same rules as the save schema; only the threshold is entered in the user's energy unit.
const SettingsSchema = z.object({
  name: RouteMeta.shape.name,
  target: RouteMeta.shape.target,
  targetAmount: z.string().trim().min(1, { message: 'Give an amount, e.g. 1 mol.' }).max(64),
  threshold: z.number({ error: 'Enter a number.' }),
});
type SettingsInput = z.input<typeof SettingsSchema>;
type SettingsValues = z.output<typeof SettingsSchema>;

const INPUT = COMPACT_INPUT;

const toValues = (meta: Meta, unit: EnergyUnit): SettingsInput => ({
  name: meta.name,
  target: meta.target,
  targetAmount: meta.targetAmount,
  threshold: Number(energyFromKJ(meta.marginalThreshold_kJ, unit).toFixed(3)),
});

/** Why the route totals wait, when the reason is the target or its amount (lib/route-editor/totals-wait.ts). */
export type SettingsEngineProblems = Partial<Record<TotalsWaitField, string>>;

export function RouteSettingsForm({
  meta,
  energyUnit,
  canEdit,
  onChange,
  engineProblems = {},
}: {
  meta: Meta;
  energyUnit: EnergyUnit;
  canEdit: boolean;
  onChange: (patch: RouteMetaPatch, field: string) => void;
  engineProblems?: SettingsEngineProblems;
}) {
  const id = useId();
  const { register, watch, reset, setError, clearErrors, formState } = useForm<SettingsInput, unknown, SettingsValues>({
    resolver: zodResolver(SettingsSchema),
    defaultValues: toValues(meta, energyUnit),
    mode: 'onChange',
  });
  const committed = useRef(JSON.stringify(meta));
  const latestMeta = useRef(meta);
  latestMeta.current = meta;

  useEffect(() => {
    const signature = JSON.stringify(meta);
    if (signature === committed.current) return;
    committed.current = signature;
    reset(toValues(meta, energyUnit));
  }, [meta, energyUnit, reset]);

  useEffect(() => {
    if (!canEdit) return;
    const subscription = watch((values, { name }) => {
      if (!name) return;
      const parsed = SettingsSchema.safeParse(values);
      if (!parsed.success) return;
      // An unchanged threshold keeps its exact kJ value; a kcal round trip would nudge it.
      const shown = toValues(latestMeta.current, energyUnit).threshold;
      const next = {
        name: parsed.data.name,
        target: parsed.data.target,
        targetAmount: parsed.data.targetAmount,
        marginalThreshold_kJ: parsed.data.threshold === shown ? latestMeta.current.marginalThreshold_kJ : energyToKJ(parsed.data.threshold, energyUnit),
      };
      // The kJ bounds live in the save schema; check them after converting the unit.
      const checked = RouteMeta.shape.marginalThreshold_kJ.safeParse(next.marginalThreshold_kJ);
      if (!checked.success) {
        setError('threshold', { message: checked.error.issues[0]?.message ?? 'Out of range.' });
        return;
      }
      clearErrors('threshold');
      const signature = JSON.stringify(next);
      if (signature === committed.current) return;
      committed.current = signature;
      onChange(next, name);
    });
    return () => subscription.unsubscribe();
  }, [watch, canEdit, energyUnit, onChange, setError, clearErrors]);

  const errors = formState.errors;
  const field = (name: 'name' | 'target' | 'targetAmount', label: string, extra = '') => {
    // The form's own check first; else the engine's reason the totals wait, when it belongs to this field.
    const message = errors[name]?.message ?? (name === 'name' ? undefined : engineProblems[name]);
    return (
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-${name}`} className="text-xs font-medium">
          {label}
        </label>
        <input
          id={`${id}-${name}`}
          className={`${INPUT} ${extra}`}
          aria-invalid={message ? true : undefined}
          aria-describedby={message ? `${id}-${name}-error` : undefined}
          {...register(name)}
        />
        {message ? (
          <p id={`${id}-${name}-error`} className="break-words text-xs text-uphill" data-testid={`settings-${name}-error`}>
            {message}
          </p>
        ) : null}
      </div>
    );
  };

  return (
    <form onSubmit={(e) => e.preventDefault()} aria-label="Route settings" noValidate>
      <fieldset disabled={!canEdit} className="flex flex-col gap-2.5">
        {field('name', 'Route name')}
        {field('target', 'Target species', 'font-mono')}
        {field('targetAmount', 'Target amount')}
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-threshold`} className="text-xs font-medium">
            Marginal below ({energyUnit}/mol)
          </label>
          <input id={`${id}-threshold`} type="number" step="any" className={INPUT} aria-describedby={`${id}-threshold-hint`} {...register('threshold', { valueAsNumber: true })} />
          <p id={`${id}-threshold-hint`} className="text-[11px] text-ink-faint">
            Steps with ΔG between this and zero count as marginal.
          </p>
          {errors.threshold ? <p className="text-xs text-uphill">{errors.threshold.message}</p> : null}
        </div>
      </fieldset>
    </form>
  );
}
