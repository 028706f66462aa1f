'use client';

import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { reviewMarksOf } from '@/components/review/review-marks';
import { commentsQuery, flagsQuery } from '@/lib/queries/comments';
import { reviewKeys } from '@/lib/queries/revisions';
import { membersQuery } from '@/lib/queries/team';
import { handleOf } from '@/lib/review/mentions';

// The route's comments and open flags, the marks they put on nodes and risers, and the team's handles.
export function useReviewData(routeId: number, teamId: number) {
  const comments = useQuery(commentsQuery(routeId));
  const flags = useQuery(flagsQuery(routeId, 'open'));
  const members = useQuery(membersQuery(teamId));
  const queryClient = useQueryClient();
  const marks = useMemo(() => reviewMarksOf(comments.data?.unresolvedByStep, flags.data?.openByStep), [comments.data, flags.data]);
  const handles = useMemo(() => (members.data ?? []).map((m) => ({ handle: handleOf(m.email), name: m.name })), [members.data]);
  // Comments, flags, moves and revisions all live under the route's review key.
  const refresh = () => queryClient.invalidateQueries({ queryKey: reviewKeys.route(routeId) });
  return { comments, flags, marks, handles, refresh };
}
