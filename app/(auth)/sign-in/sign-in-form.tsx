'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { signInWithPassword } from '@/lib/auth/client-sign-in';
import { ApiError } from '@/lib/queries/api-fetch';
import { SignInInput } from '@/lib/schemas/auth';

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(SignInInput) });

  async function onSubmit(values: SignInInput) {
    setFormError(null);
    try {
      router.push(await signInWithPassword({ ...values, next }));
      router.refresh();
    } catch (error) {
      setFormError(error instanceof ApiError ? error.message : 'Sign-in failed. Try again.');
    }
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} className="mt-4 flex flex-col gap-3" noValidate>
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register('email')} />
      <TextField label="Password" type="password" autoComplete="current-password" error={formState.errors.password?.message} {...register('password')} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
