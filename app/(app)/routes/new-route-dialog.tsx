'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { createRoute, routeKeys } from '@/lib/queries/routes';
import { CreateRouteInput } from '@/lib/schemas/route';

type CreateRouteForm = z.input<typeof CreateRouteInput>;

export function NewRouteDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} title="New route" onClose={onClose}>
      <NewRouteForm onCancel={onClose} />
    </Dialog>
  );
}

function NewRouteForm({ onCancel }: { onCancel: () => void }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [banner, setBanner] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<CreateRouteForm, unknown, CreateRouteInput>({
    resolver: zodResolver(CreateRouteInput),
    defaultValues: { name: '', target: '', targetAmount: '1 mol' },
  });

  async function onCreate(values: CreateRouteInput) {
    setBanner(null);
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
      <TextField label="Target species" placeholder="CH3OH(g)" hint="Formula with its phase." error={formState.errors.target?.message} {...register('target')} />
      <TextField label="Target amount" hint="Every ladder energy is given for this amount." error={formState.errors.targetAmount?.message} {...register('targetAmount')} />
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
