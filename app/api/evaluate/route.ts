// POST /api/evaluate: ΔG°, ΔG at conditions, K and equilibrium for one reaction step (or an array of them)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { EvaluateBody } from '@/lib/schemas/thermo-batch';
import { evaluateBatch } from '@/lib/services/thermo/evaluate-batch';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'team', permission: 'thermo.evaluate', body: EvaluateBody }, async ({ body, team }) => evaluateBatch(body, { teamId: team.id }));

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });
