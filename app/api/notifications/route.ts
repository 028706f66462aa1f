// GET /api/notifications: the caller's own notifications, newest first, a capped page plus the unread count
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { ListNotificationsQuery } from '@/lib/schemas/notification';
import { listNotifications } from '@/lib/services/notifications/list-notifications';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'user', query: ListNotificationsQuery }, async ({ user, query }) => listNotifications({ userId: user.id, query }));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
