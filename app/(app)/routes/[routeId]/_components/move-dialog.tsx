'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextAreaField } from '@/components/ui/text-area-field';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { membersQuery } from '@/lib/queries/team';
import { MAX_TRANSITION_NOTE, TransitionInput, transitionFieldErrors, type RouteStatus } from '@/lib/schemas/workflow';
import { MOVE_LABELS } from './workflow-labels';

// The form's part of a move; `to` and `version` come from the bar. Same rules as the server.
// Checkboxes give strings, hence the coercion of reviewer ids.
const MoveForm = TransitionInput.pick({ note: true }).extend({ reviewerIds: z.array(z.coerce.number().int().positive()).optional() });
type MoveFormValues = z.input<typeof MoveForm>;
type MoveFormOutput = z.output<typeof MoveForm>;

export function MoveDialog({
  to,
  teamId,
  selfId,
  notice,
  submitLabel,
  onClose,
  onSubmit,
}: {
  to: RouteStatus;
  teamId: number;
  selfId: number | null;
  /** what the person should know before confirming (the approval check) */
  notice?: ReactNode;
  submitLabel?: string;
  onClose: () => void;
  onSubmit: (values: { note: string; reviewerIds?: number[] }) => Promise<void>;
}) {
  const members = useQuery({ ...membersQuery(teamId), enabled: to === 'in_review' });
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<MoveFormValues, unknown, MoveFormOutput>({
    resolver: zodResolver(MoveForm.superRefine((v, ctx) => {
      for (const [path, message] of Object.entries(transitionFieldErrors({ to, note: v.note ?? '', reviewerIds: v.reviewerIds }))) ctx.addIssue({ code: 'custom', path: [path], message });
    })),
    defaultValues: { note: '', reviewerIds: [] },
  });
  const { register, handleSubmit, formState, setError } = form;
  const label = MOVE_LABELS[to];

  const submit = handleSubmit(async (values) => {
    setBanner(null);
    try {
      await onSubmit({ note: values.note ?? '', ...(to === 'in_review' ? { reviewerIds: values.reviewerIds ?? [] } : {}) });
    } catch (error) {
      setBanner(applyServerErrors(error, setError, ['note', 'reviewerIds']));
    }
  });

  const candidates = (members.data ?? []).filter((m) => m.userId !== selfId);
  return (
    <Dialog open title={label.title} onClose={onClose}>
      <form onSubmit={submit} noValidate className="flex flex-col gap-3">
        <p className="text-sm text-ink-soft">{label.explain}</p>
        {notice}
        {to === 'in_review' ? (
          <fieldset className="flex flex-col gap-1">
            <legend className="text-xs font-medium">Reviewers</legend>
            {members.isPending ? <p className="text-xs text-ink-faint">Loading the team…</p> : null}
            {members.isError ? <p className="text-xs text-uphill">Could not load the team: {members.error.message}</p> : null}
            {members.isSuccess && candidates.length === 0 ? <p className="text-xs text-ink-faint">Nobody else is in the team yet. Invite a colleague from the Team page.</p> : null}
            {candidates.map((m) => (
              <label key={m.userId} className="flex items-center gap-2 text-sm">
                <input type="checkbox" value={m.userId} {...register('reviewerIds')} />
                {m.name} <span className="text-xs text-ink-faint">({m.role})</span>
              </label>
            ))}
            {formState.errors.reviewerIds ? <p className="text-xs text-uphill">{formState.errors.reviewerIds.message}</p> : null}
          </fieldset>
        ) : null}
        <TextAreaField
          label={to === 'changes_requested' ? 'What needs to change' : 'Note (optional)'}
          maxLength={MAX_TRANSITION_NOTE}
          error={formState.errors.note?.message}
          {...register('note')}
        />
        {banner ? (
          <p role="alert" className="text-sm text-uphill">
            {banner}
          </p>
        ) : null}
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" disabled={formState.isSubmitting}>
            {formState.isSubmitting ? 'Saving…' : (submitLabel ?? label.action)}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
