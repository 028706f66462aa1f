// POST /api/species/impact: which of the team's routes would change their ΔG if this species were saved (writes nothing)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SpeciesImpactRequest } from '@/lib/schemas/species';
import { previewSpeciesChange } from '@/lib/services/species/preview-species-change';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'team', permission: 'species.edit', body: SpeciesImpactRequest }, async ({ team, body }) =>
  previewSpeciesChange({ teamId: team.id, input: body.species, teamSpeciesId: body.teamSpeciesId, smiles: body.smiles }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
