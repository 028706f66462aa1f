// One group file as a tree: match an entry at labelled centres, descend from the roots taking the
// first matching child in listed order, climb to data and follow references. Generic over the
// data an entry carries (thermo numbers, solute descriptors, ...).
import type { AtomTypeTable } from './atom-types';
import { compileGroup, type GroupGraph } from './group-graph';
import type { GraphGroupJson, GroupEntryJson, GroupFileJson, LogicGroupJson } from './group-json';
import { matchGroup } from './matcher';
import type { MolGraph } from './mol-graph';

export type EntryData<D> = D | { ref: string } | null;

export interface TreeEntry<D> {
  label: string;
  index: number;
  depth: number;
  parent: TreeEntry<D> | undefined;
  children: TreeEntry<D>[];
  json: GroupEntryJson;
  data: EntryData<D>;
  shortDesc: string;
  longDesc: string;
}

export type Centres = Readonly<Record<string, number>>;

export function isRef<D>(data: EntryData<D>): data is { ref: string } {
  return data !== null && typeof data === 'object' && 'ref' in (data as object) && typeof (data as { ref: unknown }).ref === 'string';
}

export class GroupTree<D> {
  readonly entries = new Map<string, TreeEntry<D>>();
  readonly roots: TreeEntry<D>[];
  private readonly graphs = new Map<TreeEntry<D>, GroupGraph>();

  constructor(
    readonly name: string,
    file: GroupFileJson,
    private readonly table: AtomTypeTable,
    parseData: (entry: GroupEntryJson) => EntryData<D>,
  ) {
    for (const json of file.entries) {
      this.entries.set(json.label, {
        label: json.label,
        index: json.index,
        depth: json.depth,
        parent: undefined,
        children: [],
        json,
        data: parseData(json),
        shortDesc: json.shortDesc ?? '',
        longDesc: json.longDesc ?? '',
      });
    }
    for (const entry of this.entries.values()) {
      if (entry.json.parent) entry.parent = this.entries.get(entry.json.parent);
      entry.children = entry.json.children.map((c) => this.entries.get(c)).filter((c): c is TreeEntry<D> => c !== undefined);
    }
    this.roots = file.roots.map((r) => this.entries.get(r)).filter((r): r is TreeEntry<D> => r !== undefined);
  }

  get(label: string): TreeEntry<D> | undefined {
    return this.entries.get(label);
  }

  /** The compiled graph of a graph entry (undefined for logic nodes). */
  graphOf(entry: TreeEntry<D>): GroupGraph | undefined {
    if (entry.json.group.kind !== 'graph') return undefined;
    let g = this.graphs.get(entry);
    if (!g) {
      g = compileGroup(entry.json.group as GraphGroupJson, this.table);
      this.graphs.set(entry, g);
    }
    return g;
  }

  matches(entry: TreeEntry<D>, mol: MolGraph, centres: Centres): boolean {
    const graph = this.graphOf(entry);
    if (graph) return matchGroup(graph, mol, centres);
    return this.matchLogic(entry.json.group as LogicGroupJson, mol, centres);
  }

  private matchLogic(node: LogicGroupJson, mol: MolGraph, centres: Centres): boolean {
    const one = (c: string | LogicGroupJson): boolean => {
      if (typeof c !== 'string') return this.matchLogic(c, mol, centres);
      const entry = this.entries.get(c);
      return entry !== undefined && this.matches(entry, mol, centres);
    };
    const result = node.op === 'AND' ? node.components.every(one) : node.components.some(one);
    return node.invert ? !result : result;
  }

  /** Deepest entry reached from the first matching root by taking the first matching child. */
  descend(mol: MolGraph, centres: Centres): TreeEntry<D> | undefined {
    let node = this.roots.find((r) => this.matches(r, mol, centres));
    while (node) {
      const next: TreeEntry<D> | undefined = node.children.find((c) => this.matches(c, mol, centres));
      if (!next) return node;
      node = next;
    }
    return undefined;
  }

  /** The entry itself or its nearest ancestor that has data of its own (numbers or a reference). */
  withData(entry: TreeEntry<D>): TreeEntry<D> | undefined {
    let node: TreeEntry<D> | undefined = entry;
    while (node && node.data === null) node = node.parent;
    return node;
  }

  /** Follows references until numbers are reached. */
  followRefs(entry: TreeEntry<D>): { entry: TreeEntry<D>; data: D } | undefined {
    let node: TreeEntry<D> | undefined = entry;
    for (let hops = 0; node && hops < 100; hops += 1) {
      const data: EntryData<D> = node.data;
      if (data === null) return undefined;
      if (!isRef(data)) return { entry: node, data: data as D };
      node = this.entries.get(data.ref);
    }
    return undefined;
  }

  ancestors(entry: TreeEntry<D>): number {
    let n = 0;
    for (let p = entry.parent; p; p = p.parent) n += 1;
    return n;
  }
}
