// Rotational symmetry number σ (external × internal, free-rotor convention) and chirality from the
// molecular graph. σ is the number of graph automorphisms that a proper rotation plus internal
// rotations can realise:
// - at a tetrahedral atom (and a pyramidal N, S or P with a lone pair) the permutation of its
//   neighbours must be even;
// - an acyclic double bond keeps its cis/trans relations;
// - a saturated six-membered ring is a chair (D3d for cyclohexane): a ring map is a rotation only
//   if (orientation kept) = (up/down alternation kept).
// A molecule is chiral when no automorphism realises a reflection (all those parities odd); an
// amine N is left out of that test because it inverts quickly.
// For an unspecified stereo element one reference configuration is taken (equivalent atoms given
// the same handedness), so diastereomers are not told apart.
import type { MolGraph } from './rmg/mol-graph';

export interface SymmetryResult {
  /** external × internal rotational symmetry number */
  symmetryNumber: number;
  /** 2 for a chiral molecule (a racemate), else 1 */
  opticalIsomers: 1 | 2;
}

type CentreKind = 'tetrahedral' | 'amine' | 'pyramidal';

interface DoubleBond {
  p: number;
  q: number;
  subsP: number[];
  subsQ: number[];
}

const pairKey = (a: number, b: number): string => (a < b ? `${a}-${b}` : `${b}-${a}`);

/** Bond classes insensitive to Kekulé choice and to nitro-type charge separation. */
function bondClasses(mol: MolGraph, aromatic: ReadonlySet<string>): { bond: Map<string, number>; charge: number[] } {
  const bond = new Map<string, number>();
  const charge = mol.atoms.map((a) => a.charge);
  for (let a = 0; a < mol.size; a += 1) for (const b of mol.neighbours[a]!) if (a < b) bond.set(pairKey(a, b), aromatic.has(pairKey(a, b)) ? 1.5 : mol.order(a, b)!);
  for (let a = 0; a < mol.size; a += 1) {
    if (mol.atom(a).charge !== 1) continue;
    const ns = mol.neighbours[a]!;
    const minus = ns.filter((n) => mol.atom(n).charge === -1 && mol.order(a, n) === 1);
    for (const m of minus) {
      const partner = ns.find((n) => n !== m && mol.order(a, n) === 2 && mol.atom(n).element === mol.atom(m).element);
      if (partner === undefined) continue;
      bond.set(pairKey(a, m), 1.5);
      bond.set(pairKey(a, partner), 1.5);
      charge[m] = 0;
      charge[a] = 0;
    }
  }
  return { bond, charge };
}

/** Colour refinement: atoms end in the same class only if nothing local tells them apart. */
function refine(mol: MolGraph, bond: Map<string, number>, charge: number[]): number[] {
  let colour = mol.atoms.map((a, i) => `${a.element}${charge[i]}/${mol.neighbours[i]!.length}`);
  let classes = new Set(colour).size;
  for (let round = 0; round < mol.size; round += 1) {
    const next = colour.map((c, i) => `${c}|${mol.neighbours[i]!.map((j) => `${bond.get(pairKey(i, j))}:${colour[j]}`).sort().join(',')}`);
    const ranks = [...new Set(next)].sort();
    const index = new Map(ranks.map((s, k) => [s, String(k)]));
    colour = next.map((s) => index.get(s)!);
    if (ranks.length === classes) break;
    classes = ranks.length;
  }
  return colour.map(Number);
}

function parityOf(perm: number[]): number {
  let swaps = 0;
  const seen = perm.map(() => false);
  for (let i = 0; i < perm.length; i += 1) {
    if (seen[i]) continue;
    let len = 0;
    for (let j = i; !seen[j]; j = perm[j]!) {
      seen[j] = true;
      len += 1;
    }
    swaps += len - 1;
  }
  return swaps % 2;
}

