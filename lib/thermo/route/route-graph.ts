// The route as a directed graph of steps: ids checked, links resolved, topological order by
// Kahn's algorithm (ties broken by input order), and a cycle named step by step when there is one.
import type { RouteLink } from '../../schemas/route-evaluate';
import { routeError } from './route-errors';
import { kahnOrder } from './step-order';

export interface RouteGraph {
  ids: string[];
  indexOf: Map<string, number>;
  /** step indices in topological order */
  order: number[];
  /** link indices leaving / entering each step */
  outgoing: number[][];
  incoming: number[][];
}

export function checkStepIds(ids: readonly string[]): Map<string, number> {
  const indexOf = new Map<string, number>();
  ids.forEach((id, i) => {
    if (typeof id !== 'string' || id.length < 1 || id.length > 64) {
      throw routeError(`steps[${i}].id must be a string of 1–64 characters`, `steps.${i}.id`, 'give every step a short unique id such as "s1"');
    }
    const first = indexOf.get(id);
    if (first !== undefined) {
      throw routeError(`Step id "${id}" is used by steps ${first} and ${i}`, `steps.${i}.id`, 'give every step a unique id', { duplicate: id });
    }
    indexOf.set(id, i);
  });
  return indexOf;
}

function resolveLinks(links: readonly RouteLink[], indexOf: Map<string, number>): { from: number; to: number }[] {
  return links.map((link, i) => {
    for (const end of ['from', 'to'] as const) {
      if (!indexOf.has(link[end])) {
        throw routeError(`links[${i}].${end}: no step has the id "${link[end]}"`, `links.${i}.${end}`, 'link only steps that are in the route', {
          missing: link[end],
        });
      }
    }
    return { from: indexOf.get(link.from)!, to: indexOf.get(link.to)! };
  });
}

/** Insert into an ascending array, so the smallest ready index (earliest in the input) goes first. */

/** Every step left over by Kahn's algorithm has a left-over predecessor, so walking back must loop. */
function findCycle(remaining: Set<number>, pred: (step: number) => number[]): number[] {
  const start = Math.min(...remaining);
  const seenAt = new Map<number, number>();
  const walk: number[] = [];
  let node = start;
  while (!seenAt.has(node)) {
    seenAt.set(node, walk.length);
    walk.push(node);
    node = pred(node).find((p) => remaining.has(p))!;
  }
  return walk.slice(seenAt.get(node)).reverse();
}

export function buildRouteGraph(ids: readonly string[], links: readonly RouteLink[]): RouteGraph {
  const indexOf = checkStepIds(ids);
  const ends = resolveLinks(links, indexOf);
  const outgoing: number[][] = ids.map(() => []);
  const incoming: number[][] = ids.map(() => []);
  ends.forEach(({ from, to }, li) => {
    outgoing[from]!.push(li);
    incoming[to]!.push(li);
  });

  // In-degree counts distinct predecessors: two links between one pair are one dependency.
  const preds = ids.map((_, i) => [...new Set(incoming[i]!.map((li) => ends[li]!.from))]);
  const succs = ids.map((_, i) => [...new Set(outgoing[i]!.map((li) => ends[li]!.to))]);
  const order = kahnOrder(succs, preds.map((p) => p.length));
  if (order.length < ids.length) {
    const done = new Set(order);
    const remaining = new Set(ids.map((_, i) => i).filter((i) => !done.has(i)));
    const cycle = findCycle(remaining, (s) => preds[s]!).map((i) => ids[i]!);
    throw routeError(
      `The links form a cycle: ${[...cycle, cycle[0]].join(' → ')}`,
      'links',
      'a route runs one way; drop the recycle link (treat the recycled species as a fresh feed)',
      { cycle },
    );
  }
  return { ids: [...ids], indexOf, order, outgoing, incoming };
}
