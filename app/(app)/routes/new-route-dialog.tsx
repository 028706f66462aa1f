'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { balanceQuery, createRoute, routeKeys } from '@/lib/queries/routes';
import { targetProbe, targetProblem } from '@/lib/route-editor/target-check';
import { CreateRouteInput } from '@/lib/schemas/route';

type CreateRouteForm = z.input<typeof CreateRouteInput>;

export function NewRouteDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} title="New route" onClose={onClose}>
      <NewRouteForm onCancel={onClose} />
    </Dialog>
  );
}

// The target is checked against the team's species as people type (the live balance check reads it as a route would).
function useTargetCheck(target: string): { problem: string | null; isChecking: boolean } {
  const settled = useDebouncedValue(target.trim(), 400);
  const probe = targetProbe(settled);
  const check = useQuery({ ...balanceQuery(probe ?? ''), enabled: probe !== null });
  const isChecking = target.trim() !== settled || (probe !== null && check.isFetching);
  return { problem: probe && !isChecking ? targetProblem(settled, check.data) : null, isChecking };
}

function NewRouteForm({ onCancel }: { onCancel: () => void }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [banner, setBanner] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<CreateRouteForm, unknown, CreateRouteInput>({
    resolver: zodResolver(CreateRouteInput),
    defaultValues: { name: '', target: '', targetAmount: '1 mol' },
    mode: 'onChange',
  });
  const target = useWatch({ control, name: 'target' }) ?? '';
  const targetCheck = useTargetCheck(target);

  async function onCreate(values: CreateRouteInput) {
    setBanner(null);
    if (targetCheck.problem) {
      setError('target', { message: targetCheck.problem }, { shouldFocus: true });
      return;
    }
    try {
      const route = await createRoute(values);
      await queryClient.invalidateQueries({ queryKey: routeKeys.lists() });
      router.push(`/routes/${route.id}`);
    } catch (error) {
      setBanner(applyServerErrors(error, setError, ['name', 'target', 'targetAmount']));
    }
  }

  return (
    <form onSubmit={handleSubmit(onCreate)} className="flex flex-col gap-3" noValidate>
      {banner ? <Notice tone="error">{banner}</Notice> : null}
      <TextField label="Name" autoFocus placeholder="e.g. Methanol, Line 3 option A" error={formState.errors.name?.message} {...register('name')} />
      <TextField
        label="Target species"
        placeholder="CH3OH(g)"
        hint={targetCheck.isChecking && target.trim() ? 'Formula or name with its phase. Checking the species library…' : 'Formula or name with its phase.'}
        error={formState.errors.target?.message ?? targetCheck.problem ?? undefined}
        {...register('target')}
      />
      <TextField label="Target amount" hint="Every ladder energy is given for this amount, e.g. 1 mol or 500 mmol." error={formState.errors.targetAmount?.message} {...register('targetAmount')} />
      <div className="mt-1 flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Creating…' : 'Create route'}
        </Button>
      </div>
    </form>
  );
}