export function molecularSymmetry(mol: MolGraph, aromaticBonds: ReadonlySet<string>): SymmetryResult {
  const n = mol.size;
  const { bond, charge } = bondClasses(mol, aromaticBonds);
  const colour = refine(mol, bond, charge);
  const byColour = (a: number, b: number): number => colour[a]! - colour[b]! || a - b;
  const refOrder = mol.neighbours.map((ns) => [...ns].sort(byColour));
  const onAromatic = (a: number): boolean => mol.neighbours[a]!.some((b) => bond.get(pairKey(a, b)) === 1.5);

  const kind: (CentreKind | undefined)[] = mol.atoms.map((atom, a) => {
    const degree = mol.neighbours[a]!.length;
    if (degree === 4) return 'tetrahedral';
    if (degree === 3 && atom.lonePairs > 0 && !onAromatic(a) && ['N', 'P', 'S'].includes(atom.element)) return atom.element === 'N' ? 'amine' : 'pyramidal';
    return undefined;
  });

  const doubles: DoubleBond[] = [];
  const doubleByKey = new Map<string, DoubleBond>();
  const ringBond = (a: number, b: number): boolean => mol.rings.some((r) => r.includes(a) && r.includes(b));
  for (let p = 0; p < n; p += 1) {
    for (const q of mol.neighbours[p]!) {
      if (q < p || bond.get(pairKey(p, q)) !== 2 || ringBond(p, q)) continue;
      const others = (x: number, y: number): number[] => mol.neighbours[x]!.filter((z) => z !== y).sort(byColour);
      const subsP = others(p, q);
      const subsQ = others(q, p);
      const cumulated = [p, q].some((x) => mol.neighbours[x]!.some((z) => z !== p && z !== q && (bond.get(pairKey(x, z)) ?? 1) >= 2));
      if (cumulated || subsP.length === 0 || subsQ.length === 0 || (subsP.length < 2 && subsQ.length < 2)) continue;
      const d = { p, q, subsP, subsQ };
      doubles.push(d);
      doubleByKey.set(pairKey(p, q), d);
    }
  }
  // only an isolated saturated six-ring is treated as a chair (fused and cage rings keep the plain count)
  const isolated = (r: number[]): boolean => mol.rings.every((o) => o === r || !o.some((a) => r.includes(a)));
  const chairs = mol.rings.filter(
    (r) =>
      r.length === 6 &&
      isolated(r) &&
      r.every((a, i) => mol.order(a, r[(i + 1) % 6]!) === 1) &&
      r.every((a) => kind[a] !== undefined || mol.neighbours[a]!.length === 2),
  );
  const chairBySet = new Map(chairs.map((r) => [[...r].sort((x, y) => x - y).join(','), r]));

  // search order: breadth first from the rarest colour
  const counts = new Map<number, number>();
  colour.forEach((c) => counts.set(c, (counts.get(c) ?? 0) + 1));
  const start = [...Array(n).keys()].sort((a, b) => counts.get(colour[a]!)! - counts.get(colour[b]!)! || a - b)[0] ?? 0;
  const order = [start];
  const placed = new Set(order);
  for (let i = 0; i < order.length; i += 1) {
    for (const b of mol.neighbours[order[i]!]!) {
      if (placed.has(b)) continue;
      placed.add(b);
      order.push(b);
    }
  }
  const position = new Int32Array(n);
  order.forEach((a, i) => (position[a] = i));
  const last = (atoms: number[]): number => Math.max(...atoms.map((a) => position[a]!));
  // each constraint is checked at the step where the last atom it involves is placed
  const centresAt: number[][] = order.map(() => []);
  kind.forEach((k, a) => k && centresAt[last([a, ...mol.neighbours[a]!])]!.push(a));
  const doublesAt: DoubleBond[][] = order.map(() => []);
  for (const d of doubles) doublesAt[last([d.p, d.q, d.subsP[0]!, d.subsQ[0]!])]!.push(d);
  const chairsAt: number[][][] = order.map(() => []);
  for (const r of chairs) chairsAt[last(r)]!.push(r);
  const anchors = order.map((v, i) => (i === 0 ? -1 : mol.neighbours[v]!.find((b) => position[b]! < i)!));
  const earlier = order.map((v, i) => mol.neighbours[v]!.filter((b) => position[b]! < i));

  const image = new Int32Array(n).fill(-1);
  const used = new Uint8Array(n);

  let ref = refOrder;
  const centreParity = (a: number): number => {
    const target = ref[image[a]!]!;
    return parityOf(ref[a]!.map((x) => target.indexOf(image[x]!)));
  };
  const doubleKept = (d: DoubleBond): boolean => {
    const img = doubleByKey.get(pairKey(image[d.p]!, image[d.q]!));
    if (!img) return false;
    const [sp, sq] = img.p === image[d.p] ? [img.subsP, img.subsQ] : [img.subsQ, img.subsP];
    return sp.indexOf(image[d.subsP[0]!]!) === sq.indexOf(image[d.subsQ[0]!]!);
  };
  const chairSign = (r: number[]): number => {
    const target = chairBySet.get(r.map((a) => image[a]!).sort((x, y) => x - y).join(','));
    if (!target) return 0;
    const k = target.indexOf(image[r[0]!]!);
    const o = image[r[1]!] === target[(k + 1) % 6] ? 1 : -1;
    return o * (k % 2 === 0 ? 1 : -1);
  };
  /** Constraints completed at step i hold for a rotation (`proper`) or for a reflection. */
  const holds = (i: number, proper: boolean): boolean => {
    for (const a of centresAt[i]!) {
      const odd = centreParity(a) === 1;
      if (proper ? odd : !odd && kind[a] !== 'amine') return false;
    }
    if (!doublesAt[i]!.every(doubleKept)) return false;
    return chairsAt[i]!.every((r) => chairSign(r) === (proper ? 1 : -1));
  };

  let budget = 200_000;
  const candidateFits = (i: number, m: number): boolean => {
    const v = order[i]!;
    if (used[m] || colour[m] !== colour[v]) return false;
    if (!earlier[i]!.every((b) => bond.get(pairKey(m, image[b]!)) === bond.get(pairKey(v, b)))) return false;
    let mapped = 0;
    for (const b of mol.neighbours[m]!) if (used[b]) mapped += 1;
    return mapped === earlier[i]!.length;
  };
  /** Whether the partial map (steps < i) extends to a full automorphism of the given kind. */
  const extendable = (i: number, proper: boolean): boolean => {
    if (i === n) return true;
    if ((budget -= 1) < 0) return false;
    const pool = anchors[i]! < 0 ? order : mol.neighbours[image[anchors[i]!]!]!;
    for (const m of pool) {
      if (!candidateFits(i, m)) continue;
      image[order[i]!] = m;
      used[m] = 1;
      const ok = holds(i, proper) && extendable(i + 1, proper);
      used[m] = 0;
      image[order[i]!] = -1;
      if (ok) return true;
    }
    return false;
  };

  // |G| = product over the search order of the orbit of each atom under the stabiliser of the
  // atoms before it (orbit–stabiliser), so the group is counted without listing it.
  const groupOrder = (): number => {
    let sigma = 1;
    for (let i = 0; i < n; i += 1) {
      const v = order[i]!;
      const pool = anchors[i]! < 0 ? order : mol.neighbours[anchors[i]!]!;
      let orbit = 0;
      for (const m of pool) {
        if (m === v) {
          orbit += 1;
          continue;
        }
        if (!candidateFits(i, m)) continue;
        image[v] = m;
        used[m] = 1;
        if (holds(i, true) && extendable(i + 1, true)) orbit += 1;
        used[m] = 0;
        image[v] = -1;
      }
      sigma *= orbit;
      image[v] = v;
      used[v] = 1;
    }
    image.fill(-1);
    used.fill(0);
    return sigma;
  };

  // Ring centres that the graph cannot tell apart get their handedness chosen jointly: an
  // arbitrary choice can describe a cage that cannot exist (adamantane with one bridgehead
  // inverted), so the most symmetric choice is kept.
  // (a centre with two alike exocyclic neighbours, such as a ring CH2, can flip by swapping them)
  const flipsFreely = (a: number): boolean => {
    const exo = mol.neighbours[a]!.filter((b) => !mol.inRing[b]).map((b) => colour[b]!);
    return new Set(exo).size < exo.length;
  };
  const ringCentres = kind.map((k, a) => (k !== undefined && mol.inRing[a] && !flipsFreely(a) ? a : -1)).filter((a) => a >= 0);
  const free = ringCentres.filter((a) => ringCentres.some((b) => b !== a && colour[b] === colour[a])).slice(1, 9);
  let best = { sigma: groupOrder(), ref };
  for (let mask = 1; mask < 1 << free.length; mask += 1) {
    ref = refOrder.map((ns, a) => {
      const bit = free.indexOf(a);
      return bit >= 0 && (mask >> bit) & 1 ? [ns[1]!, ns[0]!, ...ns.slice(2)] : ns;
    });
    const sigma = groupOrder();
    if (sigma > best.sigma) best = { sigma, ref };
  }
  ref = best.ref;
  const achiral = extendable(0, false);
  return { symmetryNumber: best.sigma, opticalIsomers: achiral ? 1 : 2 };
}
