// GET/PUT/DELETE /api/routes/[routeId]: read a route, save the whole document against its version (409 when stale), or delete it (soft)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SaveRouteInput } from '@/lib/schemas/route';
import { deleteRoute } from '@/lib/services/routes/delete-route';
import { getRoute } from '@/lib/services/routes/get-route';
import { teamOfRoute } from '@/lib/services/routes/route-team';
import { saveRoute } from '@/lib/services/routes/save-route';
import { notifyTransition } from '@/lib/services/workflow/notify-transition';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read' }, async ({ team, params }) =>
  getRoute({ teamId: team.id, routeId: Number(params.routeId) }),
);

export const PUT = withRoute(
  { access: 'team', teamFrom: teamOfRoute, permission: 'route.edit', body: SaveRouteInput, maxBodyBytes: 2 * 1024 * 1024 },
  async ({ team, user, params, body }) => {
    const saved = await saveRoute({ teamId: team.id, userId: user.id, routeId: Number(params.routeId), input: body });
    // Editing an approved route sent it back to draft: tell the owner and reviewers, after the commit.
    if (saved.transition) await notifyTransition(saved.transition);
    return saved;
  },
);

export const DELETE = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.delete' }, async ({ team, user, params }) =>
  deleteRoute({ teamId: team.id, userId: user.id, routeId: Number(params.routeId) }),
);

export const { POST, PATCH, OPTIONS } = refuseOtherMethods({ GET, PUT, DELETE });
