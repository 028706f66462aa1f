import { z } from 'zod';
import { safeRecord } from './quantity';

export const TEAM_EXPORT_FORMAT = 'stepwell.team/1';

const cell = z.union([z.string(), z.number(), z.boolean(), z.null()]);

// The file a lead downloads and imports: every table's rows as stored, plus the people they mention (matched by e-mail on import).
export const TeamExportFile = z.strictObject({
  format: z.literal(TEAM_EXPORT_FORMAT, { message: `Not a Stepwell team file (format must be ${TEAM_EXPORT_FORMAT}).` }),
  exportedAt: z.string().max(40),
  team: z.strictObject({ id: z.number().int(), name: z.string().max(120) }),
  people: z.array(z.strictObject({ id: z.number().int().positive(), email: z.string().max(254), name: z.string().max(120) })).max(10_000),
  tables: safeRecord(z.string().max(64), z.array(safeRecord(z.string().max(64), cell)).max(500_000)),
  /** what the export could not carry, in words */
  notes: z.array(z.string().max(400)).max(20).optional(),
});
export type TeamExportFile = z.infer<typeof TeamExportFile>;
