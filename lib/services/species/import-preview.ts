import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import type { SpeciesImport } from '../../../db/models/species-import';
import { provenanceLabel } from '../../species/build-species';
import { readSpeciesCsv, type CheckedRow } from '../../species/csv-rows';
import { builtinLookup } from '../../thermo/species-library';
import { AppError } from '../../api/errors';

export interface DuplicateInfo {
  of: 'team' | 'library';
  name: string;
  teamSpeciesId: number | null;
  dfG_kJ: number;
  source: string;
}

export interface PreviewRowDto {
  row: number;
  key: string | null;
  formula: string;
  phase: string;
  name: string;
  dfH_kJ: number | null;
  dfG_kJ: number | null;
  dfGDerived: boolean;
  S_J_per_K: number | null;
  Cp_J_per_K: number | null;
  source: string | null;
  /** ΔfG° given − (ΔfH° − TΔfS°), kJ/mol, when checked */
  consistencyDifference_kJ: number | null;
  consistency: 'consistent' | 'derived' | 'unchecked' | 'inconsistent' | null;
  errors: Record<string, string>;
  warnings: string[];
  duplicate: DuplicateInfo | null;
}

export interface ImportPreviewDto {
  id: number;
  fileName: string;
  checksum: string;
  byteSize: number;
  status: 'preview' | 'committed';
  importedBy: string | null;
  createdAt: string;
  committedAt: string | null;
  counts: { rows: number; withErrors: number; duplicates: number; created: number | null; overridden: number | null; skipped: number | null };
  rows: PreviewRowDto[];
}

function toRowDto(r: CheckedRow, duplicate: DuplicateInfo | null): PreviewRowDto {
  const s = r.species;
  const c = r.consistency;
  return {
    row: r.row, key: r.key, formula: s?.formula ?? r.formula, phase: s?.phase ?? r.phase, name: r.name,
    dfH_kJ: s?.dfH_kJ ?? null, dfG_kJ: s?.dfG_kJ ?? null, dfGDerived: s?.dfGDerived ?? false, S_J_per_K: s?.S_J_per_K ?? null, Cp_J_per_K: s?.Cp_J_per_K ?? null,
    source: s ? provenanceLabel(s.provenance) : null,
    consistencyDifference_kJ: c && 'difference_kJ' in c ? c.difference_kJ : null,
    consistency: c?.status ?? null,
    errors: r.errors, warnings: r.warnings, duplicate,
  };
}

/** Reads the file and checks every row against the team's species as they are now. */
export async function checkImportText({ teamId, text, transaction }: { teamId: number; text: string; transaction?: Transaction }) {
  const reading = readSpeciesCsv(text);
  if (!reading.ok) {
    throw new AppError('UNPROCESSABLE', reading.problems[0]!, { fields: { file: reading.problems.join(' ') }, details: { problems: reading.problems } });
  }
  const keys = reading.rows.map((r) => r.key).filter((k): k is string => k !== null);
  const existing = await getDb().models.TeamSpecies.findAll({ where: { teamId, key: keys }, transaction });
  const byKey = new Map(existing.map((e) => [e.key, e]));
  const checked = reading.rows.map((r) => {
    let duplicate: DuplicateInfo | null = null;
    const mine = r.key ? byKey.get(r.key) : undefined;
    const builtin = r.key ? builtinLookup.get(r.key) : undefined;
    if (mine) duplicate = { of: 'team', name: mine.name, teamSpeciesId: mine.id, dfG_kJ: mine.dfgKj, source: mine.provenanceText };
    else if (builtin) duplicate = { of: 'library', name: builtin.name, teamSpeciesId: null, dfG_kJ: builtin.dfG_kJ, source: builtin.source };
    return { checked: r, duplicate, dto: toRowDto(r, duplicate) };
  });
  return { rows: checked, existing: byKey };
}

export function toPreviewDto(row: SpeciesImport, rows: PreviewRowDto[]): ImportPreviewDto {
  const importer = row.get('importedBy') as { name: string } | null | undefined;
  return {
    id: row.id, fileName: row.fileName, checksum: row.checksum, byteSize: row.byteSize, status: row.status,
    importedBy: importer?.name ?? null, createdAt: row.createdAt.toISOString(), committedAt: row.committedAt?.toISOString() ?? null,
    counts: {
      rows: rows.length || row.rowCount,
      withErrors: rows.filter((r) => Object.keys(r.errors).length > 0).length,
      duplicates: rows.filter((r) => r.duplicate !== null).length,
      created: row.createdCount, overridden: row.overriddenCount, skipped: row.skippedCount,
    },
    rows,
  };
}
