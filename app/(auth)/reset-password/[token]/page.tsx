import type { Metadata } from 'next';
import Link from 'next/link';
import { Notice } from '@/components/ui/notice';
import { RESET_STATUS_MESSAGES, resetTokenStatus } from '@/lib/services/password-reset/reset-password';
import { ResetPasswordForm } from './reset-password-form';

export const metadata: Metadata = { title: 'Choose a new password', referrer: 'no-referrer' };
export const dynamic = 'force-dynamic';

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const status = await resetTokenStatus({ token });
  if (status !== 'valid') {
    return (
      <>
        <h1 className="text-lg font-semibold">This link cannot be used</h1>
        <div className="mt-3">
          <Notice tone="error">{RESET_STATUS_MESSAGES[status]}</Notice>
        </div>
        <p className="mt-4 text-sm">
          <Link href="/forgot-password" className="text-pine-700 underline">
            Ask for a new link
          </Link>
        </p>
      </>
    );
  }
  return (
    <>
      <h1 className="text-lg font-semibold">Choose a new password</h1>
      <p className="mt-1 text-sm text-ink-soft">Setting it signs you out on every device.</p>
      <ResetPasswordForm token={token} />
    </>
  );
}
