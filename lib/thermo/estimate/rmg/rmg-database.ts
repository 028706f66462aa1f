// Loads group files into trees. `loadGroupTrees` works for any group set in the shared layout;
// `loadRmgDatabase` is the thermo set (the six files RMG uses today, never gauche/int15).
import { readDataJson } from '../../data/data-files';
import { AtomTypeTable } from './atom-types';
import type { GroupEntryJson, GroupSetJson, ThermoNumbersJson } from './group-json';
import { type EntryData, GroupTree } from './group-tree';
import { fromJson, type ThermoValues } from './thermo-values';

export const THERMO_GROUPS_FILE = 'source/estimation/rmg-groups/groups.json';
export const THERMO_FILES = ['group', 'ring', 'polycyclic', 'other', 'longDistanceInteraction_noncyclic', 'longDistanceInteraction_cyclic'] as const;
export type ThermoFile = (typeof THERMO_FILES)[number];

export interface RmgDatabase {
  atomTypes: AtomTypeTable;
  trees: Record<ThermoFile, GroupTree<ThermoValues>>;
  /** the `source` block of groups.json (commit, licence), kept with the numbers */
  source: Record<string, unknown>;
}

let sharedTypes: AtomTypeTable | undefined;
export function loadAtomTypes(): AtomTypeTable {
  sharedTypes ??= AtomTypeTable.load();
  return sharedTypes;
}

/** Trees for the named files of a group set under lib/thermo/data (read at run time, not bundled). */
export function loadGroupTrees<D>(
  relativePath: string,
  parseData: (entry: GroupEntryJson) => EntryData<D>,
  files?: readonly string[],
): { trees: Record<string, GroupTree<D>>; json: GroupSetJson } {
  const json = readDataJson<GroupSetJson>(relativePath);
  const table = loadAtomTypes();
  const trees: Record<string, GroupTree<D>> = {};
  for (const name of files ?? Object.keys(json.files)) {
    const file = json.files[name];
    if (!file) throw new Error(`${relativePath} has no group file "${name}"`);
    trees[name] = new GroupTree<D>(name, file, table, parseData);
  }
  return { trees, json };
}

function parseThermo(entry: GroupEntryJson): EntryData<ThermoValues> {
  const t = entry.thermo as ThermoNumbersJson | { ref: string } | null | undefined;
  if (!t) return null;
  if ('ref' in t) return { ref: t.ref };
  return fromJson(t);
}

let cached: RmgDatabase | undefined;

export function loadRmgDatabase(): RmgDatabase {
  if (!cached) {
    const { trees, json } = loadGroupTrees(THERMO_GROUPS_FILE, parseThermo, THERMO_FILES);
    cached = { atomTypes: loadAtomTypes(), trees: trees as Record<ThermoFile, GroupTree<ThermoValues>>, source: json.source ?? {} };
  }
  return cached;
}
