// POST /api/teams/[teamId]/import: a lead loads a team file into an empty team, all in one transaction (409 when the team has data)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { TeamExportFile } from '@/lib/schemas/team-transfer';
import { importTeam } from '@/lib/services/team-transfer/import-team';

export const runtime = 'nodejs';

// A team file is larger than an ordinary request.
const MAX_TEAM_FILE_BYTES = 50 * 1024 * 1024;

export const POST = withRoute(
  { access: 'team', teamFrom: 'path', permission: 'team.manage', body: TeamExportFile, maxBodyBytes: MAX_TEAM_FILE_BYTES },
  async ({ team, user, body }) => {
    const result = await importTeam({ teamId: team.id, importerId: user.id, file: body });
    return Response.json(result, { status: 201 });
  },
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
