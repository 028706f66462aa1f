// Subgraph monomorphism of a group graph into a molecule graph with fixed labelled centres:
// every group atom maps to a distinct molecule atom it accepts, every group bond onto a molecule
// bond of an allowed order; extra molecule atoms and bonds are allowed. Written without closures
// or per-call allocation: tree descents call it thousands of times per molecule.
import { type GroupGraph, orderBit } from './group-graph';
import type { MolGraph } from './mol-graph';

interface Step {
  atom: number;
  /** an earlier group atom bonded to this one (candidates come from its image's neighbours), or -1 */
  anchor: number;
  /** bonds to earlier group atoms, as parallel lists of the earlier atom and its allowed-order mask */
  checkAtoms: number[];
  checkMasks: number[];
}

const plans = new WeakMap<GroupGraph, Map<number, Step[]>>();

function plan(group: GroupGraph, fixed: readonly number[], key: number): Step[] {
  let byKey = plans.get(group);
  if (!byKey) plans.set(group, (byKey = new Map()));
  const cached = byKey.get(key);
  if (cached) return cached;
  const order: number[] = [...fixed];
  const placed = new Set(order);
  for (let i = 0; order.length < group.atoms.length; i += 1) {
    if (i >= order.length) {
      // disconnected remainder: start from its first atom
      const next = group.atoms.findIndex((_, k) => !placed.has(k));
      order.push(next);
      placed.add(next);
    }
    for (const { to } of group.adj[order[i]!]!) {
      if (!placed.has(to)) {
        placed.add(to);
        order.push(to);
      }
    }
  }
  const position = new Map(order.map((a, i) => [a, i]));
  const steps = order.map((atom, i) => {
    const earlier = group.adj[atom]!.filter((e) => position.get(e.to)! < i);
    return {
      atom,
      anchor: i < fixed.length ? -1 : (earlier[0]?.to ?? -1),
      checkAtoms: earlier.map((e) => e.to),
      checkMasks: earlier.map((e) => e.mask),
    };
  });
  byKey.set(key, steps);
  return steps;
}

function atomFits(group: GroupGraph, g: number, mol: MolGraph, m: number): boolean {
  const ga = group.atoms[g]!;
  const ma = mol.atoms[m]!;
  if (ma.type === undefined || !ga.accepted.has(ma.type)) return false;
  if (ga.u.length > 0 && !ga.u.includes(ma.radicals)) return false;
  if (ga.p.length > 0 && !ga.p.includes(ma.lonePairs)) return false;
  if (ga.c.length > 0 && !ga.c.includes(ma.charge)) return false;
  if (ga.inRing !== undefined && ga.inRing !== (mol.inRing[m] ?? false)) return false;
  // a group atom with k bonds needs a molecule atom with at least k
  return mol.neighbours[m]!.length >= group.adj[g]!.length;
}

// scratch state of the current search (the matcher is never re-entered during a search)
let image = new Int32Array(64);
let used = new Uint8Array(256);
let steps: Step[] = [];
let nFixed = 0;
let sGroup: GroupGraph;
let sMol: MolGraph;

function bondsOk(step: Step, m: number): boolean {
  for (let k = 0; k < step.checkAtoms.length; k += 1) {
    const order = sMol.order(m, image[step.checkAtoms[k]!]!);
    if (order === undefined || (orderBit(order) & step.checkMasks[k]!) === 0) return false;
  }
  return true;
}

function extend(i: number): boolean {
  if (i === steps.length) return true;
  const step = steps[i]!;
  if (i < nFixed) return bondsOk(step, image[step.atom]!) && extend(i + 1);
  if (step.anchor >= 0) {
    const pool = sMol.neighbours[image[step.anchor]!]!;
    for (let k = 0; k < pool.length; k += 1) if (tryAtom(i, step, pool[k]!)) return true;
  } else {
    for (let m = 0; m < sMol.size; m += 1) if (tryAtom(i, step, m)) return true;
  }
  return false;
}

function tryAtom(i: number, step: Step, m: number): boolean {
  if (used[m] || !atomFits(sGroup, step.atom, sMol, m) || !bondsOk(step, m)) return false;
  image[step.atom] = m;
  used[m] = 1;
  if (extend(i + 1)) {
    used[m] = 0;
    return true;
  }
  used[m] = 0;
  image[step.atom] = -1;
  return false;
}

function neighboursSuffice(group: GroupGraph, g: number, mol: MolGraph, m: number): boolean {
  const needs = group.needs.get(g);
  if (!needs) return true;
  const have = mol.neighbourElements(m);
  if ((have.get('heavy') ?? 0) < needs.heavy) return false;
  for (const [e, n] of needs.byElement) if ((have.get(e) ?? 0) < n) return false;
  if (needs.cycles.length > 0) {
    const through = mol.cycleLengthsThrough(m);
    if (through && !needs.cycles.every((k) => through.has(k))) return false;
  }
  return true;
}

const fixedGroup: number[] = [];
const fixedMol: number[] = [];

/**
 * True when `group` matches `mol` with each labelled group atom named in `centres` placed on the
 * given molecule atom. Labels of the group absent from `centres` are unconstrained, and labels in
 * `centres` absent from the group are ignored.
 */
export function matchGroup(group: GroupGraph, mol: MolGraph, centres: Readonly<Record<string, number>>): boolean {
  fixedGroup.length = 0;
  fixedMol.length = 0;
  let key = 0;
  for (const label in centres) {
    const g = group.labels.get(label);
    if (g === undefined) continue;
    const m = centres[label]!;
    if (!atomFits(group, g, mol, m) || fixedMol.includes(m) || !neighboursSuffice(group, g, mol, m)) return false;
    fixedGroup.push(g);
    fixedMol.push(m);
    key = key * 128 + g + 1;
  }
  if (image.length < group.atoms.length) image = new Int32Array(group.atoms.length * 2);
  if (used.length < mol.size) used = new Uint8Array(mol.size * 2);
  used.fill(0, 0, mol.size);
  image.fill(-1, 0, group.atoms.length);
  for (let k = 0; k < fixedGroup.length; k += 1) {
    image[fixedGroup[k]!] = fixedMol[k]!;
    used[fixedMol[k]!] = 1;
  }
  steps = plan(group, fixedGroup, key);
  nFixed = fixedGroup.length;
  sGroup = group;
  sMol = mol;
  return extend(0);
}
