// Extents ξ (mol of reaction as written) that make targetAmount of the target, propagated backwards
// through the links and divided by yields. A step feeding several species sets ξ by the most demanding one.
import type { RouteLink } from '../../schemas/route-evaluate';
import { ThermoError, isThermoError } from '../errors';
import type { SpeciesLookup } from '../species-library';
import { routeError } from './route-errors';
import type { RouteGraph } from './route-graph';
import type { RouteWarning } from './route-types';
import { nuOf, speciesKey, type Stoichiometry } from './stoichiometry';

export interface ExtentInput {
  graph: RouteGraph;
  links: readonly RouteLink[];
  /** null when the step's equation cannot be parsed */
  nu: readonly (Stoichiometry | null)[];
  yields: readonly number[];
  target: string;
  targetAmount_mol: number;
  lookup: SpeciesLookup;
}

export interface ExtentResult {
  finalStep: number;
  extents: (number | null)[];
  /** steps with a path (through links) to the final step */
  connected: boolean[];
  warnings: RouteWarning[];
}

const list = (xs: readonly string[]): string => xs.join(', ');

function linkKeys(links: readonly RouteLink[], lookup: SpeciesLookup): (string | null)[] {
  return links.map((l) => {
    try {
      return speciesKey(l.species, lookup);
    } catch (err) {
      if (isThermoError(err)) return null;
      throw err;
    }
  });
}

function findFinalStep(input: ExtentInput, keys: readonly (string | null)[], targetKey: string): number {
  const { graph, nu } = input;
  const ids = graph.ids;
  const makes = ids.map((_, i) => nu[i] !== null && nuOf(nu[i]!, targetKey) > 0);
  let candidates = ids.map((_, i) => i).filter((i) => makes[i] && !graph.outgoing[i]!.some((li) => keys[li] === targetKey));
  if (candidates.length > 1) {
    const sinks = candidates.filter((i) => graph.outgoing[i]!.length === 0);
    if (sinks.length > 0) candidates = sinks;
  }
  if (candidates.length === 1) return candidates[0]!;
  if (candidates.length === 0) {
    const unread = ids.filter((_, i) => nu[i] === null);
    const why = unread.length ? ` (steps ${list(unread)} could not be read)` : '';
    throw routeError(`No step makes the target ${targetKey} without passing it on${why}`, 'target', 'name a product of the final step as the target');
  }
  const names = candidates.map((i) => ids[i]!);
  throw routeError(
    `Several steps make the target ${targetKey} and pass nothing on: ${list(names)}`,
    'target',
    'link all but one of them onward, or evaluate the branches as separate routes',
    { candidates: names },
  );
}

function connectedTo(graph: RouteGraph, ends: readonly { from: number }[], finalStep: number): boolean[] {
  const seen = graph.ids.map(() => false);
  const stack = [finalStep];
  seen[finalStep] = true;
  while (stack.length > 0) {
    const s = stack.pop()!;
    for (const li of graph.incoming[s]!) {
      const p = ends[li]!.from;
      if (!seen[p]) {
        seen[p] = true;
        stack.push(p);
      }
    }
  }
  return seen;
}

const bodyOf = (key: string): string => key.replace(/\([^()]*\)$/, '');

/** Another key of `nu` with the sign wanted that is the same substance as `key` in another phase. */
function otherPhase(nu: Stoichiometry, key: string, sign: 1 | -1, lookup: SpeciesLookup): string | null {
  const record = lookup.get(key);
  for (const k of nu.keys()) {
    if (k === key || Math.sign(nuOf(nu, k)) !== sign) continue;
    const other = lookup.get(k);
    const same = record?.structure && other?.structure ? record.structure.inchikey === other.structure.inchikey : bodyOf(k) === bodyOf(key);
    if (same) return k;
  }
  return null;
}

function phaseChangeWarning(l: RouteLink, made: string, used: string, lookup: SpeciesLookup): RouteWarning {
  const a = lookup.get(made);
  const b = lookup.get(used);
  const dG = a && b ? ` (ΔG° at 298.15 K: ${(b.dfG_kJ - a.dfG_kJ).toFixed(1)} kJ/mol)` : '';
  return {
    code: 'LINK_PHASE',
    message: `Link ${l.from} → ${l.to}: ${l.from} makes ${made} but ${l.to} uses ${used}. A phase change sits between them${dG}; add it as a step (${made} -> ${used}) or write one phase in both. The link is refused, so ${l.from} and the steps before it carry no extent and are not in the totals.`,
    steps: [l.from, l.to],
    species: [made, used],
  };
}

