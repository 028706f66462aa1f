// What the canvas and the ladder say about a step's open review items.
export interface StepReviewMarks {
  /** comments in unresolved threads */
  comments: number;
  /** open flags */
  flags: number;
}

export type ReviewMarksByStep = Record<string, StepReviewMarks>;

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

export function reviewMarkText(marks: StepReviewMarks | undefined): string {
  if (!marks) return '';
  const parts = [];
  if (marks.flags > 0) parts.push(`⚑ ${plural(marks.flags, 'flag')}`);
  if (marks.comments > 0) parts.push(plural(marks.comments, 'comment'));
  return parts.join(' · ');
}

/** A few characters for narrow places: "⚑1 2c". */
export function compactReviewMarkText(marks: StepReviewMarks | undefined): string {
  if (!marks) return '';
  return [marks.flags > 0 ? `⚑${marks.flags}` : '', marks.comments > 0 ? `${marks.comments}c` : ''].filter(Boolean).join(' ');
}

export function reviewMarksOf(unresolvedByStep: Record<string, number> | undefined, openByStep: Record<string, number> | undefined): ReviewMarksByStep {
  const out: ReviewMarksByStep = {};
  for (const id of new Set([...Object.keys(unresolvedByStep ?? {}), ...Object.keys(openByStep ?? {})])) {
    out[id] = { comments: unresolvedByStep?.[id] ?? 0, flags: openByStep?.[id] ?? 0 };
  }
  return out;
}
