import { queryOptions } from '@tanstack/react-query';
import type { InvitationDto } from '../services/invitations/invitation-dto';
import type { MemberDto } from '../services/teams/list-members';
import { apiFetch } from './api-fetch';

export const teamKeys = {
  all: ['team'] as const,
  members: (teamId: number) => [...teamKeys.all, teamId, 'members'] as const,
  invitations: (teamId: number) => [...teamKeys.all, teamId, 'invitations'] as const,
};

export const membersQuery = (teamId: number) =>
  queryOptions({
    queryKey: teamKeys.members(teamId),
    queryFn: () => apiFetch<{ members: MemberDto[] }>(`/api/teams/${teamId}/members`).then((r) => r.members),
  });

export const invitationsQuery = (teamId: number) =>
  queryOptions({
    queryKey: teamKeys.invitations(teamId),
    queryFn: () => apiFetch<{ invitations: InvitationDto[] }>(`/api/teams/${teamId}/invitations`).then((r) => r.invitations),
  });
