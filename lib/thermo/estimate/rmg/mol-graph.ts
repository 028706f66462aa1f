// Molecule graph in RMG's representation: every H an atom, bond orders 1, 2, 3 and 1.5 for the
// benzene (B) bonds of RMG-aromatic rings, lone pairs from the electron count, RMG atom types.
import type { AtomTypeTable, BondCounts } from './atom-types';
import { cycleLengths, MAX_GROUP_CYCLE } from './cycle-lengths';
import { smallestRings } from './sssr';

export type BondOrder = 1 | 1.5 | 2 | 3;

export interface MolAtom {
  element: string;
  charge: number;
  radicals: number;
  lonePairs: number;
  /** most specific RMG atom type; undefined when none fits (element outside the rules) */
  type: string | undefined;
}

const VALENCE_ELECTRONS: Record<string, number> = { H: 1, Li: 1, C: 4, Si: 4, N: 5, P: 5, O: 6, S: 6, F: 7, Cl: 7, Br: 7, I: 7 };
/** Bonds an uncharged atom forms when "free valences are filled with H". */
const STANDARD_VALENCE: Record<string, number> = { H: 1, C: 4, Si: 4, N: 3, P: 3, O: 2, S: 2, F: 1, Cl: 1, Br: 1, I: 1 };
const ONIUM = new Set(['N', 'P', 'O', 'S']);
export const HALOGENS: ReadonlySet<string> = new Set(['F', 'Cl', 'Br', 'I']);

const key = (a: number, b: number): number => (a < b ? a * 65536 + b : b * 65536 + a);

export class MolGraph {
  readonly atoms: MolAtom[] = [];
  readonly neighbours: number[][] = [];
  private readonly orders = new Map<number, BondOrder>();
  /** smallest set of smallest rings, each an ordered cycle of atom indices */
  rings: number[][] = [];
  inRing: boolean[] = [];
  private elementCounts: Map<string, number>[] | undefined;
  private cycles: (Set<number>[] | null) | undefined;

  addAtom(element: string, charge = 0, radicals = 0): number {
    this.atoms.push({ element, charge, radicals, lonePairs: 0, type: undefined });
    this.neighbours.push([]);
    return this.atoms.length - 1;
  }

  addBond(a: number, b: number, order: BondOrder): void {
    this.cycles = undefined;
    this.elementCounts = undefined;
    this.neighbours[a]!.push(b);
    this.neighbours[b]!.push(a);
    this.orders.set(key(a, b), order);
  }

  order(a: number, b: number): BondOrder | undefined {
    return this.orders.get(key(a, b));
  }

  setOrder(a: number, b: number, order: BondOrder): void {
    this.orders.set(key(a, b), order);
  }

  get size(): number {
    return this.atoms.length;
  }

  atom(i: number): MolAtom {
    return this.atoms[i]!;
  }

  isHeavy(i: number): boolean {
    return this.atoms[i]!.element !== 'H';
  }

  /** Neighbour counts by element, and under "heavy" the non-H neighbours (cached; the graph is final). */
  neighbourElements(i: number): Map<string, number> {
    if (!this.elementCounts || this.elementCounts.length !== this.size) {
      this.elementCounts = this.neighbours.map((ns) => {
        const m = new Map<string, number>();
        for (const j of ns) {
          const e = this.atoms[j]!.element;
          m.set(e, (m.get(e) ?? 0) + 1);
          if (e !== 'H') m.set('heavy', (m.get('heavy') ?? 0) + 1);
        }
        return m;
      });
    }
    return this.elementCounts[i]!;
  }

  /** Simple-cycle lengths (≤ 12) through atom i; undefined when too many cycles to list. */
  cycleLengthsThrough(i: number): ReadonlySet<number> | undefined {
    if (this.cycles === undefined) {
      const ringAtoms = this.inRing.flatMap((r, k) => (r ? [k] : []));
      this.cycles = cycleLengths(this.neighbours, ringAtoms, MAX_GROUP_CYCLE) ?? null;
    }
    return this.cycles === null ? undefined : this.cycles[i];
  }

