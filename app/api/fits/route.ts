// GET/POST /api/fits: the team's saved van 't Hoff fits; save a fit of a data set with its raw data
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SaveFitInput } from '@/lib/schemas/fit-data';
import { listFits } from '@/lib/services/fits/read-fits';
import { saveFit } from '@/lib/services/fits/save-fit';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team }) => ({ fits: await listFits({ teamId: team.id }) }));

export const POST = withRoute({ access: 'team', permission: 'fit.edit', body: SaveFitInput }, async ({ team, user, body }) =>
  Response.json(await saveFit({ teamId: team.id, userId: user.id, input: body }), { status: 201 }),
);

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });
