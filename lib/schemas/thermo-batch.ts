import { z } from 'zod';
import { EvaluateRequestSchema } from './evaluate';
import { FitRequestSchema } from './fit';

export const MAX_BATCH = 200;

// A single request answers with one result; an array answers with an array, an error object in place of each failure.
export const EvaluateBody = z.union([EvaluateRequestSchema, z.array(z.unknown()).min(1).max(MAX_BATCH)]);
export const FitBody = z.union([FitRequestSchema, z.array(z.unknown()).min(1).max(MAX_BATCH)]);
