import type { Metadata } from 'next';
import Link from 'next/link';
import { safeNextPath } from '@/lib/security/safe-next-path';
import { SignInForm } from './sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string | string[] }> }) {
  const { next } = await searchParams;
  return (
    <>
      <h1 className="text-lg font-semibold">Sign in</h1>
      <SignInForm next={safeNextPath(next)} />
      <p className="mt-3 text-sm">
        <Link href="/forgot-password" className="text-pine-700 underline">
          Forgot your password?
        </Link>
      </p>
      <p className="mt-2 text-sm text-ink-soft">
        New here?{' '}
        <Link href="/sign-up" className="text-pine-700 underline">
          Start a team
        </Link>
      </p>
    </>
  );
}