  bondCounts(i: number): BondCounts {
    const c: BondCounts = { single: 0, all_double: 0, r_double: 0, o_double: 0, s_double: 0, triple: 0, quadruple: 0, benzene: 0, lone_pairs: 0, charge: 0 };
    for (const j of this.neighbours[i]!) {
      const o = this.order(i, j);
      if (o === 1) c.single += 1;
      else if (o === 1.5) c.benzene += 1;
      else if (o === 3) c.triple += 1;
      else if (o === 2) {
        c.all_double += 1;
        const el = this.atoms[j]!.element;
        if (el === 'O') c.o_double += 1;
        else if (el === 'S') c.s_double += 1;
        else c.r_double += 1;
      }
    }
    c.lone_pairs = this.atoms[i]!.lonePairs;
    c.charge = this.atoms[i]!.charge;
    return c;
  }

  bondOrderSum(i: number): number {
    let s = 0;
    for (const j of this.neighbours[i]!) s += this.order(i, j) ?? 0;
    return s;
  }

  /** Lone pairs from the electron count (B counted 1.5, the sum floored), then RMG atom types. */
  assignTypes(table: AtomTypeTable): void {
    this.atoms.forEach((atom, i) => {
      const valence = VALENCE_ELECTRONS[atom.element];
      atom.lonePairs = valence === undefined || atom.element === 'H' ? 0 : Math.max(0, (valence - atom.radicals - atom.charge - Math.floor(this.bondOrderSum(i))) / 2);
    });
    this.atoms.forEach((atom, i) => {
      atom.type = atom.element === 'H' ? (atom.charge === 0 ? 'H0' : 'H+') : table.assign(atom.element, this.bondCounts(i));
    });
  }

  /** SSSR on the heavy-atom graph and ring membership. */
  perceiveRings(): void {
    const edges: [number, number][] = [];
    this.neighbours.forEach((ns, a) => {
      for (const b of ns) if (a < b && this.isHeavy(a) && this.isHeavy(b)) edges.push([a, b]);
    });
    this.rings = smallestRings(this.size, edges);
    this.cycles = undefined;
    this.inRing = this.atoms.map(() => false);
    for (const ring of this.rings) for (const a of ring) this.inRing[a] = true;
  }

  /** Adds H until every neutral atom reaches its standard valence (B bonds count 1.5, floored). */
  saturate(): void {
    const n = this.size;
    for (let i = 0; i < n; i += 1) {
      const atom = this.atoms[i]!;
      const valence = STANDARD_VALENCE[atom.element];
      if (valence === undefined || atom.element === 'H') continue;
      // a cation of N, P, O or S gains a bond (ammonium, oxonium); other ions lose one
      const shift = atom.charge > 0 && ONIUM.has(atom.element) ? atom.charge : -Math.abs(atom.charge);
      const missing = valence + shift - atom.radicals - Math.floor(this.bondOrderSum(i));
      for (let k = 0; k < missing; k += 1) this.addBond(i, this.addAtom('H'), 1);
    }
  }

  /** Copy of the atoms in `keep` and the bonds `bondFilter` accepts among them; returns the map old → new. */
  subgraph(keep: readonly number[], bondFilter: (a: number, b: number) => boolean = () => true): { graph: MolGraph; map: Map<number, number> } {
    const graph = new MolGraph();
    const map = new Map<number, number>();
    for (const i of keep) {
      const a = this.atoms[i]!;
      map.set(i, graph.addAtom(a.element, a.charge, a.radicals));
    }
    for (const i of keep) {
      for (const j of this.neighbours[i]!) {
        const ni = map.get(i)!;
        const nj = map.get(j);
        if (nj !== undefined && i < j && bondFilter(i, j)) graph.addBond(ni, nj, this.order(i, j)!);
      }
    }
    return { graph, map };
  }
}
