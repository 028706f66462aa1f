'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { can } from '@/lib/auth/permissions';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { driversQuery } from '@/lib/queries/drivers';
import { activeMembership, useProfile } from '@/lib/queries/me';
import { routeKeys } from '@/lib/queries/routes';
import { DriverInput } from '@/lib/schemas/driver';

export function DriversClient() {
  const { data: profile } = useProfile();
  const canEdit = can(activeMembership(profile)?.role, 'route.edit');
  const queryClient = useQueryClient();
  const drivers = useQuery(driversQuery());
  const [banner, setBanner] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const { register, handleSubmit, reset, setError, formState } = useForm({ resolver: zodResolver(DriverInput), defaultValues: { name: '', equation: '', basis: '' } });
  const refresh = () => queryClient.invalidateQueries({ queryKey: routeKeys.drivers() });

  async function onAdd(values: DriverInput) {
    setBanner(null);
    try {
      const created = await apiFetch<{ name: string; deltaG0_kJ: number }>('/api/drivers', { method: 'POST', body: values });
      setBanner({ tone: 'success', text: `Added “${created.name}” (ΔG° at 298.15 K: ${created.deltaG0_kJ.toFixed(1)} kJ/mol).` });
      reset();
      await refresh();
    } catch (error) {
      const message = applyServerErrors(error, setError, ['name', 'equation', 'basis']);
      if (message) setBanner({ tone: 'error', text: message });
    }
  }

  const remove = useMutation({
    mutationFn: (id: string) => apiFetch(`/api/drivers/${id}`, { method: 'DELETE' }),
    onSuccess: refresh,
    onError: (error: Error) => setBanner({ tone: 'error', text: error.message }),
  });

  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
      <section aria-labelledby="drivers-heading">
        <h2 id="drivers-heading" className="sr-only">Team driver reactions</h2>
        {drivers.isPending ? <p className="text-sm text-ink-soft">Loading drivers…</p> : null}
        {drivers.isError ? <Notice tone="error">{drivers.error.message}</Notice> : null}
        {drivers.data?.length === 0 ? <p className="text-sm text-ink-soft">No driver reactions. Add one to get coupling suggestions.</p> : null}
        <ul className="divide-y divide-paper-edge rounded-lg border border-paper-edge bg-white">
          {drivers.data?.map((d) => (
            <li key={d.id} className="flex items-start justify-between gap-3 px-4 py-3">
              <div className="min-w-0">
                <p className="font-medium">{d.name}</p>
                <p className="font-mono text-sm text-ink-soft">{d.equation}</p>
                {d.basis ? <p className="text-xs text-ink-faint">Basis: {d.basis}</p> : null}
              </div>
              {canEdit ? (
                <Button variant="quiet" aria-label={`Remove ${d.name}`} onClick={() => remove.mutate(d.id)} disabled={remove.isPending}>
                  Remove
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
        <p className="mt-3 text-xs text-ink-faint">
          Coupling is bookkeeping: a driver’s free energy only helps through a real shared mechanism or intermediate. Any coupled process needs its
          own process-safety assessment.
        </p>
      </section>
      {canEdit ? (
        <form onSubmit={handleSubmit(onAdd)} className="flex flex-col gap-3 rounded-lg border border-paper-edge bg-white p-4" noValidate>
          <h2 className="font-semibold">Add a driver</h2>
          {banner ? <Notice tone={banner.tone}>{banner.text}</Notice> : null}
          <TextField label="Name" error={formState.errors.name?.message} {...register('name')} />
          <TextField label="Balanced equation" placeholder="e.g. H2(g) + 1/2 O2(g) -> H2O(l)" className="font-mono" error={formState.errors.equation?.message} {...register('equation')} />
          <TextField label="Basis (optional)" placeholder="where it comes from, e.g. plant utility" error={formState.errors.basis?.message} {...register('basis')} />
          <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Checking…' : 'Add driver'}</Button>
        </form>
      ) : null}
    </div>
  );
}
