// Shapes of the published group files (RMG-database thermo groups and the Abraham solute groups
// share this layout; only the data key differs). See the README beside groups.json.

export type BondCode = 'S' | 'D' | 'T' | 'B';

export interface GroupAtomJson {
  id: number;
  label?: string;
  types: string[];
  u: number[];
  p: number[];
  c: number[];
  inRing?: boolean;
}

export interface GroupBondJson {
  a: number;
  b: number;
  orders: BondCode[];
}

export interface GraphGroupJson {
  kind: 'graph';
  atoms: GroupAtomJson[];
  bonds: GroupBondJson[];
}

export interface LogicGroupJson {
  kind: 'logic';
  op: 'OR' | 'AND';
  invert: boolean;
  components: (string | LogicGroupJson)[];
}

export type GroupJson = GraphGroupJson | LogicGroupJson;

export interface GroupEntryJson {
  index: number;
  label: string;
  parent: string | null;
  children: string[];
  depth: number;
  group: GroupJson;
  shortDesc?: string;
  longDesc?: string;
  rank?: number;
  /** thermo groups keep their data here; other group sets use another key (read through a data key) */
  [dataKey: string]: unknown;
}

export interface GroupFileJson {
  roots: string[];
  used_by_current_rmg?: boolean;
  entries: GroupEntryJson[];
}

export interface GroupSetJson {
  source?: Record<string, unknown>;
  Tdata_K?: number[];
  files: Record<string, GroupFileJson>;
}

export interface ThermoNumbersJson {
  H298: number;
  S298: number;
  Cp: number[];
  H298_unc?: number;
  S298_unc?: number;
}
