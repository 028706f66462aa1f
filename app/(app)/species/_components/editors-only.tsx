'use client';

import type { ReactNode } from 'react';
import { Notice } from '@/components/ui/notice';
import { can } from '@/lib/auth/permissions';
import { activeMembership, useProfile } from '@/lib/queries/me';

// The server refuses anyway; this only spares a reviewer a form they cannot send.
export function EditorsOnly({ children }: { children: ReactNode }) {
  const { data: profile, isPending } = useProfile();
  if (isPending) return <p className="py-6 text-sm text-ink-soft" role="status">Loading…</p>;
  if (!can(activeMembership(profile)?.role, 'species.edit')) {
    return <Notice tone="info" title="Designers and leads add and edit species">Your role in this team can read the species but not change them.</Notice>;
  }
  return <>{children}</>;
}
