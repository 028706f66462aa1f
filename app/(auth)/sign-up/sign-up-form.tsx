'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NewPasswordField } from '@/components/ui/new-password-field';
import { TextField } from '@/components/ui/text-field';
import { signInWithPassword } from '@/lib/auth/client-sign-in';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { SignUpInput } from '@/lib/schemas/auth';

export function SignUpForm() {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignUpInput>({ resolver: zodResolver(SignUpInput) });
  const errors = formState.errors;

  async function onSubmit(values: SignUpInput) {
    setFormError(null);
    try {
      await apiFetch('/api/signup', { method: 'POST', body: values });
      await signInWithPassword({ email: values.email, password: values.password });
      router.push('/routes');
      router.refresh();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['name', 'email', 'password', 'teamName']));
    }
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} className="mt-4 flex flex-col gap-3" noValidate>
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...register('name')} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register('email')} />
      <NewPasswordField label="Password" error={errors.password?.message} {...register('password')} />
      <TextField label="Team name" placeholder="e.g. Process Development" error={errors.teamName?.message} {...register('teamName')} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Creating…' : 'Create account and team'}
      </Button>
    </form>
  );
}
