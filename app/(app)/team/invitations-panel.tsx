'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ROLE_LABELS, ROLES } from '@/lib/auth/roles';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { invitationsQuery, teamKeys } from '@/lib/queries/team';
import { InviteInput } from '@/lib/schemas/team';

const STATUS_LABEL = { pending: 'Pending', accepted: 'Accepted', expired: 'Expired', revoked: 'Withdrawn' } as const;

export function InvitationsPanel({ teamId }: { teamId: number }) {
  const queryClient = useQueryClient();
  const invitations = useQuery(invitationsQuery(teamId));
  const [banner, setBanner] = useState<{ tone: 'success' | 'error' | 'caution'; text: string } | null>(null);
  const { register, handleSubmit, reset, setError, formState } = useForm<InviteInput>({
    resolver: zodResolver(InviteInput),
    defaultValues: { email: '', role: 'reviewer' },
  });
  const refresh = () => queryClient.invalidateQueries({ queryKey: teamKeys.invitations(teamId) });

  async function onInvite(values: InviteInput) {
    setBanner(null);
    try {
      const result = await apiFetch<{ mailSent: boolean }>(`/api/teams/${teamId}/invitations`, { method: 'POST', body: values });
      setBanner(
        result.mailSent
          ? { tone: 'success', text: `Invitation sent to ${values.email}.` }
          : { tone: 'caution', text: `Invitation saved, but the e-mail could not be sent. Check the mail settings and invite again.` },
      );
      reset({ email: '', role: values.role });
      await refresh();
    } catch (error) {
      const message = applyServerErrors(error, setError, ['email', 'role']);
      if (message) setBanner({ tone: 'error', text: message });
    }
  }

  const revoke = useMutation({
    mutationFn: (id: number) => apiFetch(`/api/teams/${teamId}/invitations/${id}`, { method: 'DELETE' }),
    onSuccess: refresh,
  });

  return (
    <section className="rounded-lg border border-paper-edge bg-white p-4" aria-labelledby="invite-heading">
      <h2 id="invite-heading" className="font-semibold">Invite someone</h2>
      <form onSubmit={handleSubmit(onInvite)} className="mt-3 flex flex-col gap-3" noValidate>
        {banner ? <Notice tone={banner.tone}>{banner.text}</Notice> : null}
        <TextField label="E-mail" type="email" error={formState.errors.email?.message} {...register('email')} />
        <div className="flex flex-col gap-1">
          <label htmlFor="invite-role" className="text-sm font-medium">Role</label>
          <select id="invite-role" className="rounded-md border border-paper-edge bg-white px-2 py-1.5 text-sm" {...register('role')}>
            {ROLES.map((r) => (
              <option key={r} value={r}>{ROLE_LABELS[r]}</option>
            ))}
          </select>
        </div>
        <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Sending…' : 'Send invitation'}</Button>
      </form>
      <h3 className="mt-5 text-xs font-semibold uppercase tracking-wide text-ink-faint">Invitations</h3>
      {invitations.isPending ? <p className="mt-1 text-sm text-ink-soft">Loading…</p> : null}
      {invitations.isError ? <Notice tone="error">{invitations.error.message}</Notice> : null}
      {invitations.data?.length === 0 ? <p className="mt-1 text-sm text-ink-soft">No invitations yet.</p> : null}
      <ul className="mt-1 divide-y divide-paper-edge text-sm">
        {invitations.data?.map((inv) => (
          <li key={inv.id} className="flex items-center justify-between gap-2 py-1.5">
            <span className="min-w-0">
              <span className="block break-all">{inv.email}</span>
              <span className="text-xs text-ink-faint">{ROLE_LABELS[inv.role]} · {STATUS_LABEL[inv.status]}</span>
            </span>
            {inv.status === 'pending' ? (
              <Button variant="quiet" onClick={() => revoke.mutate(inv.id)} aria-label={`Withdraw invitation to ${inv.email}`}>
                Withdraw
              </Button>
            ) : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
