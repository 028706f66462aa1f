// GET /api/invitations/[token]: what an invitation link offers, and whether it is still usable
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { viewInvitation } from '@/lib/services/invitations/find-invitation';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'public' }, async ({ params }) => viewInvitation({ token: params.token ?? '' }));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
