// How a step is named wherever people read about it: "Step 3 (ethanol dehydrogenation)", never its internal id.
// The number is the step's place in route order: the links' topological order with ties by document order, the
// same order the engine evaluates in (one rule, lib/thermo/route/step-order.ts), computed here from the links alone so it
// holds while an evaluation is loading or has failed. Pure: the board, the panels, revisions, notifications and
// mails all use it.
import reactionLibrary from '../thermo/data/reaction-library.json';
import { kahnOrder } from '../thermo/route/step-order';

export interface StepLike {
  id: string;
  equation: string;
}

export interface LinkLike {
  from: string;
  to: string;
}

/** Step ids in route order. Links naming unknown steps are ignored; steps caught in a cycle follow in document order. */
export function routeStepOrder(steps: readonly { id: string }[], links: readonly LinkLike[]): string[] {
  const index = new Map(steps.map((s, i) => [s.id, i]));
  const succs: Set<number>[] = steps.map(() => new Set());
  const indegree = steps.map(() => 0);
  for (const link of links) {
    const from = index.get(link.from);
    const to = index.get(link.to);
    if (from === undefined || to === undefined || succs[from]!.has(to)) continue;
    succs[from]!.add(to);
    indegree[to]! += 1;
  }
  const order = kahnOrder(succs.map((s) => [...s]), indegree);
  const placed = new Set(order);
  return [...order, ...steps.map((_, i) => i).filter((i) => !placed.has(i))].map((i) => steps[i]!.id);
}

const normalise = (equation: string) =>
  equation
    .replace(/<=>|<->|⇌|=>|→|=/g, '->')
    .split('->')
    .map((side) =>
      side
        .split(/\s\+\s/)
        .map((term) => term.replace(/\s+/g, ' ').trim())
        .sort()
        .join(' + '),
    )
    .join(' -> ');

const LIBRARY_NAMES = new Map(reactionLibrary.reactions.map((r) => [normalise(r.equation), r.name]));

// "Ethanol dehydrogenation" reads "ethanol dehydrogenation" inside a sentence; "n-Butane…" and acronyms stay.
function inSentence(name: string): string {
  return /^[A-Z][a-z]/.test(name) ? name[0]!.toLowerCase() + name.slice(1) : name;
}

const NAME_MAX = 60;

/** What the step does, in words: the library's name for its reaction, else the equation with a real arrow. */
export function stepName(equation: string): string {
  const text = equation.trim();
  if (!text) return 'blank';
  const known = LIBRARY_NAMES.get(normalise(text));
  if (known) return inSentence(known);
  const written = text.replace(/\s*(<=>|<->|⇌)\s*/g, ' ⇌ ').replace(/\s*(->|=>)\s*/g, ' → ').replace(/\s+/g, ' ');
  return written.length > NAME_MAX ? `${written.slice(0, NAME_MAX - 1)}…` : written;
}

export interface StepLabel {
  /** place in route order, from 1 */
  number: number;
  /** "Step 3" */
  short: string;
  /** "Step 3 (ethanol dehydrogenation)" */
  full: string;
}

/** Every step's label, by id. */
export function stepLabels(steps: readonly StepLike[], links: readonly LinkLike[]): Map<string, StepLabel> {
  const byId = new Map(steps.map((s) => [s.id, s]));
  return new Map(
    routeStepOrder(steps, links).map((id, i) => {
      const short = `Step ${i + 1}`;
      return [id, { number: i + 1, short, full: `${short} (${stepName(byId.get(id)!.equation)})` }];
    }),
  );
}

/** The full label of one step, or "a removed step" when the document no longer has it. */
export function labelOf(labels: ReadonlyMap<string, StepLabel>, id: string | null | undefined): string {
  if (!id) return 'the whole route';
  return labels.get(id)?.full ?? 'a removed step';
}

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** Any whole token, with a leading "Step " or "step " taken into the label (which says "Step n" itself). */
export const ANY_PLACE = '(?<![A-Za-z0-9_-])(?:[Ss]teps?\\s+)?';
/** Only after "step " or "Step ": for prose that may hold the same letters as a word (a route named "Reform"). */
export const AFTER_STEP_WORD = '(?<![A-Za-z0-9_-])[Ss]tep\\s+';

/**
 * Replaces step ids in stored prose (a revision summary, an engine message, a notification title) with their full
 * labels. An id counts only as a whole token ("s1" never touches "s10"), and only where `before` (a regex source
 * for what must precede it) matches; a "step " it consumes is dropped, since the label starts with "Step".
 */
export function relabelStepIds(text: string, labels: ReadonlyMap<string, StepLabel>, before: string = ANY_PLACE): string {
  if (!text || labels.size === 0) return text;
  // Longest first, so "s-1a" wins over "s-1" where both are ids.
  const ids = [...labels.keys()].sort((a, b) => b.length - a.length).map(escapeRegExp);
  const pattern = new RegExp(`(${before})(${ids.join('|')})(?![A-Za-z0-9_-])`, 'g');
  return text.replace(pattern, (match, lead: string, id: string) => {
    const label = labels.get(id);
    if (!label) return match;
    return `${/[Ss]teps?\s+$/.test(lead) ? lead.replace(/[Ss]teps?\s+$/, '') : lead}${label.full}`;
  });
}
