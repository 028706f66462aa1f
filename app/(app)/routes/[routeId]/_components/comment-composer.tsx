'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/text-area-field';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { CommentBody, COMMENT_MAX_CHARS } from '@/lib/schemas/comment';

const ComposerForm = z.object({ body: CommentBody });
type ComposerValues = z.infer<typeof ComposerForm>;

export const COMMENT_HINT = 'Markdown: *emphasis*, **strong**, `code`, lists and > quotes. Type @ and a colleague’s handle to mention them.';

// One text box for a new thread, a reply or an edit; the same rules as the server (1–10,000 characters).
export function CommentComposer({
  label,
  submitLabel,
  initial = '',
  handles = [],
  onSubmit,
  onCancel,
}: {
  label: string;
  submitLabel: string;
  initial?: string;
  /** team members' handles offered as one-click mentions */
  handles?: ReadonlyArray<{ handle: string; name: string }>;
  onSubmit: (body: string) => Promise<void>;
  onCancel?: () => void;
}) {
  const [banner, setBanner] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError, reset, getValues, setValue, setFocus } = useForm<ComposerValues>({
    resolver: zodResolver(ComposerForm),
    defaultValues: { body: initial },
  });

  const submit = handleSubmit(async ({ body }) => {
    setBanner(null);
    try {
      await onSubmit(body);
      reset({ body: '' });
    } catch (error) {
      setBanner(applyServerErrors(error, setError, ['body']));
    }
  });

  const mention = (handle: string) => {
    const text = getValues('body');
    setValue('body', `${text}${text && !/\s$/.test(text) ? ' ' : ''}@${handle} `, { shouldDirty: true });
    setFocus('body');
  };

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-1.5">
      <TextAreaField label={label} hideLabel rows={3} maxLength={COMMENT_MAX_CHARS} placeholder={label} hint={COMMENT_HINT} error={formState.errors.body?.message} {...register('body')} />
      {handles.length ? (
        <div className="flex flex-wrap items-center gap-1 text-xs" aria-label="Mention a colleague">
          <span className="text-ink-faint">Mention:</span>
          {handles.map((h) => (
            <button key={h.handle} type="button" className="rounded border border-paper-edge px-1.5 py-0.5 hover:bg-paper-deep" title={h.name} onClick={() => mention(h.handle)}>
              @{h.handle}
            </button>
          ))}
        </div>
      ) : null}
      {banner ? (
        <p role="alert" className="text-xs text-uphill">
          {banner}
        </p>
      ) : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Posting…' : submitLabel}
        </Button>
        {onCancel ? (
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
