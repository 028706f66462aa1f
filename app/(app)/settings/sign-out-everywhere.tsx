'use client';

import { signOut } from 'next-auth/react';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/queries/api-fetch';

export function SignOutEverywhere() {
  const [isBusy, setIsBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function handleClick() {
    setIsBusy(true);
    setError(null);
    try {
      await apiFetch('/api/me/sign-out-everywhere', { method: 'POST' });
      await signOut({ callbackUrl: '/sign-in' });
    } catch (caught) {
      setError(caught instanceof ApiError ? caught.message : 'Could not sign out everywhere. Try again.');
      setIsBusy(false);
    }
  }

  return (
    <section className="flex max-w-xl flex-col gap-3 rounded-lg border border-paper-edge bg-white p-5" aria-labelledby="sessions-heading">
      <h2 id="sessions-heading" className="text-sm font-semibold">Sessions</h2>
      <p className="text-sm text-ink-soft">
        Ends every session of your account on every device, this one included. Use it if you signed in on a shared computer or lost a device.
      </p>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <div>
        <Button variant="danger" onClick={handleClick} disabled={isBusy}>
          {isBusy ? 'Signing out…' : 'Sign out everywhere'}
        </Button>
      </div>
    </section>
  );
}
