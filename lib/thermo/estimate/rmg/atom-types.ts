// RMG atom types: the assignment rule for molecule atoms and the "is a specific case of" relation
// used when a group atom lists allowed types. Rules are data (atomtypes.json), applied in the
// published assignment order: the first type whose every non-empty list holds the atom's value.
import { readDataJson } from '../../data/data-files';

export const ATOM_TYPES_FILE = 'source/estimation/rmg-groups/atomtypes.json';

type RuleKey = 'single' | 'all_double' | 'r_double' | 'o_double' | 's_double' | 'triple' | 'quadruple' | 'benzene' | 'lone_pairs' | 'charge';

export type BondCounts = Record<RuleKey, number>;

interface AtomTypeJson {
  label: string;
  element: string | null;
  specific: string[];
  rule: Record<RuleKey, number[]>;
}

interface AtomTypesFileJson {
  assignment_order: Record<string, string[]>;
  atomtypes: Record<string, AtomTypeJson>;
}

const RULE_KEYS: RuleKey[] = ['single', 'all_double', 'r_double', 'o_double', 's_double', 'triple', 'quadruple', 'benzene', 'lone_pairs', 'charge'];

export class AtomTypeTable {
  private readonly order: Record<string, string[]>;
  private readonly types: Record<string, AtomTypeJson>;
  private readonly compatible = new Map<string, ReadonlySet<string>>();

  constructor(json: AtomTypesFileJson) {
    this.order = json.assignment_order;
    this.types = json.atomtypes;
  }

  static load(): AtomTypeTable {
    return new AtomTypeTable(readDataJson<AtomTypesFileJson>(ATOM_TYPES_FILE));
  }

  /** Most specific type of a molecule atom, or undefined when no type of its element fits. */
  assign(element: string, counts: BondCounts): string | undefined {
    const candidates = this.order[element];
    if (!candidates) return undefined;
    for (const label of candidates) {
      const rule = this.types[label]?.rule;
      if (rule && RULE_KEYS.every((k) => rule[k].length === 0 || rule[k].includes(counts[k]))) return label;
    }
    return undefined;
  }

  /** Element of a type (undefined for wildcards). */
  elementOf(type: string): string | undefined {
    return this.types[type]?.element ?? undefined;
  }

  /** Molecule types accepted by a group atom listing `groupTypes` (each type or a specific case of it). */
  accepted(groupTypes: readonly string[]): ReadonlySet<string> {
    const key = groupTypes.join('|');
    let set = this.compatible.get(key);
    if (!set) {
      const s = new Set<string>();
      for (const g of groupTypes) {
        s.add(g);
        for (const t of this.types[g]?.specific ?? []) s.add(t);
      }
      set = s;
      this.compatible.set(key, set);
    }
    return set;
  }
}
