// POST /api/routes/[routeId]/revisions/[revisionId]/restore: save an old revision as the current document (409 when stale)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { RestoreRevisionInput } from '@/lib/schemas/revision';
import { positiveId } from '@/lib/services/revisions/path-id';
import { restoreRevision } from '@/lib/services/revisions/restore-revision';
import { teamOfRoute } from '@/lib/services/routes/route-team';
import { notifyTransition } from '@/lib/services/workflow/notify-transition';

export const runtime = 'nodejs';

export const POST = withRoute(
  { access: 'team', teamFrom: teamOfRoute, permission: 'route.edit', body: RestoreRevisionInput },
  async ({ team, user, params, body }) => {
    const saved = await restoreRevision({ teamId: team.id, userId: user.id, routeId: Number(params.routeId), revisionId: positiveId(params.revisionId), version: body.version });
    // Restoring into an approved route sends it back to draft, like any other edit.
    if (saved.transition) await notifyTransition(saved.transition);
    return saved;
  },
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
