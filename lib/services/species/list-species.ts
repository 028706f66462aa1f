import 'server-only';
import { getDb } from '../../../db';
import type { SpeciesListQuery } from '../../schemas/species';
import { builtinSpecies, normaliseName } from '../../thermo/species-library';
import { libraryRow, teamRow, type SpeciesRowDto } from './species-dto';
import { teamSpeciesRecords } from './team-lookup';

export interface SpeciesPage {
  items: SpeciesRowDto[];
  total: number;
  page: number;
  pageSize: number;
}

function matches(row: { key: string; formula: string; name: string }, aliases: readonly string[], q: string): boolean {
  if (!q) return true;
  const needle = normaliseName(q);
  // "H2O" finds H2O(l) and H2O(g); "water" finds both by alias.
  return [row.key, row.formula, row.name, ...aliases].some((text) => normaliseName(text).includes(needle));
}

/** Built-in and team species together, filtered and paged on the server; team rows first within a formula. */
export async function listSpecies({ teamId, query }: { teamId: number; query: SpeciesListQuery }): Promise<SpeciesPage> {
  const records = await teamSpeciesRecords(teamId);
  const ids = new Map((await getDb().models.TeamSpecies.findAll({ where: { teamId }, attributes: ['id', 'key'], raw: true })).map((r) => [r.key, r.id]));
  const teamKeys = new Set(records.map((r) => r.key));
  const rows: { row: SpeciesRowDto; aliases: readonly string[] }[] = [];
  if (query.origin !== 'library') for (const r of records) rows.push({ row: teamRow(r, ids.get(r.key) ?? 0), aliases: r.aliases });
  if (query.origin !== 'team') for (const r of builtinSpecies()) rows.push({ row: libraryRow(r, teamKeys.has(r.key)), aliases: r.aliases });
  const filtered = rows
    .filter(({ row, aliases }) => (!query.phase || row.phase === query.phase) && matches(row, aliases, query.q))
    .map(({ row }) => row)
    .sort((a, b) => a.formula.localeCompare(b.formula) || a.key.localeCompare(b.key) || (a.origin === b.origin ? 0 : a.origin === 'team' ? -1 : 1));
  const start = (query.page - 1) * query.pageSize;
  return { items: filtered.slice(start, start + query.pageSize), total: filtered.length, page: query.page, pageSize: query.pageSize };
}
