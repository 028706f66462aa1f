// POST /api/species/team: a team species from a pasted structure (SMILES or molfile), as the estimate, entered values or a saved fit
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { TeamSpeciesFromStructure } from '@/lib/schemas/species-structure';
import { createSpeciesFromStructure } from '@/lib/services/species/create-species-from-structure';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'team', permission: 'species.edit', body: TeamSpeciesFromStructure }, async ({ team, user, body }) =>
  Response.json(await createSpeciesFromStructure({ teamId: team.id, userId: user.id, input: body }), { status: 201 }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
