// Recording which route the group goes on with, and reading the decision log.
import { z } from 'zod';
import { CompareRouteIds, WhatIf } from './compare';

export const MAX_RATIONALE = 5000;

export const DecisionInput = z
  .strictObject({
    routeIds: CompareRouteIds,
    chosenRouteId: z.number({ message: 'Choose the route to go on with.' }).int().positive({ message: 'Choose the route to go on with.' }),
    rationale: z
      .string({ message: 'Say why this route was chosen.' })
      .trim()
      .min(1, { message: 'Say why this route was chosen.' })
      .max(MAX_RATIONALE, { message: `A rationale is at most ${MAX_RATIONALE.toLocaleString('en')} characters.` }),
    /** shelve every compared route but the chosen one (routes already shelved stay so) */
    shelveOthers: z.boolean().default(false),
    whatIf: WhatIf.optional(),
  })
  .refine((d) => d.routeIds.includes(d.chosenRouteId), { message: 'The chosen route must be one of the compared routes.', path: ['chosenRouteId'] });
export type DecisionInput = z.infer<typeof DecisionInput>;

export const ListDecisionsQuery = z.object({
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type ListDecisionsQuery = z.infer<typeof ListDecisionsQuery>;
