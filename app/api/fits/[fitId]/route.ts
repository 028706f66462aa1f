// GET /api/fits/[fitId]: one saved fit with its raw data and the plot recomputed from it
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { getFit } from '@/lib/services/fits/read-fits';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team, params }) => getFit({ teamId: team.id, fitId: Number(params.fitId) || 0 }));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
