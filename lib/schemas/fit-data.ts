// Equilibrium-data sets and saved van 't Hoff fits: shared by the /fits forms and the /api/fits handlers.
import { z } from 'zod';

export const TEMPERATURE_UNITS = ['K', 'degC'] as const;
export const VALUE_KINDS = ['K', 'lnK'] as const;
export const DATA_SOURCES = ['csv', 'paste', 'grid'] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
export type ValueKind = (typeof VALUE_KINDS)[number];

/** Limits for one data set; the text limit keeps a pasted or uploaded table well inside the 1 MB body limit. */
export const MAX_DATA_POINTS = 500;
export const MAX_DATA_TEXT_BYTES = 256 * 1024;

// Cells stay text until the service reads them, so every bad cell gets its own row-and-column message.
const Cell = z.string().max(64);
export const DataRowInput = z.strictObject({ T: Cell, value: Cell, sigma: Cell.default('') });
export type DataRowInput = z.infer<typeof DataRowInput>;

const DataSetFields = {
  name: z.string().trim().min(1, { message: 'Name the data set.' }).max(160),
  /** the reaction the K values belong to; blank when not linked */
  equation: z.string().trim().max(500).default(''),
  temperatureUnit: z.enum(TEMPERATURE_UNITS).default('K'),
  valueKind: z.enum(VALUE_KINDS).default('K'),
  /** where the numbers come from: a citation or notebook page */
  note: z.string().trim().max(2000).default(''),
};

// CSV and pasted text come as `text` (parsed on the server); a typed grid comes as `rows`.
export const DataSetInput = z
  .strictObject({
    ...DataSetFields,
    source: z.enum(DATA_SOURCES),
    text: z.string().max(MAX_DATA_TEXT_BYTES, { message: 'The table is over 256 KB; split it or trim unused columns.' }).optional(),
    rows: z.array(DataRowInput).max(MAX_DATA_POINTS, { message: `A data set has at most ${MAX_DATA_POINTS} points.` }).optional(),
  })
  .refine((d) => (d.source === 'grid' ? d.rows !== undefined : d.text !== undefined), {
    message: 'Send the table as text for CSV or paste, as rows for the grid.',
    path: ['source'],
  });
export type DataSetInput = z.infer<typeof DataSetInput>;

// The /fits editor: every source's fields at once; the page sends `text` or `rows` as the source needs.
export const DataSetForm = z.strictObject({
  ...DataSetFields,
  source: z.enum(DATA_SOURCES),
  text: z.string().max(MAX_DATA_TEXT_BYTES, { message: 'The table is over 256 KB; split it or trim unused columns.' }),
  rows: z.array(DataRowInput).max(MAX_DATA_POINTS),
});
export type DataSetForm = z.input<typeof DataSetForm>;

export const DataSetUpdate = z.strictObject({ ...DataSetFields, rows: z.array(DataRowInput).max(MAX_DATA_POINTS) });
export type DataSetUpdate = z.infer<typeof DataSetUpdate>;

export const ExclusionsInput = z.strictObject({
  exclusions: z
    .array(z.strictObject({ index: z.number().int().min(0), reason: z.string().trim().min(1, { message: 'Say why the point is left out.' }).max(300) }))
    .max(MAX_DATA_POINTS),
});
export type ExclusionsInput = z.infer<typeof ExclusionsInput>;

export const SaveFitInput = z.strictObject({
  dataSetId: z.number().int().positive(),
  name: z.string().trim().min(1, { message: 'Name the fit.' }).max(160),
});
export type SaveFitInput = z.infer<typeof SaveFitInput>;

export const SpeciesFromFitInput = z.strictObject({
  /** the species of the fitted reaction to solve for, as written in the equation or as its library key */
  species: z.string().trim().min(1, { message: 'Pick the species to solve for.' }).max(120),
  name: z.string().trim().min(1, { message: 'Name the species.' }).max(160),
});
export type SpeciesFromFitInput = z.infer<typeof SpeciesFromFitInput>;

/** A stored point: numbers as given (unit and kind from the data set), with its exclusion. */
export interface StoredPoint {
  T: number;
  value: number;
  sigma: number | null;
  excluded: boolean;
  reason: string | null;
}
