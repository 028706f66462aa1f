import { redirect } from 'next/navigation';
import type { ReactNode } from 'react';
import { AppShell } from '@/components/shell/app-shell';
import { currentProfile } from '@/lib/auth/current-user';

export const dynamic = 'force-dynamic';

export default async function SignedInLayout({ children }: { children: ReactNode }) {
  const profile = await currentProfile();
  if (!profile) redirect('/sign-in');
  return <AppShell profile={profile}>{children}</AppShell>;
}
