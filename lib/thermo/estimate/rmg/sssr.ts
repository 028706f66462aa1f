// Smallest set of smallest rings (a minimum cycle basis) of an undirected graph, by Horton's
// candidate cycles (shortest path from a vertex to both ends of an edge) and GF(2) elimination.
// Rings come back as ordered cycles, smallest first.

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
  for (const root of vertices) {
    // BFS tree from root: parent pointers give one shortest path per vertex
    const parent = new Map<number, number>([[root, -1]]);
    const depth = new Map<number, number>([[root, 0]]);
    const queue = [root];
    for (let qi = 0; qi < queue.length; qi += 1) {
      const v = queue[qi]!;
      for (const w of [...adj.get(v)!].sort((x, y) => x - y)) {
        if (!parent.has(w)) {
          parent.set(w, v);
          depth.set(w, depth.get(v)! + 1);
          queue.push(w);
        }
      }
    }
    const pathTo = (v: number): number[] => {
      const p: number[] = [];
      for (let x = v; x !== -1; x = parent.get(x)!) p.push(x);
      return p; // v ... root
    };
    for (const [x, y] of coreEdges) {
      if (parent.get(x) === y || parent.get(y) === x) continue;
      const px = pathTo(x);
      const py = pathTo(y);
      const onX = new Set(px);
      if (py.some((v) => v !== root && onX.has(v))) continue;
      const cycle = [...px.reverse(), ...py.slice(0, -1)].reverse();
      // cycle: root ... y, x ... (back to root) — as an ordered ring
      const canonical = [...cycle].sort((a, b) => a - b).join(',');
      if (seenCycles.has(canonical)) continue;
      seenCycles.add(canonical);
      const bits = new Uint32Array(words);
      for (let i = 0; i < cycle.length; i += 1) {
        const e = edgeId(cycle[i]!, cycle[(i + 1) % cycle.length]!);
        bits[e >> 5]! |= 1 << (e & 31);
      }
      candidates.push({ cycle, bits });
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
    rings.push(cand.cycle);
  }
  return rings;
}
