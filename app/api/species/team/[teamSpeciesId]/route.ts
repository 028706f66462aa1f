// GET/PUT/DELETE /api/species/team/[teamSpeciesId]: one team species as entered; save an edit (the answer lists routes whose ΔG changed); delete one no route uses
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { TeamSpeciesUpdate } from '@/lib/schemas/species';
import { TeamSpeciesDelete } from '@/lib/schemas/species-structure';
import { deleteTeamSpecies } from '@/lib/services/species/delete-team-species';
import { getTeamSpecies } from '@/lib/services/species/get-team-species';
import { updateTeamSpecies } from '@/lib/services/species/update-team-species';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'team.read' }, async ({ team, params }) =>
  getTeamSpecies({ teamId: team.id, id: Number(params.teamSpeciesId) || 0 }),
);

export const PUT = withRoute({ access: 'team', permission: 'species.edit', body: TeamSpeciesUpdate }, async ({ team, user, params, body }) =>
  updateTeamSpecies({ teamId: team.id, userId: user.id, id: Number(params.teamSpeciesId) || 0, version: body.version, input: body.species, smiles: body.smiles }),
);

// The version goes in the query (?version=3): a DELETE carries no body.
export const DELETE = withRoute({ access: 'team', permission: 'species.edit', query: TeamSpeciesDelete }, async ({ team, user, params, query }) =>
  deleteTeamSpecies({ teamId: team.id, userId: user.id, id: Number(params.teamSpeciesId) || 0, version: query.version }),
);

export const { POST, PATCH, OPTIONS } = refuseOtherMethods({ GET, PUT, DELETE });
