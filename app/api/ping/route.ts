// GET /api/ping: a signed-in no-op (session and user only), the baseline the throughput bench sets the evaluate endpoint against
import { withRoute } from '@/lib/api/with-route';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'user' }, async () => ({ ok: true }));
