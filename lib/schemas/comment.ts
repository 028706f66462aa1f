import { z } from 'zod';
import { StepKey } from './route';

export const COMMENT_MAX_CHARS = 10_000;

export const CommentBody = z
  .string({ message: 'Write a comment.' })
  .trim()
  .min(1, { message: 'Write a comment.' })
  .max(COMMENT_MAX_CHARS, { message: `A comment is at most ${COMMENT_MAX_CHARS.toLocaleString('en')} characters.` });

// A thread root names its step (or none, for the whole route); a reply names its root and takes the root's step.
export const CreateCommentInput = z.strictObject({
  body: CommentBody,
  stepKey: StepKey.nullish(),
  parentId: z.number().int().positive().nullish(),
});
export type CreateCommentInput = z.infer<typeof CreateCommentInput>;

export const EditCommentInput = z.strictObject({ body: CommentBody });
export type EditCommentInput = z.infer<typeof EditCommentInput>;

export const ResolveThreadInput = z.strictObject({ resolved: z.boolean() });
export type ResolveThreadInput = z.infer<typeof ResolveThreadInput>;

export const ListCommentsQuery = z.object({ stepKey: StepKey.optional() });
export type ListCommentsQuery = z.infer<typeof ListCommentsQuery>;

export interface MentionDto {
  userId: number;
  handle: string;
  name: string;
}

export interface CommentDto {
  id: number;
  routeId: number;
  stepKey: string | null;
  parentId: number | null;
  author: { id: number; name: string } | null;
  /** Empty once deleted; the UI shows "comment deleted" in its place. */
  body: string;
  mentions: MentionDto[];
  routeVersion: number;
  /** Written on an earlier version: the step's fields (or, for a route comment, the route) changed since. */
  outdated: boolean;
  isDeleted: boolean;
  editedAt: string | null;
  createdAt: string;
}

export interface ThreadDto {
  root: CommentDto;
  replies: CommentDto[];
  resolved: boolean;
  resolvedAt: string | null;
  resolvedBy: { id: number; name: string } | null;
}

export interface CommentListDto {
  threads: ThreadDto[];
  /** Comments (roots and replies, not deleted) in unresolved threads, per step key: for node badges. */
  unresolvedByStep: Record<string, number>;
  /** The same count for threads on the route as a whole. */
  unresolvedOnRoute: number;
}
