'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { type z } from 'zod';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NewPasswordField } from '@/components/ui/new-password-field';
import { TextField } from '@/components/ui/text-field';
import { signInWithPassword } from '@/lib/auth/client-sign-in';
import { applyServerErrors } from '@/lib/forms/apply-server-errors';
import { apiFetch } from '@/lib/queries/api-fetch';
import { AcceptInvitationInput } from '@/lib/schemas/auth';
import { refuseEmailInPassword } from '@/lib/schemas/password';

type Mode = 'signed-in' | 'wrong-account' | 'needs-sign-in' | 'new-account';

const NewAccount = AcceptInvitationInput.required();
type NewAccount = z.infer<typeof NewAccount>;

export function AcceptInvitationForm({ token, email, mode, signedInAs }: { token: string; email: string; mode: Mode; signedInAs: string | null }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  // The invited address is known here, so the form refuses a password containing it before the server does.
  const schema = useMemo(() => NewAccount.superRefine(refuseEmailInPassword(() => email)), [email]);
  const { register, handleSubmit, setError, formState } = useForm<NewAccount>({ resolver: zodResolver(schema) });
  const acceptUrl = `/api/invitations/${encodeURIComponent(token)}/accept`;

  async function acceptSignedIn() {
    setBusy(true);
    setFormError(null);
    try {
      await apiFetch(acceptUrl, { method: 'POST', body: {} });
      router.push('/routes');
      router.refresh();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, []));
      setBusy(false);
    }
  }

  async function acceptNew(values: NewAccount) {
    setFormError(null);
    try {
      await apiFetch(acceptUrl, { method: 'POST', body: values });
      await signInWithPassword({ email, password: values.password });
      router.push('/routes');
      router.refresh();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['name', 'password']));
    }
  }

  if (mode === 'wrong-account') {
    return (
      <div className="mt-4">
        <Notice tone="caution">
          You are signed in as {signedInAs}. This invitation is for {email}: sign out, then open the link again.
        </Notice>
      </div>
    );
  }
  if (mode === 'needs-sign-in') {
    return (
      <p className="mt-4 text-sm">
        An account for this address exists.{' '}
        <Link className="text-pine-700 underline" href={`/sign-in?next=${encodeURIComponent(`/invite/${token}`)}`}>
          Sign in to accept
        </Link>
        .
      </p>
    );
  }
  if (mode === 'signed-in') {
    return (
      <div className="mt-4 flex flex-col gap-3">
        {formError ? <Notice tone="error">{formError}</Notice> : null}
        <Button onClick={acceptSignedIn} disabled={busy}>
          {busy ? 'Joining…' : 'Accept and join'}
        </Button>
      </div>
    );
  }
  return (
    <form onSubmit={handleSubmit(acceptNew)} className="mt-4 flex flex-col gap-3" noValidate>
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TextField label="Your name" autoComplete="name" error={formState.errors.name?.message} {...register('name')} />
      <NewPasswordField label="Choose a password" error={formState.errors.password?.message} {...register('password')} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Joining…' : 'Create account and join'}
      </Button>
    </form>
  );
}
