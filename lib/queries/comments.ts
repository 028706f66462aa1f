import { queryOptions } from '@tanstack/react-query';
import type { CommentDto, CommentListDto, CreateCommentInput } from '../schemas/comment';
import type { CreateFlagInput, FlagDto, FlagListDto } from '../schemas/flag';
import type { NotificationPageDto } from '../schemas/notification';
import { apiFetch } from './api-fetch';
import { reviewKeys } from './revisions';

export const discussionKeys = {
  comments: (routeId: number) => [...reviewKeys.route(routeId), 'comments'] as const,
  flags: (routeId: number, state: 'open' | 'all') => [...reviewKeys.route(routeId), 'flags', state] as const,
  activity: (routeId: number) => [...reviewKeys.route(routeId), 'activity'] as const,
  notifications: ['notifications'] as const,
};

export const commentsQuery = (routeId: number) =>
  queryOptions({ queryKey: discussionKeys.comments(routeId), queryFn: () => apiFetch<CommentListDto>(`/api/routes/${routeId}/comments`) });

export const flagsQuery = (routeId: number, state: 'open' | 'all' = 'open') =>
  queryOptions({ queryKey: discussionKeys.flags(routeId, state), queryFn: () => apiFetch<FlagListDto>(`/api/routes/${routeId}/flags?state=${state}`) });

export const notificationsQuery = () =>
  queryOptions({
    queryKey: discussionKeys.notifications,
    queryFn: () => apiFetch<NotificationPageDto>('/api/notifications?limit=20'),
    refetchInterval: 30_000,
  });

export const postComment = (routeId: number, input: CreateCommentInput) => apiFetch<CommentDto>(`/api/routes/${routeId}/comments`, { method: 'POST', body: input });
export const editComment = (routeId: number, commentId: number, body: string) =>
  apiFetch<CommentDto>(`/api/routes/${routeId}/comments/${commentId}`, { method: 'PATCH', body: { body } });
export const deleteComment = (routeId: number, commentId: number) => apiFetch<unknown>(`/api/routes/${routeId}/comments/${commentId}`, { method: 'DELETE' });
export const resolveThread = (routeId: number, commentId: number, resolved: boolean) =>
  apiFetch<unknown>(`/api/routes/${routeId}/comments/${commentId}/resolve`, { method: 'POST', body: { resolved } });

export const raiseFlag = (routeId: number, input: CreateFlagInput) => apiFetch<FlagDto>(`/api/routes/${routeId}/flags`, { method: 'POST', body: input });
export const clearFlag = (routeId: number, flagId: number, comment: string) =>
  apiFetch<unknown>(`/api/routes/${routeId}/flags/${flagId}/clear`, { method: 'POST', body: { comment } });

export const markNotificationsRead = (input: { ids: number[] } | { all: true }) => apiFetch<unknown>('/api/notifications/read', { method: 'POST', body: input });
