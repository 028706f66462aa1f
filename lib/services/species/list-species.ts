import 'server-only';
import { getDb } from '../../../db';
import type { SpeciesListQuery } from '../../schemas/species';
import { builtinSpecies, normaliseName } from '../../thermo/species-library';
import type { SpeciesRecord } from '../../thermo/species-types';
import { libraryRow, teamRow, type SpeciesRowDto } from './species-dto';
import { teamSpeciesRecords } from './team-lookup';

export interface SpeciesPage {
  items: SpeciesRowDto[];
  total: number;
  page: number;
  pageSize: number;
}

// Normalised search text per record, computed once: records are cached per team and the library is fixed.
const searchText = new WeakMap<SpeciesRecord, string>();
function textOf(r: SpeciesRecord): string {
  let text = searchText.get(r);
  if (text === undefined) {
    text = [r.key, r.formula, r.name, ...r.aliases].map(normaliseName).join('\u0001');
    searchText.set(r, text);
  }
  return text;
}

const byFormula = (a: { formula: string; key: string }, b: { formula: string; key: string }) =>
  a.formula < b.formula ? -1 : a.formula > b.formula ? 1 : a.key < b.key ? -1 : a.key > b.key ? 1 : 0;

/** Built-in and team species together, filtered and paged on the server; team rows first within a formula. */
export async function listSpecies({ teamId, query }: { teamId: number; query: SpeciesListQuery }): Promise<SpeciesPage> {
  const records = await teamSpeciesRecords(teamId);
  const teamKeys = new Set(records.map((r) => r.key));
  // "H2O" finds H2O(l) and H2O(g); "water" finds both by alias.
  const needle = query.q ? normaliseName(query.q) : '';
  const keep = (r: SpeciesRecord) => (!query.phase || r.phase === query.phase) && (!needle || textOf(r).includes(needle));
  const hits: { r: SpeciesRecord; team: boolean }[] = [];
  if (query.origin !== 'library') for (const r of records) if (keep(r)) hits.push({ r, team: true });
  if (query.origin !== 'team') for (const r of builtinSpecies()) if (keep(r)) hits.push({ r, team: false });
  hits.sort((a, b) => byFormula(a.r, b.r) || (a.team === b.team ? 0 : a.team ? -1 : 1));
  const start = (query.page - 1) * query.pageSize;
  const page = hits.slice(start, start + query.pageSize);
  // Row ids only for the team rows on this page.
  const pageTeamKeys = page.filter((h) => h.team).map((h) => h.r.key);
  const ids = new Map(
    pageTeamKeys.length
      ? (await getDb().models.TeamSpecies.findAll({ where: { teamId, key: pageTeamKeys }, attributes: ['id', 'key'], raw: true })).map((r) => [r.key, r.id])
      : [],
  );
  const items: SpeciesRowDto[] = page.map((h) => (h.team ? teamRow(h.r, ids.get(h.r.key) ?? 0) : libraryRow(h.r, teamKeys.has(h.r.key))));
  return { items, total: hits.length, page: query.page, pageSize: query.pageSize };
}
