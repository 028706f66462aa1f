import 'server-only';
import { fn, col, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { builtinLookup, layeredLookup, type SpeciesLookup } from '../../thermo/species-library';
import { loadChem } from '../../thermo/structure/chem';
import { structureLookup, type StructureLookup } from '../../thermo/structure/structure-lookup';
import type { SpeciesRecord } from '../../thermo/species-types';
import { toSpeciesRecord } from './team-species-record';

interface Entry {
  stamp: string;
  lookup: StructureLookup;
  records: readonly SpeciesRecord[];
}

// On globalThis like the database, so dev reloads share it. Each entry carries a stamp of the team's rows,
// checked with one indexed query per use, so a write by any process (or a rolled-back one) is never missed.
const globalCache = globalThis as unknown as { __stepwellTeamLookups?: Map<number, Entry> };
const cache = (globalCache.__stepwellTeamLookups ??= new Map<number, Entry>());

async function stampOf(teamId: number, transaction?: Transaction): Promise<string> {
  const row = (await getDb().models.TeamSpecies.findOne({
    attributes: [[fn('COUNT', col('id')), 'n'], [fn('MAX', col('updated_at')), 'at'], [fn('SUM', col('version')), 'v'], [fn('MAX', col('id')), 'last']],
    where: { teamId },
    raw: true,
    transaction,
  })) as unknown as { n: number; at: string | null; v: number | null; last: number | null } | null;
  return row ? `${row.n}|${row.at}|${row.v}|${row.last}` : '0';
}

async function load(teamId: number, stamp: string, transaction?: Transaction): Promise<Entry> {
  const rows = await getDb().models.TeamSpecies.findAll({ where: { teamId }, order: [['id', 'ASC']], transaction });
  const records = rows.map((r) => toSpeciesRecord(r));
  // Lookups are treated as immutable by the engine's memos, so every change makes a new one. The structure view
  // adds names from the identifier table, SMILES through RDKit and estimates for what no table has.
  const chem = await loadChem();
  return { stamp, records, lookup: structureLookup(records.length ? layeredLookup(records) : builtinLookup, chem) };
}

/** The species lookup for one team's requests: its own species over the built-in library, known by structure. */
export async function teamLookup(teamId: number, transaction?: Transaction): Promise<StructureLookup> {
  return (await teamEntry(teamId, transaction)).lookup;
}

export async function teamSpeciesRecords(teamId: number, transaction?: Transaction): Promise<readonly SpeciesRecord[]> {
  return (await teamEntry(teamId, transaction)).records;
}

async function teamEntry(teamId: number, transaction?: Transaction): Promise<Entry> {
  const stamp = await stampOf(teamId, transaction);
  const hit = cache.get(teamId);
  if (hit && hit.stamp === stamp) return hit;
  const entry = await load(teamId, stamp, transaction);
  // Inside a transaction the rows may still roll back: use them, but do not cache them.
  if (!transaction) cache.set(teamId, entry);
  return entry;
}

/** Drops a team's cached lookup; writers call it after their transaction commits. */
export function invalidateTeamLookup(teamId: number): void {
  cache.delete(teamId);
}

/** A lookup with one species replaced or added, for "what would change" previews; never cached. */
export function lookupWith(records: readonly SpeciesRecord[], replacement: SpeciesRecord): SpeciesLookup {
  return layeredLookup([...records.filter((r) => r.key !== replacement.key), replacement]);
}
