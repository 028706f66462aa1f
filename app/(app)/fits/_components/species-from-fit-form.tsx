'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { SpeciesFromFitInput } from '@/lib/schemas/fit-data';

interface Created {
  species: { id: number; key: string };
  solved: { key: string; dfH_kJ: number; dfG_kJ: number; S_J_per_K: number; shadows: boolean };
}

const n = (x: number) => Number(x.toPrecision(5)).toString();

/** "Create team species from this fit": solve one species of the fitted reaction from the library values of the others. */
export function SpeciesFromFitForm({ fitId, equation }: { fitId: number; equation: string }) {
  const queryClient = useQueryClient();
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<SpeciesFromFitInput>({ resolver: zodResolver(SpeciesFromFitInput), defaultValues: { species: '', name: '' } });
  const create = useMutation({
    mutationFn: (body: SpeciesFromFitInput) => apiFetch<Created>(`/api/fits/${fitId}/species`, { method: 'POST', body }),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['species'] }),
    onError: (error) => setBanner(applyServerErrors(error, form.setError, ['species', 'name'])),
  });
  if (equation === '') {
    return <p className="text-sm text-ink-soft">Link the data set to its reaction and save a new fit to solve a species from it.</p>;
  }
  const done = create.data;
  return (
    <form
      aria-label="Create team species from this fit"
      className="flex flex-col gap-2 rounded-md border border-paper-edge bg-white p-3"
      noValidate
      onSubmit={form.handleSubmit((v) => {
        setBanner(null);
        create.mutate(v);
      })}
    >
      <h3 className="text-sm font-semibold">Create team species from this fit</h3>
      <p className="text-xs text-ink-soft">
        ΔfH°, ΔfG° and S° of one species of {equation}, from the fitted ΔrH° and ΔrS° (taken as 298.15 K values, ΔCp = 0) and the library values of the
        others. Its provenance points back to this fit.
      </p>
      {banner ? <Notice tone="error">{banner}</Notice> : null}
      <div className="grid gap-2 sm:grid-cols-2">
        <TextField label="Species to solve for" placeholder="NO2(g)" {...form.register('species')} error={form.formState.errors.species?.message} />
        <TextField label="Name" {...form.register('name')} error={form.formState.errors.name?.message} />
      </div>
      <Button type="submit" className="self-start" disabled={create.isPending}>
        {create.isPending ? 'Creating…' : 'Create team species'}
      </Button>
      {done ? (
        <Notice tone="success" title={`${done.solved.key} added to your team’s species`}>
          ΔfH° {n(done.solved.dfH_kJ)} kJ/mol, ΔfG° {n(done.solved.dfG_kJ)} kJ/mol, S° {n(done.solved.S_J_per_K)} J/(mol K).
          {done.solved.shadows ? ' It overrides the built-in value for your team’s evaluations.' : ''}{' '}
          <Link className="underline" href="/species">
            Open the species library
          </Link>
        </Notice>
      ) : null}
    </form>
  );
}
