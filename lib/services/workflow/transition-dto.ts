import type { RouteStatus } from '../../schemas/workflow';

export interface PersonRef {
  id: number;
  name: string;
}

export interface TransitionDto {
  id: number;
  routeId: number;
  from: RouteStatus;
  to: RouteStatus;
  /** null id when the account was removed */
  actor: { id: number | null; name: string };
  note: string;
  /** reviewers named by this move (only moves to in_review name any) */
  reviewers: PersonRef[];
  routeVersion: number;
  createdAt: string;
}

/** Everything a notifier needs about one move, returned by every service that makes one. */
export interface TransitionOutcome {
  route: { id: number; teamId: number; name: string; status: RouteStatus; version: number };
  transition: TransitionDto;
  /** reviewers named at the latest submission for review (the new ones when this move is to in_review) */
  reviewerIds: number[];
  /** who sent the route for review most recently; null if it never was */
  submitterId: number | null;
  /** on approval: what the approval does not cover, to show beside it */
  caution?: string;
}
