// POST /api/fits/[fitId]/species: create a team species solved from the fit, with provenance pointing back to it
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SpeciesFromFitInput } from '@/lib/schemas/fit-data';
import { createSpeciesFromFit } from '@/lib/services/fits/species-from-fit';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'team', permission: 'species.edit', body: SpeciesFromFitInput }, async ({ team, user, params, body }) =>
  Response.json(await createSpeciesFromFit({ teamId: team.id, userId: user.id, fitId: Number(params.fitId) || 0, input: body }), { status: 201 }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
