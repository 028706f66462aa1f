// Comparing 2–4 routes of the team, with one what-if applied to every step of every route.
import { z } from 'zod';

export const MIN_COMPARE = 2;
export const MAX_COMPARE = 4;
export const MAX_TEMPERATURE_OFFSET_K = 300;

export const WhatIf = z.strictObject({
  temperatureOffset_K: z
    .number({ message: 'The temperature offset is a number of kelvin.' })
    .finite()
    .min(-MAX_TEMPERATURE_OFFSET_K, { message: `The temperature offset is at least −${MAX_TEMPERATURE_OFFSET_K} K.` })
    .max(MAX_TEMPERATURE_OFFSET_K, { message: `The temperature offset is at most +${MAX_TEMPERATURE_OFFSET_K} K.` })
    .optional(),
  standardPressure: z.enum(['1 bar', '1 atm'], { message: 'The standard pressure is "1 bar" or "1 atm".' }).optional(),
});
export type WhatIf = z.infer<typeof WhatIf>;

/** 2–4 distinct positive route ids; the messages are the ones the compare page shows. */
export const CompareRouteIds = z
  .array(z.number({ message: 'Route ids are whole numbers.' }).int({ message: 'Route ids are whole numbers.' }).positive({ message: 'Route ids are whole numbers.' }), {
    message: 'Name the routes to compare.',
  })
  .min(MIN_COMPARE, { message: `Choose at least ${MIN_COMPARE} routes to compare.` })
  .max(MAX_COMPARE, { message: `Compare at most ${MAX_COMPARE} routes at once.` })
  .refine((ids) => new Set(ids).size === ids.length, { message: 'Each route can be compared only once.' });

// "1,2,3" in the query string (the page URL carries the same list).
const IdList = z
  .string({ message: 'Name the routes to compare, e.g. ids=12,15.' })
  .transform((text) => (text.trim() === '' ? [] : text.split(',').map((part) => (/^\s*\d+\s*$/.test(part) ? Number(part) : Number.NaN))))
  .pipe(CompareRouteIds);

const OffsetParam = z
  .string()
  .trim()
  .regex(/^[+-]?(\d+(\.\d*)?|\.\d+)$/, { message: 'The temperature offset is a number of kelvin, e.g. 50 or -25.' })
  .transform(Number)
  .pipe(WhatIf.shape.temperatureOffset_K.unwrap());

export const CompareQuery = z
  .object({ ids: IdList, temperatureOffset_K: OffsetParam.optional(), standardPressure: WhatIf.shape.standardPressure })
  .transform(({ ids, temperatureOffset_K, standardPressure }) => ({
    ids,
    whatIf: { ...(temperatureOffset_K !== undefined ? { temperatureOffset_K } : {}), ...(standardPressure ? { standardPressure } : {}) },
  }));
export type CompareQuery = z.infer<typeof CompareQuery>;
