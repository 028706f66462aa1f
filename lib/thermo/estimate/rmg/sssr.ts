// Smallest set of smallest rings (a minimum cycle basis) of an undirected graph, by Horton's
// candidate cycles (shortest path from a vertex to both ends of an edge) and GF(2) elimination.
// Rings come back as ordered cycles, smallest first, each from its lowest-numbered atom (the ring
// look-up breaks ties between equally deep matches by atom order, as RMG does).

interface Candidate {
  cycle: number[];
  bits: Uint32Array;
}

/** Removes vertices of degree < 2 repeatedly; what stays is the union of all cycles. */
function ringCore(adj: Map<number, Set<number>>): void {
  const queue = [...adj.keys()].filter((v) => adj.get(v)!.size < 2);
  while (queue.length > 0) {
    const v = queue.pop()!;
    const ns = adj.get(v);
    if (!ns) continue;
    for (const w of ns) {
      const wn = adj.get(w)!;
      wn.delete(v);
      if (wn.size < 2) queue.push(w);
    }
    adj.delete(v);
  }
}

function components(adj: Map<number, Set<number>>): number {
  const seen = new Set<number>();
  let count = 0;
  for (const start of adj.keys()) {
    if (seen.has(start)) continue;
    count += 1;
    const stack = [start];
    seen.add(start);
    while (stack.length > 0) {
      for (const w of adj.get(stack.pop()!)!) {
        if (seen.has(w)) continue;
        seen.add(w);
        stack.push(w);
      }
    }
  }
  return count;
}

/** The cycle from its lowest-numbered atom, towards the lower-numbered of that atom's two ring neighbours. */
function canonicalCycle(cycle: number[]): number[] {
  const n = cycle.length;
  const k = cycle.indexOf(Math.min(...cycle));
  const forward = cycle[(k + 1) % n]! < cycle[(k - 1 + n) % n]!;
  return cycle.map((_, i) => cycle[forward ? (k + i) % n : (k - i + n) % n]!);
}

export function smallestRings(vertexCount: number, edges: readonly (readonly [number, number])[]): number[][] {
  const adj = new Map<number, Set<number>>();
  for (const [a, b] of edges) {
    if (!adj.has(a)) adj.set(a, new Set());
    if (!adj.has(b)) adj.set(b, new Set());
    adj.get(a)!.add(b);
    adj.get(b)!.add(a);
  }
  ringCore(adj);
  if (adj.size === 0) return [];
  const edgeIndex = new Map<number, number>();
  const coreEdges: [number, number][] = [];
  for (const [a, ns] of adj) {
    for (const b of ns) {
      if (a < b) {
        edgeIndex.set(a * vertexCount + b, coreEdges.length);
        coreEdges.push([a, b]);
      }
    }
  }
  const edgeId = (a: number, b: number): number => edgeIndex.get(a < b ? a * vertexCount + b : b * vertexCount + a)!;
  const wanted = coreEdges.length - adj.size + components(adj);
  const words = Math.ceil(coreEdges.length / 32);

  const candidates: Candidate[] = [];
  const seenCycles = new Set<string>();
  const vertices = [...adj.keys()].sort((x, y) => x - y);
  const sortedAdj = new Map(vertices.map((v) => [v, [...adj.get(v)!].sort((x, y) => x - y)]));
  const parent = new Int32Array(vertexCount);
  const seen = new Int32Array(vertexCount).fill(-1);
  const onX = new Int32Array(vertexCount).fill(-1);
  for (const root of vertices) {
    // BFS tree from root: parent pointers give one shortest path per vertex
    parent[root] = -1;
    seen[root] = root;
    const queue = [root];
    for (let qi = 0; qi < queue.length; qi += 1) {
      const v = queue[qi]!;
      for (const w of sortedAdj.get(v)!) {
        if (seen[w] === root) continue;
        seen[w] = root;
        parent[w] = v;
        queue.push(w);
      }
    }
    for (let e = 0; e < coreEdges.length; e += 1) {
      const [x, y] = coreEdges[e]!;
      if (parent[x] === y || parent[y] === x) continue;
      // the two tree paths must meet only at the root
      for (let v = x; v !== -1; v = parent[v]!) onX[v] = e + root * coreEdges.length;
      let disjoint = true;
      for (let v = y; v !== root; v = parent[v]!) {
        if (onX[v] === e + root * coreEdges.length) {
          disjoint = false;
          break;
        }
      }
      if (!disjoint) continue;
      const bits = new Uint32Array(words);
      const mark = (a: number, b: number): void => {
        const id = edgeId(a, b);
        bits[id >> 5]! |= 1 << (id & 31);
      };
      mark(x, y);
      for (let v = x; parent[v] !== -1; v = parent[v]!) mark(v, parent[v]!);
      for (let v = y; parent[v] !== -1; v = parent[v]!) mark(v, parent[v]!);
      const key = bits.join(',');
      if (seenCycles.has(key)) continue;
      seenCycles.add(key);
      // ordered ring: root ... x, y ... (back to root)
      const px: number[] = [];
      for (let v = x; v !== -1; v = parent[v]!) px.push(v);
      const py: number[] = [];
      for (let v = y; v !== root; v = parent[v]!) py.push(v);
      candidates.push({ cycle: [...px.reverse(), ...py], bits });
    }
  }
  candidates.sort((a, b) => a.cycle.length - b.cycle.length);

  // Gaussian elimination over GF(2): keep a candidate when it is independent of those kept.
  const basis: { pivot: number; bits: Uint32Array }[] = [];
  const rings: number[][] = [];
  for (const cand of candidates) {
    if (rings.length === wanted) break;
    const v = Uint32Array.from(cand.bits);
    for (const row of basis) {
      if ((v[row.pivot >> 5]! >>> (row.pivot & 31)) & 1) for (let w = 0; w < words; w += 1) v[w]! ^= row.bits[w]!;
    }
    let pivot = -1;
    for (let w = 0; w < words && pivot < 0; w += 1) {
      if (v[w] !== 0) pivot = w * 32 + (31 - Math.clz32(v[w]! & -v[w]!));
    }
    if (pivot < 0) continue;
    basis.push({ pivot, bits: v });
    rings.push(canonicalCycle(cand.cycle));
  }
  return rings;
}
