// DELETE /api/drivers/[driverId]: remove a driver reaction from the team's list
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { deleteDriver } from '@/lib/services/drivers/delete-driver';

export const runtime = 'nodejs';

export const DELETE = withRoute({ access: 'team', permission: 'route.edit' }, async ({ team, user, params }) =>
  deleteDriver({ teamId: team.id, userId: user.id, driverId: Number(params.driverId) || 0 }),
);

export const { GET, POST, PUT, PATCH, OPTIONS } = refuseOtherMethods({ DELETE });
