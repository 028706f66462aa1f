import 'server-only';
import { EvaluateRequestSchema, type EvaluateRequest } from '../../schemas/evaluate';
import { FitRequestSchema, type FitRequest } from '../../schemas/fit';
import { runItem } from '../../thermo/batch';
import { evaluateStep } from '../../thermo/evaluate';
import { runFit } from '../../thermo/fit-request';
import { teamLookup } from '../species/team-lookup';

// Single request: errors propagate to the wrapper (400); arrays: one entry per item. The team's own species apply.
export async function evaluateBatch(body: EvaluateRequest | unknown[], { teamId }: { teamId: number }) {
  const lookup = await teamLookup(teamId);
  return Array.isArray(body) ? body.map((item) => runItem(EvaluateRequestSchema, (r) => evaluateStep(r, { lookup }), item)) : evaluateStep(body, { lookup });
}

export function fitBatch(body: FitRequest | unknown[]) {
  return Array.isArray(body) ? body.map((item) => runItem(FitRequestSchema, (r) => runFit(r), item)) : runFit(body);
}
