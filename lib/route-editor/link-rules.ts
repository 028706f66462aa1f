// Which links the board accepts, said in words, and which links it offers to make: one rule set for dragging a handle,
// the "Link product to…" control and the suggestions, so all three agree. Pure; species come from the light reading.
import { equationSpecies, sameSpecies } from './equation-species';
import { routeStepOrder, stepLabels, type StepLike } from './step-label';

export const LINK_REFUSAL = 'Link a product of one step to the same species consumed by the next.';

export interface LinkDraft {
  steps: readonly StepLike[];
  links: readonly { from: string; to: string; species: string }[];
}

export interface LinkAttempt {
  from: string;
  to: string;
  fromSpecies: string;
  toSpecies: string;
}

/** Does `from` already reach `to` through links? */
function reaches(links: LinkDraft['links'], from: string, to: string): boolean {
  const seen = new Set<string>();
  const stack = [from];
  while (stack.length > 0) {
    const at = stack.pop()!;
    if (at === to) return true;
    if (seen.has(at)) continue;
    seen.add(at);
    for (const l of links) if (l.from === at) stack.push(l.to);
  }
  return false;
}

/** Why this link cannot be made, in words; null when it can. */
export function linkRefusal(draft: LinkDraft, attempt: LinkAttempt): string | null {
  const { from, to, fromSpecies, toSpecies } = attempt;
  if (from === to) return 'A step cannot feed itself.';
  const labels = stepLabels(draft.steps, draft.links);
  const source = draft.steps.find((s) => s.id === from);
  const target = draft.steps.find((s) => s.id === to);
  if (!source || !target) return 'That step is no longer on the board.';
  const fromName = labels.get(from)!.full;
  const toName = labels.get(to)!.full;
  if (!sameSpecies(fromSpecies, toSpecies)) return `${LINK_REFUSAL} (${fromSpecies} is not ${toSpecies}.)`;
  if (!equationSpecies(source.equation).products.some((p) => sameSpecies(p, fromSpecies))) return `${fromName} does not produce ${fromSpecies}.`;
  if (!equationSpecies(target.equation).reactants.some((r) => sameSpecies(r, toSpecies))) return `${toName} does not consume ${toSpecies}.`;
  if (draft.links.some((l) => l.from === from && l.to === to && sameSpecies(l.species, fromSpecies))) return `${fromSpecies} already goes from ${fromName} to ${toName}.`;
  if (reaches(draft.links, to, from)) return `That link would make a loop: ${toName} already feeds ${fromName}, directly or through other steps.`;
  return null;
}

export interface SuggestedLink {
  from: string;
  to: string;
  species: string;
}

/**
 * Links the board offers to make in one go: each reactant of a step that no link feeds yet, from the nearest step
 * before it in route order that produces it. Only forward: a later step making the same species is more often a
 * by-product than the feed (the water of an oxidation is not what a reformer was given), so that link is the user's.
 * Never a loop, never a second source for one species of one step.
 */
export function suggestLinks(draft: LinkDraft): SuggestedLink[] {
  const order = routeStepOrder(draft.steps, draft.links);
  const byId = new Map(draft.steps.map((s) => [s.id, equationSpecies(s.equation)]));
  const accepted: SuggestedLink[] = [];
  order.forEach((consumerId, at) => {
    for (const reactant of byId.get(consumerId)?.reactants ?? []) {
      const links = [...draft.links, ...accepted];
      if (links.some((l) => l.to === consumerId && sameSpecies(l.species, reactant))) continue;
      for (const producerId of order.slice(0, at).reverse()) {
        const product = byId.get(producerId)?.products.find((p) => sameSpecies(p, reactant));
        if (!product) continue;
        if (!reaches(links, consumerId, producerId)) accepted.push({ from: producerId, to: consumerId, species: product });
        break;
      }
    }
  });
  return accepted;
}
