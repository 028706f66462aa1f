// Subgraph monomorphism of a group graph into a molecule graph with fixed labelled centres:
// every group atom maps to a distinct molecule atom it accepts, every group bond onto a molecule
// bond of an allowed order; extra molecule atoms and bonds are allowed.
import { type GroupGraph, orderBit } from './group-graph';
import type { MolGraph } from './mol-graph';

interface Step {
  atom: number;
  /** an earlier group atom bonded to this one (candidates come from its image's neighbours), or -1 */
  anchor: number;
  /** bonds to earlier group atoms: [earlier atom, allowed-order mask] */
  checks: [number, number][];
}

const plans = new WeakMap<GroupGraph, Map<string, Step[]>>();

function plan(group: GroupGraph, fixed: readonly number[]): Step[] {
  let byKey = plans.get(group);
  if (!byKey) plans.set(group, (byKey = new Map()));
  const key = fixed.join(',');
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
    return { atom, anchor: i < fixed.length ? -1 : (earlier[0]?.to ?? -1), checks: earlier.map((e): [number, number] => [e.to, e.mask]) };
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
  return true;
}

/**
 * True when `group` matches `mol` with each labelled group atom named in `centres` placed on the
 * given molecule atom. Labels of the group absent from `centres` are unconstrained, and labels in
 * `centres` absent from the group are ignored.
 */
export function matchGroup(group: GroupGraph, mol: MolGraph, centres: Readonly<Record<string, number>>): boolean {
  const fixedGroup: number[] = [];
  const fixedMol: number[] = [];
  for (const [label, m] of Object.entries(centres)) {
    const g = group.labels.get(label);
    if (g === undefined) continue;
    if (!atomFits(group, g, mol, m) || fixedMol.includes(m)) return false;
    fixedGroup.push(g);
    fixedMol.push(m);
  }
  const steps = plan(group, fixedGroup);
  const image = new Int32Array(group.atoms.length).fill(-1);
  const used = new Uint8Array(mol.size);
  fixedGroup.forEach((g, i) => {
    image[g] = fixedMol[i]!;
    used[fixedMol[i]!] = 1;
  });

  const bondsOk = (step: Step, m: number): boolean =>
    step.checks.every(([other, mask]) => {
      const order = mol.order(m, image[other]!);
      return order !== undefined && (orderBit(order) & mask) !== 0;
    });

  const extend = (i: number): boolean => {
    if (i === steps.length) return true;
    const step = steps[i]!;
    if (i < fixedGroup.length) return bondsOk(step, image[step.atom]!) && extend(i + 1);
    const pool = step.anchor >= 0 ? mol.neighbours[image[step.anchor]!]! : mol.atoms.map((_, k) => k);
    for (const m of pool) {
      if (used[m] || !atomFits(group, step.atom, mol, m) || !bondsOk(step, m)) continue;
      image[step.atom] = m;
      used[m] = 1;
      if (extend(i + 1)) return true;
      used[m] = 0;
      image[step.atom] = -1;
    }
    return false;
  };
  return extend(0);
}
