import { z } from 'zod';

export const NOTIFICATION_KINDS = ['review_request', 'mention', 'status_change', 'comment_on_owned_route'] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const NOTIFICATION_KIND_LABELS: Record<NotificationKind, string> = {
  review_request: 'Someone asks me to review a route',
  mention: 'Someone mentions me in a comment',
  status_change: 'A route I own or review changes status',
  comment_on_owned_route: 'Someone comments on a route I own',
};

export const NOTIFICATION_PAGE_MAX = 50;

export const ListNotificationsQuery = z.object({
  limit: z.coerce.number().int().min(1).max(NOTIFICATION_PAGE_MAX).default(20),
  /** Keyset paging: only notifications with a smaller id than this. */
  before: z.coerce.number().int().positive().optional(),
  unread: z.enum(['0', '1']).default('0'),
});
export type ListNotificationsQuery = z.infer<typeof ListNotificationsQuery>;

export const MarkReadInput = z
  .strictObject({
    ids: z.array(z.number().int().positive()).min(1, { message: 'Name at least one notification.' }).max(200).optional(),
    all: z.literal(true).optional(),
  })
  .refine((v) => (v.ids === undefined) !== (v.all === undefined), { message: 'Send either ids or all: true.', path: ['ids'] });
export type MarkReadInput = z.infer<typeof MarkReadInput>;

/** One boolean per kind; true stops the e-mail (the in-app notification still appears). */
export const NotificationMutes = z.strictObject({
  review_request: z.boolean(),
  mention: z.boolean(),
  status_change: z.boolean(),
  comment_on_owned_route: z.boolean(),
});
export type NotificationMutes = z.infer<typeof NotificationMutes>;

export interface NotificationDto {
  id: number;
  teamId: number;
  kind: NotificationKind;
  routeId: number | null;
  stepKey: string | null;
  actor: { id: number; name: string } | null;
  title: string;
  text: string;
  link: string;
  isRead: boolean;
  createdAt: string;
}

export interface NotificationPageDto {
  items: NotificationDto[];
  unreadCount: number;
  /** Pass as `before` for the next page; null when there is none. */
  nextBefore: number | null;
}
