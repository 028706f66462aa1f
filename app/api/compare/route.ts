// GET /api/compare?ids=1,2[,3,4][&temperatureOffset_K=50][&standardPressure=1 atm]: 2–4 of the team's routes side by side, re-evaluated under one what-if, never saved
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { CompareQuery } from '@/lib/schemas/compare';
import { compareRoutes } from '@/lib/services/compare/compare-routes';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'route.read', query: CompareQuery }, async ({ team, query }) =>
  compareRoutes({ teamId: team.id, ids: query.ids, whatIf: query.whatIf }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
