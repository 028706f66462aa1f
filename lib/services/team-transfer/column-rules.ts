// What an imported cell must be, per table and column: the API's own zod schemas where the app writes the column
// from a request, and the column's SQL type everywhere else. A cell that passes here can be read back by every
// page and handler, so a team file can never leave rows behind that answer 500 later.
import { z } from 'zod';
import { DATA_SOURCES, TEMPERATURE_UNITS, VALUE_KINDS } from '../../schemas/fit-data';
import { FLAG_CATEGORIES } from '../../schemas/flag';
import { LinkInput, RouteMeta, StepInput, StepKey } from '../../schemas/route';
import { SPECIES_PHASES, TeamSpeciesInput } from '../../schemas/species';
import { ROUTE_STATUSES } from '../../schemas/workflow';
import { CommentBody } from '../../schemas/comment';

type Rule = z.ZodType;

const version = z.number().int().positive({ message: 'A version is a whole number of at least 1.' });
const count = z.number().int().nonnegative({ message: 'Expected a whole number of at least 0.' });
const finite = z.number().finite({ message: 'Expected a finite number.' });
// A file name as a download header carries it: printable ASCII, no quotes, slashes or line breaks.
const fileName = z.string().regex(/^[\x20-\x7E]{1,255}$/, { message: 'A file name is printable ASCII without line breaks.' }).refine((s) => !/["\\/]/.test(s), { message: 'A file name holds no quotes or slashes.' });

/** The step conditions column keeps exactly the engine's request fields of a step (route-dto.ts). */
const StepConditions = StepInput.omit({ id: true, equation: true, yieldPct: true, notes: true, position: true });

/** A JSON column: the cell is JSON text whose parsed value must pass `schema`. */
export interface JsonRule {
  json: Rule;
}

export type ColumnRule = Rule | JsonRule;

export function isJsonRule(rule: ColumnRule): rule is JsonRule {
  return typeof rule === 'object' && rule !== null && 'json' in rule && !(rule instanceof z.ZodType);
}

const anyJson: JsonRule = { json: z.unknown() };

export const COLUMN_RULES: Record<string, Record<string, ColumnRule>> = {
  routes: {
    name: RouteMeta.shape.name,
    target: RouteMeta.shape.target,
    target_amount: z.string().trim().min(1).max(64),
    status: z.enum(ROUTE_STATUSES, { message: `A route status is one of ${ROUTE_STATUSES.join(', ')}.` }),
    version,
    marginal_threshold_kj: RouteMeta.shape.marginalThreshold_kJ.unwrap(),
  },
  steps: {
    step_key: StepKey,
    equation: StepInput.shape.equation,
    conditions: { json: StepConditions },
    yield_pct: StepInput.shape.yieldPct.unwrap(),
    notes: StepInput.shape.notes.unwrap(),
    sort_order: count,
  },
  step_links: { from_key: StepKey, to_key: StepKey, species: LinkInput.shape.species },
  route_revisions: { version, step_dg: anyJson, snapshot: anyJson },
  route_transitions: {
    from_status: z.enum(ROUTE_STATUSES, { message: 'Unknown route status.' }),
    to_status: z.enum(ROUTE_STATUSES, { message: 'Unknown route status.' }),
    route_version: version,
  },
  comments: { step_key: StepKey.nullable(), body: CommentBody.or(z.literal('')), mentions: { json: z.array(z.unknown()) }, route_version: version },
  step_flags: { step_key: StepKey, category: z.enum(FLAG_CATEGORIES, { message: `A flag category is one of ${FLAG_CATEGORIES.join(', ')}.` }) },
  decisions: { route_ids: { json: z.array(z.number().int()) }, shelved_route_ids: { json: z.array(z.number().int()) }, snapshot: { json: z.record(z.string(), z.unknown()) } },
  species_imports: {
    file_name: fileName,
    checksum: z.string().regex(/^[0-9a-f]{64}$/, { message: 'A checksum is 64 hexadecimal digits.' }),
    status: z.enum(['preview', 'committed'], { message: 'An import status is preview or committed.' }),
    byte_size: count,
    row_count: count,
  },
  team_species: {
    phase: z.enum(SPECIES_PHASES, { message: 'A phase is g, l, s or aq.' }),
    name: TeamSpeciesInput.shape.name,
    aliases: { json: TeamSpeciesInput.shape.aliases.unwrap() },
    elements: { json: z.record(z.string().regex(/^[A-Z][a-z]?$/), z.number().int().positive()) },
    provenance_kind: z.enum(['citation', 'measured', 'estimated'], { message: 'Provenance is citation, measured or estimated.' }),
    provenance_text: z.string().trim().min(3).max(500),
    dfh_kj: finite,
    dfg_kj: finite,
    s_j_per_k: finite,
    version,
    // A species known by structure: canonical SMILES and a standard InChIKey (both null for one known by formula).
    smiles: z.string().trim().min(1).max(600, { message: 'A SMILES has at most 600 characters.' }),
    inchikey: z.string().regex(/^[A-Z]{14}-[A-Z]{10}-[A-Z]$/, { message: 'An InChIKey is 14, 10 and 1 capital letters joined by hyphens.' }),
  },
  fit_data_sets: {
    temperature_unit: z.enum(TEMPERATURE_UNITS),
    value_kind: z.enum(VALUE_KINDS),
    source: z.enum(DATA_SOURCES),
    points: { json: z.array(z.record(z.string(), z.unknown())) },
    version,
  },
  fits: { raw_data: { json: z.record(z.string(), z.unknown()) }, result: { json: z.record(z.string(), z.unknown()) }, delta_h0_kj: finite, delta_s0_j_per_k: finite },
};

/** Rules every column gets from its SQL type, when the table list above names none. */
export function typeRule(sqlType: string): ColumnRule | null {
  const type = sqlType.toUpperCase();
  const length = /(?:VARCHAR|CHARACTER VARYING)\((\d+)\)/.exec(type);
  if (length) return z.string().max(Number(length[1]), { message: `At most ${length[1]} characters.` });
  if (type === 'TEXT') return z.string();
  if (type === 'JSON' || type === 'JSONB') return anyJson;
  if (type === 'INTEGER' || type === 'BIGINT') return z.number().int({ message: 'Expected a whole number.' });
  if (/^(FLOAT|REAL|DOUBLE)/.test(type)) return finite;
  return null;
}

function firstMessage(error: z.ZodError): string {
  const issue = error.issues[0];
  if (!issue) return 'Not valid here.';
  const path = issue.path.length ? ` (at ${issue.path.join('.')})` : '';
  return `${issue.message}${path}`;
}

/** Checks one cell; returns the message for the file's field, or null when it passes. */
export function checkCell(rule: ColumnRule, value: unknown): string | null {
  if (!isJsonRule(rule)) {
    const result = rule.safeParse(value);
    return result.success ? null : firstMessage(result.error);
  }
  if (typeof value !== 'string') return 'Expected JSON text.';
  let parsed: unknown;
  try {
    parsed = JSON.parse(value);
  } catch {
    return 'Not valid JSON.';
  }
  const result = rule.json.safeParse(parsed);
  return result.success ? null : firstMessage(result.error);
}
