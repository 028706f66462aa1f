// What a lead should know before approving: the open flags (safety first) and the unresolved threads, each named by
// its step's label ("Step 2 (amide formation)"), never by its internal key. Pure, so the dialog and its test share it.
import type { ThreadDto } from '../schemas/comment';
import type { FlagDto } from '../schemas/flag';
import { FLAG_CATEGORY_LABELS } from './flag-labels';

export interface ApprovalItem {
  /** "Safety · Step 2 (amide formation)" or "Step 1 (…)" / "The whole route" */
  place: string;
  text: string;
}

export interface ApprovalSummary {
  openFlags: number;
  safetyFlags: number;
  unresolvedThreads: number;
  /** the first few of each, safety flags first */
  flags: ApprovalItem[];
  threads: ApprovalItem[];
  isClear: boolean;
}

const EXCERPT_CHARS = 90;

function excerpt(text: string): string {
  const flat = text.replace(/\s+/g, ' ').trim();
  return flat.length > EXCERPT_CHARS ? `${flat.slice(0, EXCERPT_CHARS - 1).trimEnd()}…` : flat;
}

/** A step's label, or words for a step that is no longer in the route: never its key. */
export function stepPlace(stepKey: string | null, stepLabels: Readonly<Record<string, string>>): string {
  if (stepKey === null) return 'The whole route';
  return stepLabels[stepKey] ?? 'A step since removed';
}

export function approvalSummary(
  flags: readonly FlagDto[],
  threads: readonly ThreadDto[],
  stepLabels: Readonly<Record<string, string>>,
  shown = 3,
): ApprovalSummary {
  const open = flags.filter((f) => f.isOpen);
  // Safety flags lead; otherwise the list keeps the server's order.
  const ordered = [...open.filter((f) => f.category === 'safety'), ...open.filter((f) => f.category !== 'safety')];
  const unresolved = threads.filter((t) => !t.resolved);
  return {
    openFlags: open.length,
    safetyFlags: open.length - open.filter((f) => f.category !== 'safety').length,
    unresolvedThreads: unresolved.length,
    flags: ordered.slice(0, shown).map((f) => ({ place: `${FLAG_CATEGORY_LABELS[f.category]} · ${stepPlace(f.stepKey, stepLabels)}`, text: excerpt(f.reason) })),
    threads: unresolved.slice(0, shown).map((t) => ({
      place: stepPlace(t.root.stepKey, stepLabels),
      text: t.root.isDeleted ? excerpt(t.replies[0]?.body ?? 'comment deleted') : excerpt(t.root.body),
    })),
    isClear: open.length === 0 && unresolved.length === 0,
  };
}
