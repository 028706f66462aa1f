// GET/POST /api/fits/data-sets: the team's K(T) data sets; create one from CSV, pasted text or the grid
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { DataSetInput } from '@/lib/schemas/fit-data';
import { createDataSet } from '@/lib/services/fits/create-data-set';
import { listDataSets } from '@/lib/services/fits/read-data-set';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team }) => ({ dataSets: await listDataSets({ teamId: team.id }) }));

export const POST = withRoute({ access: 'team', permission: 'fit.edit', body: DataSetInput }, async ({ team, user, body }) =>
  Response.json(await createDataSet({ teamId: team.id, userId: user.id, input: body }), { status: 201 }),
);

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });
