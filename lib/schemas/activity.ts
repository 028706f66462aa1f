import { z } from 'zod';
import type { FlagCategory } from './flag';
import type { RouteStatus } from './workflow';

export const ACTIVITY_KINDS = ['revision', 'transition', 'comment', 'thread_resolved', 'thread_reopened', 'flag_raised', 'flag_cleared'] as const;
export type ActivityKind = (typeof ACTIVITY_KINDS)[number];

export const ACTIVITY_PAGE_MAX = 100;
export const ACTIVITY_PAGE_DEFAULT = 50;

/**
 * Where a page starts, newest first: items strictly older than this place in the list order.
 * A bare time has no kind: it lets through only items before that moment.
 */
export interface ActivityPosition {
  at: number;
  kind: ActivityKind | null;
  seq: number;
}

const isKind = (value: string): value is ActivityKind => (ACTIVITY_KINDS as readonly string[]).includes(value);

/** The `nextBefore` of a page: "<ISO time>~<kind>~<row id>" (URL-safe once encoded as a query value). */
export function encodeActivityCursor(position: { at: number; kind: ActivityKind; seq: number }): string {
  return `${new Date(position.at).toISOString()}~${position.kind}~${position.seq}`;
}

const ISO_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,3})?)?(Z|[+-]\d{2}:\d{2})$/;

/** A cursor from a previous page, or an ISO time with its zone; null when it is neither. */
export function decodeActivityBefore(raw: string): ActivityPosition | null {
  if (ISO_TIME.test(raw)) {
    const at = Date.parse(raw);
    return Number.isFinite(at) ? { at, kind: null, seq: 0 } : null;
  }
  if (raw.length > 200) return null;
  const [iso, kind, seq, ...rest] = raw.split('~');
  if (rest.length > 0 || !iso || !kind || !seq || !ISO_TIME.test(iso) || !isKind(kind) || !/^\d{1,12}$/.test(seq)) return null;
  const at = Date.parse(iso);
  return Number.isFinite(at) ? { at, kind, seq: Number(seq) } : null;
}

export const ListActivityQuery = z.object({
  before: z
    .string()
    .trim()
    .optional()
    .transform((raw, ctx) => {
      if (raw === undefined || raw === '') return undefined;
      const position = decodeActivityBefore(raw);
      if (!position) {
        ctx.addIssue({ code: 'custom', message: 'Give an ISO time with its zone (2026-12-02T09:00:00Z) or the nextBefore of a previous page.' });
        return z.NEVER;
      }
      return position;
    }),
  limit: z.coerce
    .number({ message: `Give a number from 1 to ${ACTIVITY_PAGE_MAX}.` })
    .int({ message: `Give a number from 1 to ${ACTIVITY_PAGE_MAX}.` })
    .min(1, { message: `Give a number from 1 to ${ACTIVITY_PAGE_MAX}.` })
    .max(ACTIVITY_PAGE_MAX, { message: `At most ${ACTIVITY_PAGE_MAX} items a page.` })
    .default(ACTIVITY_PAGE_DEFAULT),
});
export type ListActivityQuery = z.infer<typeof ListActivityQuery>;

export type ActivityPerson = { id: number; name: string } | null;

interface ActivityBase<K extends ActivityKind> {
  kind: K;
  /** unique in the feed, for list keys: "<kind>:<row id>" */
  id: string;
  at: string;
  /** null when the account is gone */
  actor: ActivityPerson;
  stepKey: string | null;
  /** one line for the feed: the summary, note, comment excerpt or flag reason */
  text: string;
}

export interface RevisionActivity extends ActivityBase<'revision'> {
  revisionId: number;
  version: number;
  summary: string;
  restoredFromId: number | null;
}

export interface TransitionActivity extends ActivityBase<'transition'> {
  transitionId: number;
  from: RouteStatus;
  to: RouteStatus;
  note: string;
  reviewers: { id: number; name: string }[];
}

export interface CommentActivity extends ActivityBase<'comment'> {
  commentId: number;
  /** the thread's first comment (the comment itself for a thread start) */
  threadId: number;
  isReply: boolean;
  isEdited: boolean;
  /** the text is withheld once deleted */
  isDeleted: boolean;
}

export interface ThreadActivity extends ActivityBase<'thread_resolved' | 'thread_reopened'> {
  threadId: number;
}

export interface FlagActivity extends ActivityBase<'flag_raised' | 'flag_cleared'> {
  flagId: number;
  category: FlagCategory;
  reason: string;
  /** the comment written when the flag was cleared */
  clearCommentId: number | null;
}

export type ActivityItem = RevisionActivity | TransitionActivity | CommentActivity | ThreadActivity | FlagActivity;

export interface ActivityPageDto {
  items: ActivityItem[];
  /** Pass as `before` for the next (older) page; null when there is none. */
  nextBefore: string | null;
}
