// Group-tree machinery (generic over the data an entry carries) and the thermo group database.
// The Abraham solute groups use the same group-graph layout: load them with `loadGroupTrees`.
export { AtomTypeTable } from './atom-types';
export type { Contribution } from './contribution';
export { cpLimits } from './cp-limits';
export { entrySource } from './entry-source';
export { compileGroup, type GroupAtom, type GroupGraph } from './group-graph';
export type { BondCode, GroupEntryJson, GroupFileJson, GroupJson, GroupSetJson } from './group-json';
export { groupAdditivity, type GroupSum, type UnplacedAtom } from './group-sum';
export { type Centres, type EntryData, GroupTree, isRef, type TreeEntry } from './group-tree';
export { matchGroup } from './matcher';
export { type BondOrder, HALOGENS, type MolAtom, MolGraph } from './mol-graph';
export { buildMolecule, type BuiltMolecule } from './rdkit-graph';
export { loadAtomTypes, loadGroupTrees, loadRmgDatabase, type RmgDatabase, THERMO_FILES, THERMO_GROUPS_FILE, type ThermoFile } from './rmg-database';
export { ringClusters, ringCorrections } from './ring-corrections';
export { averagedValues, lookupRing, type RingLookup } from './ring-lookup';
export { SIGMA_MODEL, sigmaFor } from './sigma-model';
export { smallestRings } from './sssr';
export { addThermo, averageThermo, CP_TEMPERATURES_K, type ThermoValues, zeroThermo } from './thermo-values';
export { PER_OCCURRENCE, type WeakKind, type WeakReason, weakReasons, WIDEN_ONLY } from './weak-classes';
