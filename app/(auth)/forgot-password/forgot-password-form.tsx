'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { RequestPasswordResetInput } from '@/lib/schemas/password-reset';

export function ForgotPasswordForm() {
  const [sent, setSent] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<RequestPasswordResetInput>({ resolver: zodResolver(RequestPasswordResetInput) });

  async function onSubmit(values: RequestPasswordResetInput) {
    setFormError(null);
    try {
      const answer = await apiFetch<{ message: string }>('/api/password-reset', { method: 'POST', body: values });
      setSent(answer.message);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email']));
    }
  }

  if (sent) return <div className="mt-4"><Notice tone="success">{sent}</Notice></div>;
  return (
    <form onSubmit={handleSubmit(onSubmit)} className="mt-4 flex flex-col gap-3" noValidate>
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register('email')} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Sending…' : 'Send reset link'}
      </Button>
    </form>
  );
}
