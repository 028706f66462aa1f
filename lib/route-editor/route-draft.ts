// The editor's working document: taken from the saved route, and fingerprinted for evaluation caching.
import type { RouteDraft } from '../schemas/route';
import type { RouteDocumentDto } from '../services/routes/route-dto';

export function draftOf(route: RouteDocumentDto): RouteDraft {
  return {
    name: route.name,
    target: route.target,
    targetAmount: route.targetAmount,
    marginalThreshold_kJ: route.marginalThreshold_kJ,
    steps: route.steps,
    links: route.links,
  };
}

/** Only what the engine reads: positions and notes never change an evaluation. */
export function engineFingerprint(draft: RouteDraft): string {
  const steps = draft.steps.map(({ position: _position, notes: _notes, ...fields }) => fields);
  const text = JSON.stringify([draft.target, draft.targetAmount, draft.marginalThreshold_kJ, steps, draft.links]);
  return `${text.length.toString(36)}-${fnv1a(text)}-${djb2(text)}`;
}

/** What the engine reads of one step: two steps with the same key evaluate alike. */
export function stepEngineKey(step: RouteDraft['steps'][number]): string {
  const { position: _position, notes: _notes, ...fields } = step;
  return JSON.stringify(fields);
}

/** Steps of `current` whose engine fields differ from (or are missing in) `evaluated`: their results are out of date. */
export function staleStepIds(current: Pick<RouteDraft, 'steps'>, evaluated: Pick<RouteDraft, 'steps'>): Set<string> {
  const before = new Map(evaluated.steps.map((s) => [s.id, stepEngineKey(s)]));
  return new Set(current.steps.filter((s) => before.get(s.id) !== stepEngineKey(s)).map((s) => s.id));
}

function fnv1a(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return (h >>> 0).toString(36);
}

function djb2(text: string): string {
  let h = 5381;
  for (let i = 0; i < text.length; i++) h = (Math.imul(h, 33) + text.charCodeAt(i)) | 0;
  return (h >>> 0).toString(36);
}
