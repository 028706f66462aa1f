// GET/POST /api/drivers: the team's driver reactions offered for coupling
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { DriverInput } from '@/lib/schemas/driver';
import { createDriver } from '@/lib/services/drivers/create-driver';
import { listDrivers } from '@/lib/services/drivers/list-drivers';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'route.read' }, async ({ team }) => ({ drivers: await listDrivers({ teamId: team.id }) }));

export const POST = withRoute({ access: 'team', permission: 'route.edit', body: DriverInput }, async ({ team, user, body }) =>
  Response.json(await createDriver({ teamId: team.id, userId: user.id, input: body }), { status: 201 }),
);

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });
