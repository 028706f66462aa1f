import type { Metadata } from 'next';
import Link from 'next/link';
import { ForgotPasswordForm } from './forgot-password-form';

export const metadata: Metadata = { title: 'Forgot password' };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="text-lg font-semibold">Forgot your password?</h1>
      <p className="mt-1 text-sm text-ink-soft">Enter the address you sign in with. We will mail you a link to choose a new password.</p>
      <ForgotPasswordForm />
      <p className="mt-4 text-sm text-ink-soft">
        Remembered it?{' '}
        <Link href="/sign-in" className="text-pine-700 underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
