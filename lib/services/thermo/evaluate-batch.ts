import 'server-only';
import { EvaluateRequestSchema, type EvaluateRequest } from '../../schemas/evaluate';
import { FitRequestSchema, type FitRequest } from '../../schemas/fit';
import { runItem } from '../../thermo/batch';
import { evaluateStep } from '../../thermo/evaluate';
import { runFit } from '../../thermo/fit-request';

// Single request: errors propagate to the wrapper (400); arrays: one entry per item.
export function evaluateBatch(body: EvaluateRequest | unknown[]) {
  return Array.isArray(body) ? body.map((item) => runItem(EvaluateRequestSchema, (r) => evaluateStep(r), item)) : evaluateStep(body);
}

export function fitBatch(body: FitRequest | unknown[]) {
  return Array.isArray(body) ? body.map((item) => runItem(FitRequestSchema, (r) => runFit(r), item)) : runFit(body);
}
