'use client';

import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { StatusBadge } from '@/components/review/status-badge';
import { Button } from '@/components/ui/button';
import type { Role } from '@/lib/auth/roles';
import { moveRoute, reviewKeys, transitionsQuery } from '@/lib/queries/revisions';
import { routeKeys } from '@/lib/queries/routes';
import { ROUTE_STATUS_LABELS, type RouteStatus } from '@/lib/schemas/workflow';
import { allowedMoves } from '@/lib/services/workflow/transition-table';
import { useRouteEditorStore, useRouteEditorStoreApi } from '@/stores/route-editor-store';
import { ApprovalCheck, useApprovalCheck } from './approval-check';
import { MoveDialog } from './move-dialog';
import { APPROVE_ANYWAY, MOVE_LABELS } from './workflow-labels';

// The route's review status and the moves the caller's role may make from it.
export function WorkflowBar({
  routeId,
  teamId,
  status,
  role,
  selfId,
  stepLabels = {},
}: {
  routeId: number;
  teamId: number;
  status: string;
  role: Role;
  selfId: number | null;
  /** "Step 2 (amide formation)" by step key, for the approval check */
  stepLabels?: Record<string, string>;
}) {
  const store = useRouteEditorStoreApi();
  const queryClient = useQueryClient();
  const pendingEdits = useRouteEditorStore((s) => s.isDirty || s.saveStatus === 'saving');
  const [moving, setMoving] = useState<RouteStatus | null>(null);
  const moves = allowedMoves(status, role);
  // The latest move, with its note: why the route is where it is ("edited after approval", "clear the flag first").
  const latest = useQuery(transitionsQuery(routeId)).data?.items[0];
  const approvalCheck = useApprovalCheck(routeId, stepLabels);

  const submit = async (values: { note: string; reviewerIds?: number[] }) => {
    if (!moving) return;
    const answer = await moveRoute(routeId, { to: moving, version: store.getState().version, ...values, note: values.note });
    // A move bumps the route's version without touching the document; the editor adopts it.
    const { doc } = store.getState();
    store.getState().markSaved(answer.route.version, doc);
    setMoving(null);
    await Promise.all([
      queryClient.invalidateQueries({ queryKey: routeKeys.detail(routeId) }),
      queryClient.invalidateQueries({ queryKey: reviewKeys.route(routeId) }),
      queryClient.invalidateQueries({ queryKey: routeKeys.lists() }),
    ]);
  };

  return (
    <div className="flex flex-wrap items-center gap-2" aria-label="Review status">
      <StatusBadge status={status} />
      {moves.map((to) => (
        <Button key={to} variant={to === 'approved' ? 'primary' : 'secondary'} disabled={pendingEdits} title={pendingEdits ? 'Wait for your edits to save' : undefined} onClick={() => setMoving(to)}>
          {to === 'in_review' && status === 'changes_requested' ? 'Send back for review' : MOVE_LABELS[to].action}
        </Button>
      ))}
      {latest && latest.to === status ? (
        <p className="text-xs text-ink-soft" data-testid="latest-move">
          {ROUTE_STATUS_LABELS[latest.from]} → {ROUTE_STATUS_LABELS[latest.to]} by {latest.actor.name}
          {latest.note ? <span>: “{latest.note}”</span> : null}
        </p>
      ) : null}
      {moving ? (
        <MoveDialog
          to={moving}
          teamId={teamId}
          selfId={selfId}
          // The lead sees what is still open before approving, and the button says it approves regardless.
          notice={moving === 'approved' ? <ApprovalCheck check={approvalCheck} /> : undefined}
          submitLabel={moving === 'approved' && approvalCheck.summary && !approvalCheck.summary.isClear ? APPROVE_ANYWAY : undefined}
          onClose={() => setMoving(null)}
          onSubmit={submit}
        />
      ) : null}
    </div>
  );
}