/** A link carries extent only when its species is made by `from` and used by `to`. */
function linkValidity(input: ExtentInput, keys: readonly (string | null)[], warnings: RouteWarning[]): boolean[] {
  const { links, nu, graph } = input;
  return links.map((l, li) => {
    const from = graph.indexOf.get(l.from)!;
    const to = graph.indexOf.get(l.to)!;
    const key = keys[li] ?? null;
    if (key === null) {
      warnings.push({ code: 'LINK_SPECIES', message: `Link ${l.from} → ${l.to}: cannot read the species "${l.species}"; the link is ignored`, steps: [l.from, l.to], species: [l.species] });
      return false;
    }
    if (nu[from] === null || nu[to] === null) return false;
    const problems: string[] = [];
    const made = nuOf(nu[from]!, key) > 0;
    const used = nuOf(nu[to]!, key) < 0;
    if (made && used) return true;
    // The same substance in another phase on one side: say so, never drop the link silently.
    const madeAs = made ? key : otherPhase(nu[from]!, key, 1, input.lookup);
    const usedAs = used ? key : otherPhase(nu[to]!, key, -1, input.lookup);
    if (madeAs && usedAs && madeAs !== usedAs) {
      warnings.push(phaseChangeWarning(l, madeAs, usedAs, input.lookup));
      return false;
    }
    if (!made) problems.push(`${l.from} does not produce it`);
    if (!used) problems.push(`${l.to} does not consume it`);
    warnings.push({
      code: 'LINK_SPECIES',
      message: `Link ${l.from} → ${l.to} carries ${key}, but ${problems.join(' and ')}; the link is ignored for extents`,
      steps: [l.from, l.to],
      species: [key],
    });
    return false;
  });
}

export function computeExtents(input: ExtentInput): ExtentResult {
  const { graph, links, nu, yields } = input;
  const ids = graph.ids;
  const targetKey = speciesKey(input.target, input.lookup);
  const keys = linkKeys(links, input.lookup);
  const ends = links.map((l) => ({ from: graph.indexOf.get(l.from)!, to: graph.indexOf.get(l.to)! }));
  const warnings: RouteWarning[] = [];
  const finalStep = findFinalStep(input, keys, targetKey);
  const connected = connectedTo(graph, ends, finalStep);
  const valid = linkValidity(input, keys, warnings);

  const extents: (number | null)[] = ids.map(() => null);
  extents[finalStep] = input.targetAmount_mol / (nuOf(nu[finalStep]!, targetKey) * yields[finalStep]!);

  // Suppliers of species X to consumer c share c's need of X equally.
  const suppliers = new Map<string, number>();
  links.forEach((_, li) => {
    if (valid[li]) suppliers.set(`${ends[li]!.to}|${keys[li]}`, (suppliers.get(`${ends[li]!.to}|${keys[li]}`) ?? 0) + 1);
  });

  const order = graph.order;
  for (let k = order.length - 1; k >= 0; k--) {
    const s = order[k]!;
    if (s === finalStep || !connected[s]) continue;
    const need = new Map<string, number>();
    const blocked: string[] = [];
    for (const li of graph.outgoing[s]!) {
      const c = ends[li]!.to;
      if (!connected[c]) continue;
      if (extents[c] === null) {
        blocked.push(ids[c]!);
        continue;
      }
      if (!valid[li]) continue;
      const key = keys[li]!;
      const share = -nuOf(nu[c]!, key) * extents[c]! / suppliers.get(`${c}|${key}`)!;
      need.set(key, (need.get(key) ?? 0) + share);
    }
    if (nu[s] === null || blocked.length > 0 || need.size === 0) {
      const why =
        nu[s] === null
          ? 'its equation could not be read'
          : blocked.length > 0
            ? `the extent of ${list([...new Set(blocked)])} is unknown`
            : 'none of its links carries a species it makes and the next step uses';
      warnings.push({ code: 'EXTENT_UNKNOWN', message: `Step ${ids[s]}: no extent, as ${why}; it is left out of the totals`, steps: [ids[s]!] });
      continue;
    }
    let xi = 0;
    for (const [key, amount] of need) xi = Math.max(xi, amount / (nuOf(nu[s]!, key) * yields[s]!));
    extents[s] = xi;
  }

  for (const [i, xi] of extents.entries()) {
    if (xi !== null && !Number.isFinite(xi)) {
      throw new ThermoError('OUT_OF_RANGE', `Step ${ids[i]}: its extent overflows (the yields multiply to almost nothing)`, {
        field: `steps.${i}.yield`,
        hint: 'check the yields; each is a fraction between 0 and 1',
      });
    }
  }
  const loose = ids.filter((_, i) => !connected[i]);
  if (loose.length > 0) {
    warnings.push({
      code: 'DISCONNECTED',
      message: `${loose.length === 1 ? 'Step' : 'Steps'} ${list(loose)} ${loose.length === 1 ? 'has' : 'have'} no path to the final step ${ids[finalStep]}: evaluated, but extent null and left out of the totals`,
      steps: loose,
    });
  }
  return { finalStep, extents, connected, warnings };
}
