// GET /api/teams/[teamId]/members: everyone in the team with their role
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { listMembers } from '@/lib/services/teams/list-members';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: 'path', permission: 'team.read' }, async ({ team }) => ({
  members: await listMembers({ teamId: team.id }),
}));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });
