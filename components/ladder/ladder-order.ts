// The ladder's risers in the draft's route order, numbered as the board numbers its nodes (lib/route-editor/
// step-label.ts), so a riser never says "Step 2" of the node labelled "Step 3" while a new evaluation is on its way.
// Pure, so it is unit-tested.
import type { RouteStepResult } from '@/lib/thermo/route';

export interface LadderOrder {
  /** evaluated step ids in the order the risers are drawn */
  order: string[];
  /** the evaluation's steps, running sums recomputed when the order differs from the evaluation's */
  steps: RouteStepResult[];
  /** each drawn step's number, as on the board */
  slots: Map<string, number>;
}

const isCounted = (s: RouteStepResult): boolean => s.class !== 'error' && s.extent_mol !== null && s.deltaG_kJ !== null;

/**
 * `routeNumbers` maps a step id to its number in the draft's route order. Without it the evaluation's own order and
 * numbering stand. Steps the draft no longer holds are dropped; steps not yet evaluated wait for their answer.
 */
export function ladderInRouteOrder(
  evaluation: { order: readonly string[]; steps: readonly RouteStepResult[] } | null | undefined,
  routeNumbers?: ReadonlyMap<string, number>,
): LadderOrder {
  const evalOrder = evaluation?.order ?? [];
  const steps = evaluation?.steps ?? [];
  if (!routeNumbers) return { order: [...evalOrder], steps: [...steps], slots: new Map(evalOrder.map((id, i) => [id, i + 1])) };
  const order = evalOrder.filter((id) => routeNumbers.has(id)).sort((a, b) => routeNumbers.get(a)! - routeNumbers.get(b)!);
  const slots = new Map(order.map((id) => [id, routeNumbers.get(id)!]));
  // Same sequence as the engine's: its running sums stand exactly as computed.
  if (order.length === evalOrder.length && order.every((id, i) => id === evalOrder[i])) return { order, steps: [...steps], slots };
  const byId = new Map(steps.map((s) => [s.id, s]));
  let cumulative = 0;
  let cumulative0 = 0;
  const reordered = order.flatMap((id) => {
    const s = byId.get(id);
    if (!s) return [];
    // The engine's running sums add ξ·ΔG of each counted step; the same sums along the draft's order.
    if (isCounted(s)) {
      cumulative += s.deltaG_kJ!;
      cumulative0 += s.deltaG0_kJ ?? 0;
    }
    return [{ ...s, cumulative_kJ: cumulative, cumulative0_kJ: cumulative0 }];
  });
  return { order, steps: reordered, slots };
}
