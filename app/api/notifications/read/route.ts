// POST /api/notifications/read: mark the caller's notifications read, by { ids } or { all: true }
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { MarkReadInput } from '@/lib/schemas/notification';
import { markNotificationsRead } from '@/lib/services/notifications/mark-notifications-read';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'user', body: MarkReadInput }, async ({ user, body }) => markNotificationsRead({ userId: user.id, input: body }));

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
