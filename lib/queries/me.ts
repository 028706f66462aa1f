import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProfileDto } from '../services/users/get-profile';
import { apiFetch } from './api-fetch';

export const meKeys = {
  all: ['me'] as const,
  profile: () => [...meKeys.all, 'profile'] as const,
};

export const profileQuery = () => queryOptions({ queryKey: meKeys.profile(), queryFn: () => apiFetch<ProfileDto>('/api/me') });

export function useProfile(initialData?: ProfileDto) {
  return useQuery({ ...profileQuery(), initialData });
}

export function activeMembership(profile: ProfileDto | undefined) {
  return profile?.memberships.find((m) => m.teamId === profile.activeTeamId) ?? null;
}
