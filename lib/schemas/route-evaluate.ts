// Request schema for evaluating a multi-step route; the step fields are those of one evaluate request.
import { z } from 'zod';
import { EvaluateRequestSchema, SpeciesDefinitions } from './evaluate';
import { QuantityString, SpeciesName } from './quantity';

export const StepId = z.string().min(1).max(64);

export const RouteStepSchema = z.strictObject({
  ...EvaluateRequestSchema.shape,
  id: StepId,
  /** fraction of the step's extent that ends up as product; default 1 */
  yield: z.number().finite().gt(0).max(1).optional(),
});

export const RouteLinkSchema = z.strictObject({
  from: StepId,
  to: StepId,
  species: SpeciesName,
});

export const RouteEvaluateRequestSchema = z.strictObject({
  target: SpeciesName,
  /** default "1 mol"; every energy in the response is for this amount */
  targetAmount: QuantityString.optional(),
  // The step count limit lives in the engine (RouteTooLargeError), so the API can answer 413.
  steps: z.array(RouteStepSchema).min(1),
  links: z.array(RouteLinkSchema).optional(),
  /** labels for the whole route (target, links and every step); a step's own map sits over it */
  species: SpeciesDefinitions.optional(),
  /** default −17 kJ/mol (≈ K = 10^3 at 298 K, common practice) */
  marginalThreshold_kJ: z.number().finite().max(0).optional(),
  /** ignored by the engine: the board's name, positions and notes in an exported route file (lib/schemas/route-transfer.ts) */
  stepwell: z.unknown().optional(),
});

export type RouteStep = z.infer<typeof RouteStepSchema>;
export type RouteLink = z.infer<typeof RouteLinkSchema>;
export type RouteEvaluateRequest = z.infer<typeof RouteEvaluateRequestSchema>;
