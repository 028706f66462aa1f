import { z } from 'zod';
import { DEFAULT_MARGINAL_THRESHOLD_KJ, MAX_ROUTE_LINKS, MAX_ROUTE_STEPS, MIN_YIELD_FRACTION } from '../thermo/route/route-limits';
import { SpeciesDefinitions } from './evaluate';
import { PositiveFinite, QuantityString, SpeciesName, isReservedKey, speciesMap } from './quantity';

export { ROUTE_STATUSES } from './workflow';

const Quantity = z.union([QuantityString, z.literal('')]);
export const StepKey = z
  .string()
  .regex(/^[A-Za-z0-9_-]{1,64}$/, { message: 'Use letters, digits, - or _ (at most 64).' })
  .refine((key) => !isReservedKey(key), { message: 'This id is reserved; choose another.' });

// A step as the editor saves it: every field of an evaluate request, plus yield, position and notes.
// The equation may be blank or unfinished while someone is still typing; evaluation reports it per step.
export const StepInput = z.strictObject({
  id: StepKey,
  equation: z.string().max(500),
  temperature: Quantity.optional(),
  standardPressure: z.enum(['1 bar', '1 atm']).optional(),
  heatCapacity: z.boolean().optional(),
  pressures: speciesMap(QuantityString).optional(),
  concentrations: speciesMap(QuantityString).optional(),
  initial: speciesMap(QuantityString).optional(),
  /** labels in the equation bound to a structure, name or key (lib/thermo/README.md, "Species by structure") */
  species: SpeciesDefinitions.optional(),
  totalPressure: Quantity.optional(),
  electrons: PositiveFinite.max(1000).optional(),
  /** a saved fit of the team whose ΔH° and ΔS° this step uses instead of the library */
  fitId: z.number().int().positive().nullable().optional(),
  yieldPct: z.number().min(MIN_YIELD_FRACTION * 100, { message: 'Yield is at least 0.0001 %.' }).max(100, { message: 'Yield is at most 100 %.' }).default(100),
  notes: z.string().max(4000).default(''),
  position: z.strictObject({ x: z.number().finite(), y: z.number().finite() }).default({ x: 0, y: 0 }),
});
export type StepInput = z.infer<typeof StepInput>;

export const LinkInput = z.strictObject({ from: StepKey, to: StepKey, species: SpeciesName });
export type LinkInput = z.infer<typeof LinkInput>;

export const RouteMeta = z.strictObject({
  name: z.string().trim().min(1, { message: 'Name the route.' }).max(160),
  target: z.string().trim().min(1, { message: 'Name the target species, e.g. CH3OH(g).' }).max(120),
  targetAmount: QuantityString.default('1 mol'),
  marginalThreshold_kJ: z.number().finite().max(0, { message: 'The threshold is zero or negative.' }).min(-500).default(DEFAULT_MARGINAL_THRESHOLD_KJ),
});

// An amount of substance as people type it for a new route; checked as they type, so "lots" is refused at the field.
const AMOUNT = /^\s*(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?\s*(?:mol|mmol|kmol|µmol|umol|Mmol)\s*$/i;
export const TargetAmountText = QuantityString.refine((text) => AMOUNT.test(text) && Number.parseFloat(text) > 0, {
  message: 'Write an amount of substance above 0 with its unit, e.g. 1 mol, 500 mmol or 2 kmol.',
});

export const CreateRouteInput = RouteMeta.pick({ name: true, target: true }).extend({ targetAmount: TargetAmountText.default('1 mol') });
export type CreateRouteInput = z.infer<typeof CreateRouteInput>;

export const SaveRouteInput = RouteMeta.extend({
  version: z.number().int().positive(),
  steps: z.array(StepInput).max(MAX_ROUTE_STEPS, { message: `A route has at most ${MAX_ROUTE_STEPS} steps.` }),
  links: z.array(LinkInput).max(MAX_ROUTE_LINKS),
});
export type SaveRouteInput = z.infer<typeof SaveRouteInput>;

export const DuplicateRouteInput = z.strictObject({ name: z.string().trim().min(1).max(160).optional() });

export const ROUTE_SORTS = ['name', 'target', 'updatedAt', 'steps', 'overallDeltaG', 'uphillSteps'] as const;
export const ListRoutesQuery = z.object({
  q: z.string().trim().max(120).optional(),
  sort: z.enum(ROUTE_SORTS).default('updatedAt'),
  dir: z.enum(['asc', 'desc']).default('desc'),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
  archived: z.enum(['0', '1']).default('0'),
  // Recently deleted routes instead (leads only).
  deleted: z.enum(['0', '1']).optional(),
});
export type ListRoutesQuery = z.infer<typeof ListRoutesQuery>;

// Evaluate the saved route (empty body), or an unsaved draft of it.
export const RouteDraft = RouteMeta.extend({ steps: SaveRouteInput.shape.steps, links: SaveRouteInput.shape.links });
export const RouteDraftBody = RouteDraft.optional();
export type RouteDraft = z.infer<typeof RouteDraft>;

/** How long a lead can bring a deleted route back; shared by the service and the pages. */
export const UNDELETE_WINDOW_DAYS = 30;
