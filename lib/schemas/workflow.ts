import { z } from 'zod';

export const ROUTE_STATUSES = ['draft', 'in_review', 'changes_requested', 'approved', 'shelved'] as const;
export type RouteStatus = (typeof ROUTE_STATUSES)[number];

export const ROUTE_STATUS_LABELS: Record<RouteStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  changes_requested: 'Changes requested',
  approved: 'Approved',
  shelved: 'Shelved',
};

export const MAX_TRANSITION_NOTE = 2000;
export const MAX_REVIEWERS = 20;

export const TransitionInput = z.strictObject({
  to: z.enum(ROUTE_STATUSES, { message: `Choose one of ${ROUTE_STATUSES.join(', ')}.` }),
  note: z.string().trim().max(MAX_TRANSITION_NOTE, { message: `A note is at most ${MAX_TRANSITION_NOTE} characters.` }).default(''),
  reviewerIds: z.array(z.number().int().positive()).max(MAX_REVIEWERS, { message: `Name at most ${MAX_REVIEWERS} reviewers.` }).optional(),
  version: z.number().int().positive(),
});
export type TransitionInput = z.infer<typeof TransitionInput>;

// Which fields a move needs beyond the schema; the form and the service share it.
export function transitionFieldErrors(input: Pick<TransitionInput, 'to' | 'note' | 'reviewerIds'>): Record<string, string> {
  const fields: Record<string, string> = {};
  if (input.to === 'changes_requested' && input.note.trim() === '') fields.note = 'Say what needs to change.';
  if (input.to === 'in_review' && (input.reviewerIds ?? []).length === 0) fields.reviewerIds = 'Name at least one reviewer.';
  return fields;
}

export const ListTransitionsQuery = z.object({
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(50),
});
export type ListTransitionsQuery = z.infer<typeof ListTransitionsQuery>;
