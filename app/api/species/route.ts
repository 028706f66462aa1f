// GET/POST /api/species: the library and the team's species (search, phase and origin filters, pages); add a team species
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SpeciesListQuery, TeamSpeciesInput } from '@/lib/schemas/species';
import { createTeamSpecies } from '@/lib/services/species/create-team-species';
import { listSpecies } from '@/lib/services/species/list-species';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read', query: SpeciesListQuery }, async ({ team, query }) => listSpecies({ teamId: team.id, query }));

export const POST = withRoute({ access: 'team', permission: 'species.edit', body: TeamSpeciesInput }, async ({ team, user, body }) =>
  Response.json(await createTeamSpecies({ teamId: team.id, userId: user.id, input: body }), { status: 201 }),
);

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });
