import type { Metadata } from 'next';
import Link from 'next/link';
import { SignUpForm } from './sign-up-form';

export const metadata: Metadata = { title: 'Start a team' };

export default function SignUpPage() {
  return (
    <>
      <h1 className="text-lg font-semibold">Start a team</h1>
      <p className="mt-1 text-sm text-ink-soft">You become the team’s lead and can invite designers and reviewers.</p>
      <SignUpForm />
      <p className="mt-4 text-sm text-ink-soft">
        Already have an account?{' '}
        <Link href="/sign-in" className="text-pine-700 underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
