import 'server-only';
import { notifyReviewRequest, notifyStatusChange, type NotifyResult } from '../notifications/notify-workflow';
import type { TransitionOutcome } from './transition-dto';

export interface TransitionNotices {
  reviewRequest: NotifyResult | null;
  statusChange: NotifyResult | null;
}

/**
 * Tells people about a move that has committed: named reviewers get the review request, the owner and
 * the latest reviewers the status change. Reviewers who were just asked get only the request, not both.
 * Never throws: the move stands whatever happens to its notices.
 */
export async function notifyTransition(outcome: TransitionOutcome): Promise<TransitionNotices> {
  const { route, transition } = outcome;
  const actorId = transition.actor.id;
  if (actorId === null) return { reviewRequest: null, statusChange: null };
  const base = { teamId: route.teamId, routeId: route.id, actorId, note: transition.note };
  const asked = transition.to === 'in_review' ? transition.reviewers.map((r) => r.id) : [];
  const reviewRequest = asked.length ? await safely('review request', () => notifyReviewRequest({ ...base, reviewerIds: asked })) : null;
  const statusChange = await safely('status change', () =>
    notifyStatusChange({ ...base, from: transition.from, to: transition.to, reviewerIds: outcome.reviewerIds.filter((id) => !asked.includes(id)) }),
  );
  return { reviewRequest, statusChange };
}

async function safely(what: string, send: () => Promise<NotifyResult>): Promise<NotifyResult | null> {
  try {
    return await send();
  } catch (error) {
    console.error(`[stepwell] ${what} notification failed:`, error);
    return null;
  }
}
