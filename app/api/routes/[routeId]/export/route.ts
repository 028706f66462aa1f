// GET /api/routes/[routeId]/export: the route as JSON in the CLI's route request format, with a `stepwell` header for the board
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { exportRoute } from '@/lib/services/routes/export-route';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read' }, async ({ team, params }) => {
  const { file, filename } = await exportRoute({ teamId: team.id, routeId: Number(params.routeId) });
  return new Response(`${JSON.stringify(file, null, 2)}\n`, {
    headers: { 'content-type': 'application/json; charset=utf-8', 'content-disposition': `attachment; filename="${filename}"` },
  });
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
