import 'server-only';
import { getDb } from '../../../db';
import type { SpeciesSearchQuery } from '../../schemas/species-search';
import type { SpeciesRecord } from '../../thermo/species-types';
import { librarySearchIndex, searchSpecies, teamSearchIndex, type SpeciesSearchHit } from '../../thermo/structure/species-search';
import { teamSpeciesRecords } from './team-lookup';

export interface SpeciesSearchAnswer {
  query: string;
  items: SpeciesSearchHit[];
}

// Team species may carry a structure in their own columns (smiles, inchikey) before the engine's record does:
// read them where the table has them, once per version of the team's records.
const withStructures = new WeakMap<readonly SpeciesRecord[], readonly SpeciesRecord[]>();

async function recordsWithStructures(teamId: number, records: readonly SpeciesRecord[]): Promise<readonly SpeciesRecord[]> {
  const known = withStructures.get(records);
  if (known) return known;
  const model = getDb().models.TeamSpecies;
  const columns = model.getAttributes() as Record<string, unknown>;
  let out = records;
  if ('smiles' in columns && 'inchikey' in columns && records.some((r) => !r.structure)) {
    const rows = (await model.findAll({ where: { teamId }, attributes: ['key', 'smiles', 'inchikey'] as never, raw: true })) as unknown as { key: string; smiles: string | null; inchikey: string | null }[];
    const byKey = new Map(rows.filter((r) => r.smiles && r.inchikey).map((r) => [r.key, { smiles: r.smiles!, inchikey: r.inchikey!, cas: null }]));
    out = records.map((r) => (r.structure || !byKey.has(r.key) ? r : { ...r, structure: byKey.get(r.key)! }));
  }
  withStructures.set(records, out);
  return out;
}

/** Library, identifier-table and this team's species matching what the user typed, best first. */
export async function searchSpeciesForTeam({ teamId, query }: { teamId: number; query: SpeciesSearchQuery }): Promise<SpeciesSearchAnswer> {
  const records = await recordsWithStructures(teamId, await teamSpeciesRecords(teamId));
  const items = searchSpecies({ query: query.q, limit: query.limit, library: librarySearchIndex(), team: records.length > 0 ? teamSearchIndex(records) : undefined });
  return { query: query.q, items };
}
