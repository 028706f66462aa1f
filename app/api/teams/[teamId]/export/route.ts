// GET /api/teams/[teamId]/export: a lead downloads the whole team (routes with steps and links, revisions, review, decisions, drivers, species, fits) as one JSON file
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { exportTeam } from '@/lib/services/team-transfer/export-team';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: 'path', permission: 'team.manage' }, async ({ team }) => {
  const file = await exportTeam({ teamId: team.id });
  const day = file.exportedAt.slice(0, 10);
  return new Response(JSON.stringify(file), {
    headers: {
      'content-type': 'application/json; charset=utf-8',
      'content-disposition': `attachment; filename="stepwell-team-${team.id}-${day}.json"`,
      'cache-control': 'no-store',
    },
  });
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
