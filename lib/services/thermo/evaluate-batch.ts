import 'server-only';
import type { z } from 'zod';
import { EvaluateRequestSchema, type EvaluateRequest } from '../../schemas/evaluate';
import { FitRequestSchema, type FitRequest } from '../../schemas/fit';
import { evaluateStep } from '../../thermo/evaluate';
import { runFit } from '../../thermo/fit-request';
import { itemError, type ItemError } from './item-error';

function each<Req, Res>(schema: z.ZodType<Req>, run: (req: Req) => Res) {
  return (items: unknown[]): Array<Res | ItemError> =>
    items.map((item) => {
      try {
        return run(schema.parse(item));
      } catch (error) {
        return itemError(error);
      }
    });
}

const evaluateEach = each(EvaluateRequestSchema, (r: EvaluateRequest) => evaluateStep(r));
const fitEach = each(FitRequestSchema, (r: FitRequest) => runFit(r));

// Single request: errors propagate to the wrapper (400); arrays: one entry per item.
export function evaluateBatch(body: EvaluateRequest | unknown[]) {
  return Array.isArray(body) ? evaluateEach(body) : evaluateStep(body);
}

export function fitBatch(body: FitRequest | unknown[]) {
  return Array.isArray(body) ? fitEach(body) : runFit(body);
}
