// Request schema for a van 't Hoff fit of ln K against 1/T.
import { z } from 'zod';
import { QuantityString } from './quantity';

export const FitPointSchema = z
  .strictObject({
    temperature: QuantityString,
    K: z.number().finite().optional(),
    lnK: z.number().finite().optional(),
    log10K: z.number().finite().optional(),
    sigma_lnK: z.number().finite().positive().optional(),
  })
  .refine((p) => [p.K, p.lnK, p.log10K].filter((v) => v !== undefined).length === 1, {
    message: 'give exactly one of K, lnK, log10K',
  });

export const FitRequestSchema = z.strictObject({
  points: z.array(FitPointSchema).max(500),
  /** temperatures at which to report K from the fitted ΔH°, ΔS° */
  predictAt: z.array(QuantityString).max(100).optional(),
});

export type FitRequest = z.infer<typeof FitRequestSchema>;
export type FitPointInput = z.infer<typeof FitPointSchema>;
