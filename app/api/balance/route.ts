// POST /api/balance: the editor's live balance check against the team's lookup, and the smallest-integer balanced form
import { z } from 'zod';
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { SpeciesDefinitions } from '@/lib/schemas/evaluate';
import { teamLookup } from '@/lib/services/species/team-lookup';
import { checkEquationBalance } from '@/lib/services/thermo/check-equation-balance';

export const runtime = 'nodejs';

const BalanceInput = z.strictObject({ equation: z.string().trim().min(1).max(500), species: SpeciesDefinitions.optional() });

export const POST = withRoute({ access: 'team', permission: 'route.read', body: BalanceInput }, async ({ body, team }) => checkEquationBalance(body.equation, await teamLookup(team.id), body.species));

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
