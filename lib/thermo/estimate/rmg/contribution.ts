// One term of the group sum, with the tree entry that supplied its numbers.
import type { TreeEntry } from './group-tree';
import type { ThermoValues } from './thermo-values';

export interface Contribution {
  /** group file: group, ring, polycyclic, other, longDistanceInteraction_noncyclic/_cyclic */
  file: string;
  /** label of the entry whose numbers were used (after climbing, averaging and references) */
  label: string;
  sign: 1 | -1;
  values: ThermoValues;
  entry: TreeEntry<ThermoValues>;
  /** entry the descent reached, before climbing to data */
  reached: TreeEntry<ThermoValues>;
  /** centre atom(s) in the molecule graph */
  centres: number[];
  /** how a ring term was obtained, when not by a direct match */
  via?: 'averaged children' | 'bicyclic heuristic' | 'ring-pair heuristic';
  /** set where a value comes from outside the tree (Benson's alcohol pair) */
  sourceOverride?: string;
  /** parent compound a ring term's S° was completed from (entropy-completions.ts) */
  completedFrom?: string;
}
