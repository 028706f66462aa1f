// Route JSON for moving a route between teams or installations: the CLI's route request
// (lib/schemas/route-evaluate.ts) plus a `stepwell` header with what only the board needs.
import { z } from 'zod';
import { MAX_ROUTE_LINKS, MAX_ROUTE_STEPS } from '../thermo/route/route-limits';
import { PositiveFinite, QuantityString, SpeciesName, safeRecord, speciesMap } from './quantity';
import { SpeciesDefinitions } from './evaluate';
import { StepKey } from './route';

export const ROUTE_FILE_FORMAT = 'stepwell.route/1';

const Position = z.strictObject({ x: z.number().finite(), y: z.number().finite() });

export const StepwellHeader = z.strictObject({
  format: z.literal(ROUTE_FILE_FORMAT, { message: `The header's format is "${ROUTE_FILE_FORMAT}".` }),
  name: z.string().trim().min(1, { message: 'Name the route.' }).max(160),
  positions: safeRecord(StepKey, Position).optional(),
  notes: safeRecord(StepKey, z.string().max(4000)).optional(),
  /** the screen's limits, written into every exported file; read back as nothing more than text */
  caution: z.string().max(1000).optional(),
});
export type StepwellHeader = z.infer<typeof StepwellHeader>;

// Engine fields a saved route cannot hold: refused by name rather than dropped, so the evaluation never changes silently.
const notStored = (what: string) => z.never({ message: `Stepwell routes do not store ${what}; remove it to import this route.` }).optional();

const ImportStep = z.strictObject({
  id: StepKey,
  equation: z.string({ message: 'Each step needs an equation.' }).trim().min(1, { message: 'Each step needs an equation.' }).max(500),
  temperature: QuantityString.optional(),
  standardPressure: z.enum(['1 bar', '1 atm']).optional(),
  heatCapacity: z.boolean().optional(),
  pressures: speciesMap(QuantityString).optional(),
  concentrations: speciesMap(QuantityString).optional(),
  initial: speciesMap(QuantityString).optional(),
  species: SpeciesDefinitions.optional(),
  totalPressure: QuantityString.optional(),
  electrons: PositiveFinite.max(1000).optional(),
  yield: z.number().finite().gt(0, { message: 'A yield is above 0.' }).max(1, { message: 'A yield is a fraction, at most 1.' }).optional(),
  volume: notStored('a solution volume'),
  fugacityCoefficients: notStored('fugacity coefficients'),
  activityCoefficients: notStored('activity coefficients'),
});

export const RouteImportInput = z
  .strictObject({
    target: SpeciesName,
    targetAmount: QuantityString.optional(),
    steps: z
      .array(ImportStep, { message: 'A route file lists its steps.' })
      .min(1, { message: 'A route file needs at least one step.' })
      .max(MAX_ROUTE_STEPS, { message: `A route has at most ${MAX_ROUTE_STEPS} steps.` }),
    links: z.array(z.strictObject({ from: StepKey, to: StepKey, species: SpeciesName })).max(MAX_ROUTE_LINKS).optional(),
    marginalThreshold_kJ: z.number().finite().max(0, { message: 'The threshold is zero or negative.' }).min(-500).optional(),
    stepwell: StepwellHeader.optional(),
  })
  .superRefine((file, ctx) => {
    const ids = new Set<string>();
    file.steps.forEach((step, i) => {
      if (ids.has(step.id)) ctx.addIssue({ code: 'custom', path: ['steps', i, 'id'], message: `Two steps share the id "${step.id}".` });
      ids.add(step.id);
    });
    (file.links ?? []).forEach((link, i) => {
      for (const end of ['from', 'to'] as const) {
        if (!ids.has(link[end])) ctx.addIssue({ code: 'custom', path: ['links', i, end], message: `No step has the id "${link[end]}".` });
      }
    });
    for (const part of ['positions', 'notes'] as const) {
      for (const key of Object.keys(file.stepwell?.[part] ?? {})) {
        if (!ids.has(key)) ctx.addIssue({ code: 'custom', path: ['stepwell', part, key], message: `No step has the id "${key}".` });
      }
    }
  });
export type RouteImportInput = z.infer<typeof RouteImportInput>;
