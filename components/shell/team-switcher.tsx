'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useId } from 'react';
import { ROLE_LABELS } from '@/lib/auth/roles';
import { apiFetch } from '@/lib/queries/api-fetch';
import type { ProfileDto } from '@/lib/services/users/get-profile';

/** `isLabelShown`: the word "Team" on screen too, as in the phone menu, where the select stands alone. */
export function TeamSwitcher({ profile, isLabelShown = false }: { profile: ProfileDto; isLabelShown?: boolean }) {
  const id = useId();
  const router = useRouter();
  const queryClient = useQueryClient();
  const switchTeam = useMutation({
    mutationFn: (teamId: number) => apiFetch('/api/me/active-team', { method: 'PUT', body: { teamId } }),
    onSuccess: async () => {
      // Everything on screen belongs to the old team; drop it all.
      await queryClient.invalidateQueries();
      router.refresh();
    },
  });
  if (profile.memberships.length === 0) return null;
  const active = profile.memberships.find((m) => m.teamId === profile.activeTeamId);
  return (
    <div className={`flex items-center gap-2 text-sm ${isLabelShown ? 'flex-wrap' : ''}`}>
      <label htmlFor={id} className={isLabelShown ? 'font-medium' : 'sr-only'}>
        Team
      </label>
      <select
        id={id}
        value={profile.activeTeamId ?? ''}
        disabled={switchTeam.isPending}
        onChange={(e) => switchTeam.mutate(Number(e.target.value))}
        className={`${isLabelShown ? 'min-w-0 flex-1' : 'max-w-[12rem] xl:max-w-[16rem]'} truncate rounded-md border border-paper-edge bg-paper px-2 py-1 text-sm`}
      >
        {profile.memberships.map((m) => (
          <option key={m.teamId} value={m.teamId}>
            {m.teamName}
          </option>
        ))}
      </select>
      {active ? <span className="rounded bg-brass-100 px-1.5 py-0.5 text-xs text-brass-700">{ROLE_LABELS[active.role]}</span> : null}
    </div>
  );
}
