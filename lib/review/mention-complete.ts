// Completion of `@` mentions while typing: which text is being completed, who fits it, and the text after choosing
// someone. Pure, so the composer and the unit tests share it. The inserted `@handle` is the syntax `handlesInText`
// (and so the comment service) reads.

export interface MentionCandidate {
  handle: string;
  name: string;
}

export interface MentionQuery {
  /** index of the "@" */
  start: number;
  /** what follows it up to the caret, as typed */
  query: string;
}

// An "@" at a word start (not inside an address like a@b.test), then handle characters up to the caret.
const TYPING_MENTION = /(^|[^A-Za-z0-9._+@-])@([A-Za-z0-9._+-]{0,64})$/;

/** The mention being typed just before the caret, or null when the caret is not in one. */
export function mentionQueryAt(text: string, caret: number): MentionQuery | null {
  const m = TYPING_MENTION.exec(text.slice(0, caret));
  if (!m) return null;
  return { start: m.index + m[1]!.length, query: m[2]! };
}

/**
 * Members whose handle, or any word of whose name, starts with the query (case-insensitive); handle matches first.
 * "ott" finds Ottilie Marchetti, "vasq" finds Hanne Vasquez-Lind.
 */
export function mentionCandidates(members: readonly MentionCandidate[], query: string, limit = 6): MentionCandidate[] {
  const q = query.toLowerCase();
  const byHandle = members.filter((m) => m.handle.toLowerCase().startsWith(q));
  const byName = members.filter((m) => !byHandle.includes(m) && m.name.toLowerCase().split(/[\s.-]+/).some((word) => word.startsWith(q)));
  return [...byHandle, ...byName].slice(0, limit);
}

/** Replaces the typed "@query" with "@handle " and puts the caret after the space. */
export function insertMention(text: string, at: MentionQuery, caret: number, handle: string): { text: string; caret: number } {
  const after = text.slice(caret);
  const inserted = `@${handle}${/^\s/.test(after) ? '' : ' '}`;
  return { text: `${text.slice(0, at.start)}${inserted}${after}`, caret: at.start + inserted.length + (/^\s/.test(after) ? 1 : 0) };
}
