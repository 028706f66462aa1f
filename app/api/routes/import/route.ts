// POST /api/routes/import: a route JSON file (the CLI's route request, optionally with a `stepwell` header) becomes a new route of the caller's team
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { RouteImportInput } from '@/lib/schemas/route-transfer';
import { importRoute } from '@/lib/services/routes/import-route';

export const runtime = 'nodejs';

export const POST = withRoute(
  { access: 'team', permission: 'route.edit', body: RouteImportInput, maxBodyBytes: 2 * 1024 * 1024 },
  async ({ team, user, body }) => Response.json(await importRoute({ teamId: team.id, userId: user.id, input: body }), { status: 201 }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
