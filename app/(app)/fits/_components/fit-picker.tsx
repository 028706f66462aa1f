'use client';

import { useQuery } from '@tanstack/react-query';
import { useId } from 'react';
import { COMPACT_INPUT } from '@/components/ui/input-class';
import { savedFitsQuery } from '@/lib/queries/fits';

const n = (x: number) => Number(x.toPrecision(4)).toString();

/** Picks one of the team's saved fits (or none: the library) for a route step's ΔH° and ΔS°. */
export function FitPicker({ value, onChange }: { value: number | null; onChange(id: number | null): void }) {
  const id = useId();
  const fits = useQuery(savedFitsQuery());
  const usable = (fits.data ?? []).filter((f) => f.equation !== '');
  const chosen = usable.find((f) => f.id === value);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        ΔH° and ΔS° from
      </label>
      <select
        id={id}
        className={COMPACT_INPUT}
        value={value ?? ''}
        disabled={fits.isPending}
        onChange={(e) => onChange(e.target.value === '' ? null : Number(e.target.value))}
      >
        <option value="">the species library</option>
        {usable.map((f) => (
          <option key={f.id} value={f.id}>
            fit #{f.id} {f.name} ({f.equation})
          </option>
        ))}
        {value !== null && !chosen && !fits.isPending ? <option value={value}>fit #{value} (not available)</option> : null}
      </select>
      {fits.isError ? <p className="text-xs text-uphill">Saved fits could not be loaded: {fits.error.message}</p> : null}
      {chosen ? (
        <p className="text-xs text-ink-soft">
          ΔH° {n(chosen.result.deltaH0_kJ)} kJ/mol, ΔS° {n(chosen.result.deltaS0_J_per_K)} J/(mol K), fitted over {n(chosen.result.range_K[0])}–{n(chosen.result.range_K[1])} K
          with ΔCp = 0. The step must be this reaction or a multiple of it.
        </p>
      ) : null}
    </div>
  );
}
