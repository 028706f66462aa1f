// Reads a species CSV into checked rows: each cell in its column's unit (or a unit written in the cell),
// then the same checks as the form (ranges, provenance, the ΔfG° = ΔfH° − TΔfS° consistency check).
import Papa from 'papaparse';
import { dataRowAt, ROW_COUNTING, rowName } from '../csv/row-numbers';
import { TeamSpeciesInput, type TeamSpeciesValues } from '../schemas/species';
import { buildSpecies, type BuiltSpecies } from './build-species';
import type { ConsistencyResult } from './consistency';
import { readHeader, type Column, type ColumnField } from './csv-columns';
import { MAX_IMPORT_ROWS } from './import-limits';
import { readEnergyUnit, readEntropyUnit, toJPerMolK, toKJPerMol, type EnergyUnit, type EntropyUnit } from './units';

export { MAX_IMPORT_BYTES, MAX_IMPORT_ROWS } from './import-limits';

export interface CheckedRow {
  /** data row number: 1 is the first row after the header (blank lines are not counted) */
  row: number;
  key: string | null;
  formula: string;
  phase: string;
  name: string;
  species: BuiltSpecies | null;
  consistency: ConsistencyResult | null;
  errors: Record<string, string>;
  warnings: string[];
}

export type CsvReading = { ok: true; columns: Column[]; rows: CheckedRow[] } | { ok: false; problems: string[] };

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

function readNumber(cell: string, column: Column): { value: number | null; error?: string } {
  const text = cell.trim().replace(/\u2212/g, '-');
  if (text === '') return { value: null };
  const m = /^(\S+)\s*(.*)$/.exec(text)!;
  const [, num, unitText] = m;
  if (!NUMBER.test(num!)) return { value: null, error: `“${cell.trim()}” is not a number.` };
  const x = Number(num);
  if (!unitText) {
    if (column.kind === 'energy') return { value: toKJPerMol(x, column.unit as EnergyUnit) };
    if (column.kind === 'entropy') return { value: toJPerMolK(x, column.unit as EntropyUnit) };
    return { value: x };
  }
  if (column.kind === 'energy') {
    const u = readEnergyUnit(unitText);
    return u ? { value: toKJPerMol(x, u) } : { value: null, error: `“${unitText}” is not an energy unit we take (kJ/mol, J/mol, kcal/mol, cal/mol).` };
  }
  if (column.kind === 'entropy') {
    const u = readEntropyUnit(unitText);
    return u ? { value: toJPerMolK(x, u) } : { value: null, error: `“${unitText}” is not an entropy unit we take (J/(mol K), kJ/(mol K), cal/(mol K)).` };
  }
  return unitText === 'K' ? { value: x } : { value: null, error: `Give temperatures in K, not “${unitText}”.` };
}

function provenanceOf(kind: string, reference: string) {
  const k = kind.trim().toLowerCase();
  if (k === 'citation' || k === 'cited' || k === 'literature') return { kind: 'citation' as const, citation: reference };
  if (k === 'measured') return { kind: 'measured' as const, reference };
  if (k === 'estimated' || k === 'estimate') return { kind: 'estimated' as const, method: reference };
  return null;
}

function checkRow(cells: readonly string[], columns: readonly Column[], row: number): CheckedRow {
  const errors: Record<string, string> = {};
  const text: Partial<Record<ColumnField, string>> = {};
  const nums: Partial<Record<ColumnField, number | null>> = {};
  for (const c of columns) {
    const cell = cells[c.index] ?? '';
    if (c.kind === 'text') text[c.field] = cell.trim();
    else {
      const r = readNumber(cell, c);
      if (r.error) errors[c.field] = r.error;
      nums[c.field] = r.value;
    }
  }
  const base = { row, key: null, formula: text.formula ?? '', phase: text.phase ?? '', name: text.name ?? '', species: null, consistency: null, warnings: [] };
  if (nums.dfH == null && !errors.dfH) errors.dfH = 'ΔfH° is required.';
  if (nums.S == null && !errors.S) errors.S = 'S° is required.';
  const provenance = provenanceOf(text.provenance ?? '', text.reference ?? '');
  if (!provenance) errors.provenance = `Provenance “${text.provenance ?? ''}” must be citation, measured or estimated.`;
  const candidate = {
    formula: text.formula ?? '', phase: (text.phase ?? '').toLowerCase(), form: text.form ? text.form : null, name: text.name ?? '',
    aliases: (text.aliases ?? '').split(';').map((a) => a.trim()).filter(Boolean),
    energyUnit: 'kJ/mol', entropyUnit: 'J/(mol K)',
    dfH: nums.dfH ?? 0, dfG: nums.dfG ?? null, S: nums.S ?? 0, Cp: nums.Cp ?? null, cpTmin_K: nums.cpTmin_K ?? null, cpTmax_K: nums.cpTmax_K ?? null,
    sigmaDfH: nums.sigmaDfH ?? null, sigmaDfG: nums.sigmaDfG ?? null, sigmaS: nums.sigmaS ?? null,
    provenance: provenance ?? { kind: 'citation', citation: 'unknown' }, notes: text.notes ?? '',
  };
  const parsed = TeamSpeciesInput.safeParse(candidate);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = issue.path[0] === 'provenance' ? 'reference' : String(issue.path[0] ?? 'row');
      errors[field] ??= issue.message;
    }
  }
  if (Object.keys(errors).length || !parsed.success) return { ...base, errors };
  const built = buildSpecies(parsed.data as TeamSpeciesValues);
  if (!built.ok) return { ...base, errors: built.errors, warnings: built.warnings };
  return { ...base, key: built.species.key, species: built.species, consistency: built.consistency, errors, warnings: built.warnings };
}

/** Parses and checks the whole file. File-level problems (header, row count) come back without rows. */
export function readSpeciesCsv(text: string): CsvReading {
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: 'greedy' });
  const [header, ...body] = parsed.data;
  if (!header || header.every((h) => h.trim() === '')) return { ok: false, problems: ['The file is empty: it needs a header line and at least one row.'] };
  if (body.length > MAX_IMPORT_ROWS) {
    return { ok: false, problems: [`The file has ${body.length.toLocaleString('en-GB')} rows; one import takes at most ${MAX_IMPORT_ROWS.toLocaleString('en-GB')}. Split it into smaller files.`] };
  }
  if (body.length === 0) return { ok: false, problems: ['The file has a header but no rows.'] };
  const { columns, problems } = readHeader(header);
  // Papa may report one bad quote twice (invalid, then missing): one message per row.
  const brokenRows = new Set(parsed.errors.filter((e) => e.type === 'Quotes').map((e) => dataRowAt(text, e.index ?? 0, { hasHeader: true })));
  const broken = [...brokenRows].map((n) => `${rowName(n)}: a quoted cell is not closed.`);
  if (broken.length) broken.push(ROW_COUNTING);
  if (problems.length || broken.length) return { ok: false, problems: [...problems, ...broken] };
  const rows = body.map((cells, i) => checkRow(cells, columns, i + 1));
  const first = new Map<string, number>();
  for (const row of rows) {
    if (!row.key) continue;
    const earlier = first.get(row.key);
    if (earlier !== undefined) row.errors.formula = `${row.key} is already on row ${earlier} of this file.`;
    else first.set(row.key, row.row);
  }
  return { ok: true, columns, rows };
}
