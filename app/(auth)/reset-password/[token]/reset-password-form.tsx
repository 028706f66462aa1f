'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NewPasswordField } from '@/components/ui/new-password-field';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { ResetPasswordInput } from '@/lib/schemas/password-reset';

export function ResetPasswordForm({ token }: { token: string }) {
  const [done, setDone] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<ResetPasswordInput>({ resolver: zodResolver(ResetPasswordInput) });

  async function onSubmit(values: ResetPasswordInput) {
    setFormError(null);
    try {
      const answer = await apiFetch<{ message: string }>(`/api/password-reset/${encodeURIComponent(token)}`, { method: 'POST', body: values });
      setDone(answer.message);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['password']));
    }
  }

  if (done) {
    return (
      <div className="mt-4 flex flex-col gap-3">
        <Notice tone="success">{done}</Notice>
        <Link href="/sign-in" className="text-sm text-pine-700 underline">
          Go to sign in
        </Link>
      </div>
    );
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} className="mt-4 flex flex-col gap-3" noValidate>
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <NewPasswordField label="New password" error={formState.errors.password?.message} {...register('password')} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Saving…' : 'Set new password'}
      </Button>
    </form>
  );
}
