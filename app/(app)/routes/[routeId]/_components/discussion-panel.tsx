'use client';

import { ChemText } from '@/components/chemistry/chem-text';
import type { UseQueryResult } from '@tanstack/react-query';
import { useState } from 'react';
import { deleteComment, editComment, postComment, resolveThread } from '@/lib/queries/comments';
import type { CommentListDto } from '@/lib/schemas/comment';
import { useRouteEditorStore } from '@/stores/route-editor-store';
import { CommentComposer } from './comment-composer';
import { CommentThread, type ThreadActions } from './comment-thread';

type Scope = 'here' | 'all';

// Threads on the selected step (or on the route as a whole when no step is selected), or every thread.
export function DiscussionPanel({
  routeId,
  selfId,
  canComment,
  comments,
  handles,
  stepLabels,
  refresh,
}: {
  routeId: number;
  selfId: number;
  canComment: boolean;
  comments: UseQueryResult<CommentListDto>;
  handles: ThreadActions['handles'];
  stepLabels: Record<string, string>;
  refresh: () => Promise<void>;
}) {
  const selectedStepId = useRouteEditorStore((s) => s.selectedStepId);
  const [scope, setScope] = useState<Scope>('here');
  const [showResolved, setShowResolved] = useState(false);
  const here = selectedStepId ?? null;
  const placeName = here ? (stepLabels[here] ?? 'this step') : 'the whole route';
  const titleOf = (stepKey: string | null) => (stepKey ? (stepLabels[stepKey] ?? 'a removed step') : 'the whole route');

  const actions: ThreadActions = {
    selfId,
    canComment,
    handles,
    reply: async (rootId, body) => {
      await postComment(routeId, { body, parentId: rootId });
      await refresh();
    },
    edit: async (commentId, body) => {
      await editComment(routeId, commentId, body);
      await refresh();
    },
    remove: async (commentId) => {
      await deleteComment(routeId, commentId);
      await refresh();
    },
    setResolved: async (rootId, resolved) => {
      await resolveThread(routeId, rootId, resolved);
      await refresh();
    },
  };

  if (comments.isPending) return <p className="text-sm text-ink-faint">Loading comments…</p>;
  if (comments.isError) return <p role="alert" className="text-sm text-uphill">Could not load comments: {comments.error.message}</p>;
  const threads = comments.data.threads.filter((t) => (scope === 'all' || t.root.stepKey === here) && (showResolved || !t.resolved));
  const resolvedHidden = comments.data.threads.filter((t) => t.resolved && (scope === 'all' || t.root.stepKey === here)).length;

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-3 text-xs">
        <label className="flex items-center gap-1">
          <input type="radio" name="comment-scope" checked={scope === 'here'} onChange={() => setScope('here')} /> On <ChemText text={placeName} />
        </label>
        <label className="flex items-center gap-1">
          <input type="radio" name="comment-scope" checked={scope === 'all'} onChange={() => setScope('all')} /> Every thread
        </label>
        <label className="flex items-center gap-1">
          <input type="checkbox" checked={showResolved} onChange={(e) => setShowResolved(e.target.checked)} /> Show resolved ({resolvedHidden})
        </label>
      </div>
      {threads.length === 0 ? <p className="text-sm text-ink-faint">No open threads {scope === 'all' ? 'on this route' : <>on <ChemText text={placeName} /></>}.</p> : null}
      {threads.map((t) => (
        <CommentThread key={t.root.id} thread={t} title={titleOf(t.root.stepKey)} actions={actions} />
      ))}
      {canComment ? (
        <CommentComposer
          label={`Comment on ${placeName}`}
          submitLabel="Comment"
          handles={handles}
          onSubmit={async (body) => {
            await postComment(routeId, { body, stepKey: here });
            await refresh();
          }}
        />
      ) : null}
    </div>
  );
}
