import Link from 'next/link';
import type { ReactNode } from 'react';
import { StepwellMark } from '@/components/shell/stepwell-mark';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="flex min-h-screen flex-col items-center px-4 py-12">
      <Link href="/" className="mb-6 flex items-center gap-2 text-lg font-semibold">
        <StepwellMark /> Stepwell
      </Link>
      <div className="w-full max-w-sm rounded-lg border border-paper-edge bg-white p-6 shadow-sm">{children}</div>
    </main>
  );
}
