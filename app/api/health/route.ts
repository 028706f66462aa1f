// GET /api/health: liveness and database reachability for load balancers and tests
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { getDb } from '@/db';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'public' }, async () => {
  await getDb().sequelize.query('SELECT 1');
  return { ok: true };
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
