// GET /api/structures/svg: which structure to draw and how big.
import { z } from 'zod';

/** Drawing sizes in CSS pixels: big enough for a detail page, small enough that nobody asks for a poster. */
export const STRUCTURE_SIZE = { min: 24, max: 640, defaultWidth: 160, defaultHeight: 120 } as const;

const size = (fallback: number) => z.coerce.number().int().min(STRUCTURE_SIZE.min).max(STRUCTURE_SIZE.max).default(fallback);

export const StructureSvgQuerySchema = z.strictObject({
  // 600 is the engine's own SMILES limit (MAX_SMILES_LENGTH in lib/thermo/structure/chem.ts), kept out of this shared file.
  smiles: z.string().trim().min(1, 'Give a SMILES.').max(600, 'A SMILES may be at most 600 characters.'),
  w: size(STRUCTURE_SIZE.defaultWidth),
  h: size(STRUCTURE_SIZE.defaultHeight),
});

export type StructureSvgQuery = z.infer<typeof StructureSvgQuerySchema>;
