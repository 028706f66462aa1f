// GET /api/species/search: the step editor's species typeahead.
import { z } from 'zod';
import { MAX_QUERY_LENGTH } from '../thermo/structure/species-search-limits';

export const SPECIES_SEARCH_DEFAULT_LIMIT = 12;
export const SPECIES_SEARCH_MAX_LIMIT = 50;

export const SpeciesSearchQuery = z.strictObject({
  q: z
    .string()
    .trim()
    .min(1, { message: 'Type a name, formula, CAS number or InChIKey.' })
    .max(MAX_QUERY_LENGTH, { message: `At most ${MAX_QUERY_LENGTH} characters.` }),
  limit: z.coerce
    .number({ error: 'The limit is a whole number.' })
    .int({ message: 'The limit is a whole number.' })
    .min(1, { message: 'The limit is at least 1.' })
    .max(SPECIES_SEARCH_MAX_LIMIT, { message: `The limit is at most ${SPECIES_SEARCH_MAX_LIMIT}.` })
    .default(SPECIES_SEARCH_DEFAULT_LIMIT),
});
export type SpeciesSearchQuery = z.infer<typeof SpeciesSearchQuery>;
