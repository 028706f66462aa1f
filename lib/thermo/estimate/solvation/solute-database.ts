// The Abraham solute-descriptor group trees (Chung et al. 2022, the group files current RMG loads;
// never the legacy Platts `abraham`/`nonacentered` files). They share the gas groups' layout and tree
// descent, so they load through the RMG tree machinery. Descriptor increments are carried in the
// ThermoValues shape (S→H, B→S, [E, L, A]→Cp) so the shared group sum and ring code, which only add,
// subtract and average these vectors, apply unchanged.
import type { GroupEntryJson } from '../rmg/group-json';
import { GroupTree, type EntryData } from '../rmg/group-tree';
import { loadAtomTypes, loadGroupTrees, type RmgDatabase, type ThermoFile } from '../rmg/rmg-database';
import { CP_TEMPERATURES_K, type ThermoValues } from '../rmg/thermo-values';

export const SOLUTE_GROUPS_FILE = 'source/estimation/rmg-groups/solvation/solute-groups.json';
export const SOLUTE_SOURCE = 'Abraham descriptors by group additivity: Chung, Vermeire, Wu, Walker, Abraham & Green, J. Chem. Inf. Model. 62 (2022) 433 (RMG-database solvation groups)';
const FILES = ['group', 'ring', 'polycyclic', 'longDistanceInteraction_noncyclic', 'longDistanceInteraction_cyclic', 'halogen'] as const;

export interface SoluteDescriptors {
  E: number;
  S: number;
  A: number;
  B: number;
  L: number;
}

export function packDescriptors(d: SoluteDescriptors): ThermoValues {
  return { H: d.S, S: d.B, Cp: [d.E, d.L, d.A, ...CP_TEMPERATURES_K.slice(3).map(() => 0)] };
}

export function unpackDescriptors(v: ThermoValues): SoluteDescriptors {
  return { S: v.H, B: v.S, E: v.Cp[0] ?? 0, L: v.Cp[1] ?? 0, A: v.Cp[2] ?? 0 };
}

function parseSolute(entry: GroupEntryJson): EntryData<ThermoValues> {
  const s = entry.solute as (SoluteDescriptors & Record<string, number>) | { ref: string } | null | undefined;
  if (!s) return null;
  if ('ref' in s && typeof s.ref === 'string') return { ref: s.ref };
  const d = s as SoluteDescriptors;
  return packDescriptors({ E: d.E ?? 0, S: d.S ?? 0, A: d.A ?? 0, B: d.B ?? 0, L: d.L ?? 0 });
}

export interface SoluteDatabase {
  /** shaped like the thermo database so the shared group sum runs on it; `other` is empty here */
  db: RmgDatabase;
  halogen: GroupTree<ThermoValues>;
}

let cached: SoluteDatabase | undefined;

export function loadSoluteDatabase(): SoluteDatabase {
  if (!cached) {
    const { trees, json } = loadGroupTrees(SOLUTE_GROUPS_FILE, parseSolute, FILES);
    const table = loadAtomTypes();
    const other = new GroupTree<ThermoValues>('other', { roots: [], entries: [] }, table, () => null);
    const thermoShaped: Record<ThermoFile, GroupTree<ThermoValues>> = {
      group: trees.group!,
      ring: trees.ring!,
      polycyclic: trees.polycyclic!,
      other,
      longDistanceInteraction_noncyclic: trees.longDistanceInteraction_noncyclic!,
      longDistanceInteraction_cyclic: trees.longDistanceInteraction_cyclic!,
    };
    cached = { db: { atomTypes: table, trees: thermoShaped, source: json.source ?? {} }, halogen: trees.halogen! };
  }
  return cached;
}
